"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { approveRunAction, returnRunAction } from "@/app/(staff)/review/actions";
import { Field } from "@/components/ui/field";

/**
 * Approve the run, or return it to the technician with what to change. When the cell's apparatus leakage
 * is at or above the method's limit, approving needs an explicit acknowledgement.
 */
export function ReviewDecision({ runId, version, leakageWarning = null }: { runId: string; version: number; leakageWarning?: string | null }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [comments, setComments] = useState("");
  const [acknowledgeLeakage, setAcknowledgeLeakage] = useState(false);
  const [result, setResult] = useState<{ ok: boolean; message: string; fieldErrors?: Record<string, string> } | null>(null);
  const decide = (action: (input: unknown) => Promise<{ ok: boolean; message: string; fieldErrors?: Record<string, string> }>) =>
    startTransition(async () => {
      const outcome = await action({ runId, version, comments, acknowledgeLeakage });
      setResult(outcome);
      if (outcome.ok) router.refresh();
    });
  return (
    <div className="stack-gap" aria-label="Review decision">
      {result && <div className={`notice ${result.ok ? "notice-ok" : "notice-error"}`} role="status" data-testid="review-message">{result.message}</div>}
      <Field label="Comments for the technician" hint="Needed when you return the run; kept with the review." error={result?.fieldErrors?.comments}>
        <textarea rows={3} value={comments} onChange={(e) => setComments(e.target.value)} />
      </Field>
      {leakageWarning && (
        <div className="notice notice-caution" data-testid="leakage-warning">
          <p>{leakageWarning}</p>
          <label><input type="checkbox" checked={acknowledgeLeakage} onChange={(e) => setAcknowledgeLeakage(e.target.checked)} /> I acknowledge the apparatus leakage; the certificate will state it as a deviation.</label>
          {result?.fieldErrors?.acknowledgeLeakage && <p className="field-error">{result.fieldErrors.acknowledgeLeakage}</p>}
        </div>
      )}
      <div className="inline-form">
        <button type="button" className="button" disabled={pending} onClick={() => decide(approveRunAction)}>Approve</button>
        <button type="button" className="button button-danger" disabled={pending} onClick={() => decide(returnRunAction)}>Return to technician</button>
      </div>
    </div>
  );
}
