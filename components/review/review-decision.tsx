"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { approveRunAction, returnRunAction } from "@/app/(staff)/review/actions";
import { Field } from "@/components/ui/field";

/** Approve the run, or return it to the technician with what to change. */
export function ReviewDecision({ runId, version }: { runId: string; version: number }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [comments, setComments] = useState("");
  const [result, setResult] = useState<{ ok: boolean; message: string; fieldErrors?: Record<string, string> } | null>(null);
  const decide = (action: (input: unknown) => Promise<{ ok: boolean; message: string; fieldErrors?: Record<string, string> }>) =>
    startTransition(async () => {
      const outcome = await action({ runId, version, comments });
      setResult(outcome);
      if (outcome.ok) router.refresh();
    });
  return (
    <div className="stack-gap" aria-label="Review decision">
      {result && <div className={`notice ${result.ok ? "notice-ok" : "notice-error"}`} role="status" data-testid="review-message">{result.message}</div>}
      <Field label="Comments for the technician" hint="Needed when you return the run; kept with the review." error={result?.fieldErrors?.comments}>
        <textarea rows={3} value={comments} onChange={(e) => setComments(e.target.value)} />
      </Field>
      <div className="inline-form">
        <button type="button" className="button" disabled={pending} onClick={() => decide(approveRunAction)}>Approve</button>
        <button type="button" className="button button-danger" disabled={pending} onClick={() => decide(returnRunAction)}>Return to technician</button>
      </div>
    </div>
  );
}
