"use client";

import { useWatch } from "react-hook-form";
import { abandonRunAction } from "@/app/(staff)/runs/actions";
import { Field } from "@/components/ui/field";
import { FormNotice, useActionForm } from "@/components/ui/use-action-form";
import { abandonRunSchema } from "@/lib/validation/abandon-run";

type Locations = Array<{ id: string; code: string; name: string }>;

/** Abandons the run with its reason; the technician says whether the specimen is kept or disposed of. */
export function AbandonRunForm({ runId, version, locations }: { runId: string; version: number; locations: Locations }) {
  const { form, onSubmit, notice } = useActionForm({
    schema: abandonRunSchema,
    defaultValues: { runId, version, reason: "", specimenFate: "storage", storageLocationId: "" },
    action: abandonRunAction,
  });
  const { register, formState, control } = form;
  const fate = useWatch({ control, name: "specimenFate" });
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Abandon the run">
      <FormNotice notice={notice} />
      <p className="muted">The run keeps everything recorded so far, frees its cell and will not go to review. This cannot be undone.</p>
      <Field label="Reason for abandoning" hint="e.g. membrane leak found during saturation; blocked effluent line" error={formState.errors.reason?.message}>
        <textarea rows={2} {...register("reason")} />
      </Field>
      <fieldset className="choice-row">
        <legend>The specimen</legend>
        <label><input type="radio" value="storage" {...register("specimenFate")} /> goes back to storage (kept on retention)</label>
        <label><input type="radio" value="disposal" {...register("specimenFate")} /> is disposed of</label>
      </fieldset>
      {fate === "storage" && (
        <Field label="Kept at" error={formState.errors.storageLocationId?.message}>
          <select {...register("storageLocationId")}>
            <option value="">Choose…</option>
            {locations.map((l) => <option key={l.id} value={l.id}>{l.code} · {l.name}</option>)}
          </select>
        </Field>
      )}
      <div><button className="button button-danger" type="submit" disabled={formState.isSubmitting}>Abandon the run</button></div>
    </form>
  );
}
