"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { reviseCertificateAction } from "@/app/(staff)/certificates/actions";
import { Field } from "@/components/ui/field";

/** Start a correction: a new draft revision with the reason, which supersedes the issued one when signed. */
export function ReviseCertificateForm({ certificateId }: { certificateId: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [reason, setReason] = useState("");
  const [result, setResult] = useState<{ ok: boolean; message: string; fieldErrors?: Record<string, string> } | null>(null);
  return (
    <form
      className="stack"
      aria-label="Correct by a new revision"
      onSubmit={(e) => {
        e.preventDefault();
        startTransition(async () => {
          const outcome = await reviseCertificateAction({ certificateId, reason });
          setResult(outcome);
          if (outcome.ok) router.refresh();
        });
      }}
    >
      {result && <div className={`notice ${result.ok ? "notice-ok" : "notice-error"}`} role="status">{result.message}</div>}
      <Field label="Reason for the new revision" error={result?.fieldErrors?.reason}><input value={reason} onChange={(e) => setReason(e.target.value)} /></Field>
      <button type="submit" className="button button-quiet" disabled={pending}>Start a new revision</button>
    </form>
  );
}
