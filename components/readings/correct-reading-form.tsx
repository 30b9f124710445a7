"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type Path } from "react-hook-form";
import type { z } from "zod";
import { correctReadingAction } from "@/app/(staff)/runs/[labNumber]/readings-actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import type { PressureUnit } from "@/lib/units/pressure-entry";
import { correctReadingSchema } from "@/lib/validation/readings";
import { entryColumns, type EntryRow } from "./entry-columns";
import styles from "./readings.module.css";

type FormInput = z.input<typeof correctReadingSchema>;
type FormOutput = z.output<typeof correctReadingSchema>;

export type CorrectReadingFormProps = {
  readingId: string;
  sequence: number;
  pressureUnit: PressureUnit;
  withChemistry: boolean;
  /** The saved values as input text in the person's unit (takenAt as a datetime-local value with seconds). */
  values: EntryRow;
};

/** "Correct…": the saved values to change, and the reason; saves a new reading, the original stays in its history. */
export function CorrectReadingForm({ readingId, sequence, pressureUnit, withChemistry, values }: CorrectReadingFormProps) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({ resolver: zodResolver(correctReadingSchema), defaultValues: { readingId, pressureUnit, values, reason: "" } });
  const { register, handleSubmit, formState } = form;
  const errors = formState.errors.values as Record<string, { message?: string } | undefined> | undefined;

  const onSubmit = handleSubmit(async (input) => {
    setNotice(null);
    const result = await correctReadingAction(input);
    if (!result.ok) {
      setNotice(result.message);
      applyServerErrors(form, result.fieldErrors);
      return;
    }
    setOpen(false);
    router.refresh();
  });

  if (!open) return <button type="button" className={`button button-quiet ${styles.compactButton}`} onClick={() => setOpen(true)} aria-label={`Correct reading ${sequence}`}>Correct…</button>;
  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Correct reading ${sequence}`} data-testid={`correct-reading-${sequence}`}>
      {notice && <div className="notice notice-error" role="status">{notice}</div>}
      <div className={styles.correctForm}>
        {entryColumns(pressureUnit, withChemistry).map((c) => (
          <Field key={c.key} label={c.title} error={errors?.[c.key]?.message}>
            <input {...register(`values.${c.key}` as Path<FormInput>)} type={c.kind === "time" ? "datetime-local" : c.kind === "check" ? "checkbox" : "text"} step={c.kind === "time" ? 1 : undefined} inputMode={c.kind === "number" ? "decimal" : undefined} />
          </Field>
        ))}
        <div className={styles.wide}>
          <Field label="Reason for the correction" hint="Kept with the reading; the original values stay visible in its history." error={formState.errors.reason?.message ?? (formState.errors as Record<string, { message?: string }>).form?.message}>
            <input {...register("reason")} />
          </Field>
        </div>
      </div>
      <div className={styles.actions}>
        <button className="button" type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? "Saving…" : "Save correction"}</button>
        <button type="button" className="button button-quiet" onClick={() => setOpen(false)}>Cancel</button>
      </div>
    </form>
  );
}
