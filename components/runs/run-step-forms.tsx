"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { recordPostTestAction, submitRunAction, terminateRunAction } from "@/app/(staff)/runs/actions";
import { useForm } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { isUnreachable, SERVER_UNREACHABLE } from "@/components/ui/server-unreachable";
import { nowToTheMinute } from "@/components/ui/now-for-input";
import { ZonedDateTimeInput } from "@/components/ui/zoned-date-time-input";
import { formatDateTime } from "@/lib/format/dates";

type Result = { ok: boolean; message: string; fieldErrors?: Record<string, string> };

function useStep() {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [result, setResult] = useState<Result | null>(null);
  const run = (work: () => Promise<Result>) =>
    startTransition(async () => {
      let outcome: Result;
      try {
        outcome = await work();
      } catch (error) {
        if (!isUnreachable(error)) throw error;
        outcome = { ok: false, message: SERVER_UNREACHABLE };
      }
      setResult(outcome);
      if (outcome.ok) router.refresh();
    });
  const message = result && <div className={`notice ${result.ok ? "notice-ok" : "notice-error"}`} role="status" data-testid="step-message">{result.message}</div>;
  return { pending, run, message, errors: result?.fieldErrors ?? {} };
}

/**
 * Terminate when the criteria are met, or end early with a reason, at the time permeation stopped (the
 * certificate's end of testing): the moment the form opened unless the technician enters when it was.
 */
export function TerminateForm({ runId, version, criteriaMet, zone, lastReadingAt }: { runId: string; version: number; criteriaMet: boolean; zone: string; lastReadingAt: string | null }) {
  const step = useStep();
  const [reason, setReason] = useState("");
  // Now to the minute, unless the last reading was taken later in this same minute.
  const now = nowToTheMinute();
  const { control, getValues } = useForm<{ endedAt: string }>({ defaultValues: { endedAt: lastReadingAt && lastReadingAt > now ? lastReadingAt : now } });
  const endedAt = () => getValues("endedAt");
  return (
    <div className="stack-gap" aria-label="Terminate the run">
      {step.message}
      <Field
        label="Permeation ended at"
        hint={`Lab time (${zone}).${lastReadingAt ? ` The last reading was taken ${formatDateTime(new Date(lastReadingAt), zone)}.` : ""}`}
        error={step.errors.endedAt}
      >
        <ZonedDateTimeInput control={control} name="endedAt" zone={zone} data-testid="terminate-ended-at" />
      </Field>
      <button type="button" className="button" disabled={step.pending || !criteriaMet} onClick={() => step.run(() => terminateRunAction({ runId, version, kind: "CRITERIA_MET", endedAt: endedAt() }))}>
        Terminate: criteria met
      </button>
      {!criteriaMet && <p className="muted">The criteria are not all met yet. To stop anyway, give the reason for an early end.</p>}
      <div className="inline-form">
        <input value={reason} onChange={(e) => setReason(e.target.value)} placeholder="Reason for ending early" aria-label="Reason for ending early" style={{ width: "20rem" }} />
        <button type="button" className="button button-danger" disabled={step.pending} onClick={() => step.run(() => terminateRunAction({ runId, version, kind: "EARLY_END", reason, endedAt: endedAt() }))}>End early</button>
      </div>
    </div>
  );
}

/** Post-test data: bentonite layer thickness on a cut section, final mass, what was seen. */
export function PostTestForm({ runId, version }: { runId: string; version: number }) {
  const step = useStep();
  const [values, setValues] = useState({ thicknessMm: "", finalMassG: "", observations: "" });
  const set = (key: keyof typeof values) => (e: React.ChangeEvent<HTMLInputElement | HTMLTextAreaElement>) => setValues((v) => ({ ...v, [key]: e.target.value }));
  return (
    <form className="stack" aria-label="Post-test data" onSubmit={(e) => { e.preventDefault(); step.run(() => recordPostTestAction({ runId, version, ...values })); }} noValidate>
      {step.message}
      <Field label="Bentonite layer thickness (mm)" hint="Measured on a cut section, geotextiles excluded." error={step.errors.thicknessMm}><input inputMode="decimal" value={values.thicknessMm} onChange={set("thicknessMm")} /></Field>
      <Field label="Final mass (g)" error={step.errors.finalMassG}><input inputMode="decimal" value={values.finalMassG} onChange={set("finalMassG")} /></Field>
      <Field label="Observations" error={step.errors.observations}><textarea rows={3} value={values.observations} onChange={set("observations")} /></Field>
      <button type="submit" className="button" disabled={step.pending}>Record post-test data</button>
    </form>
  );
}

export function SubmitRunButton({ runId, version }: { runId: string; version: number }) {
  const step = useStep();
  return (
    <div className="stack-gap">
      {step.message}
      <button type="button" className="button" disabled={step.pending} onClick={() => step.run(() => submitRunAction({ runId, version }))}>Submit for review</button>
    </div>
  );
}
