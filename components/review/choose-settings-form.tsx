"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { chooseRunSettingsAction } from "@/app/(staff)/review/actions";
import { Field } from "@/components/ui/field";

type Version = { id: string; version: number; reason: string };

/** QA judges the run by another version of its method's settings, with the reason. */
export function ChooseSettingsForm({ runId, version, versions, currentId }: { runId: string; version: number; versions: Version[]; currentId: string | null }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [settingsVersionId, setSettingsVersionId] = useState("");
  const [reason, setReason] = useState("");
  const [result, setResult] = useState<{ ok: boolean; message: string; fieldErrors?: Record<string, string> } | null>(null);
  const others = versions.filter((v) => v.id !== currentId);
  if (others.length === 0) return <p className="muted">The method has no other settings version to judge this run by.</p>;
  return (
    <form
      className="stack"
      aria-label="Judge by another settings version"
      onSubmit={(e) => {
        e.preventDefault();
        startTransition(async () => {
          const outcome = await chooseRunSettingsAction({ runId, version, settingsVersionId, reason });
          setResult(outcome);
          if (outcome.ok) router.refresh();
        });
      }}
    >
      {result && <div className={`notice ${result.ok ? "notice-ok" : "notice-error"}`} role="status">{result.message}</div>}
      <Field label="Settings version" error={result?.fieldErrors?.settingsVersionId}>
        <select value={settingsVersionId} onChange={(e) => setSettingsVersionId(e.target.value)}>
          <option value="">Choose…</option>
          {others.map((v) => <option key={v.id} value={v.id}>Version {v.version}: {v.reason}</option>)}
        </select>
      </Field>
      <Field label="Why this version" error={result?.fieldErrors?.reason}><input value={reason} onChange={(e) => setReason(e.target.value)} /></Field>
      <button type="submit" className="button button-quiet" disabled={pending}>Judge by this version</button>
    </form>
  );
}
