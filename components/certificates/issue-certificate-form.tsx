"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { issueCertificateAction } from "@/app/(staff)/certificates/actions";
import { Field } from "@/components/ui/field";

/** Signing: the QA manager enters their password again, which is checked before anything is issued. */
export function IssueCertificateForm({ revisionId }: { revisionId: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [password, setPassword] = useState("");
  const [result, setResult] = useState<{ ok: boolean; message: string; fieldErrors?: Record<string, string> } | null>(null);
  return (
    <form
      className="stack"
      aria-label="Sign and issue"
      onSubmit={(e) => {
        e.preventDefault();
        startTransition(async () => {
          const outcome = await issueCertificateAction({ revisionId, password });
          setResult(outcome);
          setPassword("");
          if (outcome.ok) router.refresh();
        });
      }}
    >
      {result && <div className={`notice ${result.ok ? "notice-ok" : "notice-error"}`} role="status" data-testid="issue-message">{result.message}</div>}
      <p className="muted">Signing means: I have reviewed this certificate and approve it for issue. It cannot be changed afterwards; corrections are new revisions.</p>
      <Field label="Your password, to sign" error={result?.fieldErrors?.password}>
        <input type="password" autoComplete="current-password" value={password} onChange={(e) => setPassword(e.target.value)} />
      </Field>
      <button type="submit" className="button" disabled={pending || !password}>{pending ? "Signing and rendering…" : "Sign and issue"}</button>
    </form>
  );
}
