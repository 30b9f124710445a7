"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { recordStageAction } from "@/app/(staff)/runs/actions";
import { recordStageSchema } from "@/lib/validation/runs";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { nowForDateTimeInput } from "@/components/ui/now-for-input";

type Kind = "SATURATION" | "BACK_PRESSURE" | "EQUILIBRATION" | "PERMEATION";
const KIND_LABELS: Record<Kind, string> = { SATURATION: "Saturation", BACK_PRESSURE: "Back-pressure step", EQUILIBRATION: "Equilibration hold", PERMEATION: "Permeation" };

/**
 * Records a stage's three pressures; a departure from the method (confining margin before permeation, the
 * prescribed permeation pressures, a short equilibration) shows its warning and needs an explicit tick.
 */
export function StageForm({ runId, version, kinds, pressureUnit }: { runId: string; version: number; kinds: Kind[]; pressureUnit: "KPA" | "PSI" }) {
  const router = useRouter();
  const [warning, setWarning] = useState<string | null>(null);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<z.input<typeof recordStageSchema>, unknown, z.output<typeof recordStageSchema>>({
    resolver: zodResolver(recordStageSchema),
    defaultValues: { runId, version, kind: kinds[0], pressureUnit, cellPressure: "", influentPressure: "", effluentPressure: "", startedAt: nowForDateTimeInput(), acknowledgeMargin: false },
  });
  const { register, handleSubmit, formState } = form;
  const unit = pressureUnit === "PSI" ? "psi" : "kPa";
  const onSubmit = handleSubmit(async (values) => {
    const result = await recordStageAction(values);
    if (result.ok) {
      setWarning(null);
      setNotice({ ok: true, text: result.data.marginWarning ? "Stage recorded with the departure acknowledged; it will be listed as a deviation." : "Stage recorded." });
      router.refresh();
      return;
    }
    if (result.details?.marginWarning) setWarning(result.message);
    else setNotice({ ok: false, text: result.message });
    applyServerErrors(form, result.fieldErrors);
  });
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Record a stage">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      <Field label="Stage" error={formState.errors.kind?.message}>
        <select {...register("kind")}>{kinds.map((k) => <option key={k} value={k}>{KIND_LABELS[k]}</option>)}</select>
      </Field>
      <Field label={`Cell pressure (${unit})`} error={formState.errors.cellPressure?.message}><input inputMode="decimal" {...register("cellPressure")} /></Field>
      <Field label={`Influent pressure (${unit})`} error={formState.errors.influentPressure?.message}><input inputMode="decimal" {...register("influentPressure")} /></Field>
      <Field label={`Effluent pressure (${unit})`} error={formState.errors.effluentPressure?.message}><input inputMode="decimal" {...register("effluentPressure")} /></Field>
      <Field label="Started at" error={formState.errors.startedAt?.message}><input type="datetime-local" {...register("startedAt")} /></Field>
      {warning && (
        <div className="notice notice-caution" role="alert" data-testid="margin-warning">
          <p><strong>Departure from the method&apos;s pressures.</strong> {warning}</p>
          <label><input type="checkbox" {...register("acknowledgeMargin")} /> I have read this warning; the lab&apos;s procedure allows this stage.</label>
        </div>
      )}
      <button className="button" type="submit" disabled={formState.isSubmitting}>Record stage</button>
    </form>
  );
}
