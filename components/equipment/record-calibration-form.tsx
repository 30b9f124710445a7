"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { recordCalibrationAction } from "@/app/(staff)/equipment/actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { nowForDateTimeInput } from "@/components/ui/now-for-input";
import { BURETTE_AREA_MM2, recordCalibrationSchema, type EquipmentKind } from "@/lib/validation/equipment";
import styles from "./equipment.module.css";

type Values = z.input<typeof recordCalibrationSchema>;

/** The administrator records a calibration certificate; a burette panel's form asks for both burette areas. */
export function RecordCalibrationForm({ equipmentId, kind }: { equipmentId: string; kind: EquipmentKind }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const blank = (): Values => ({
    equipmentId, equipmentKind: kind, calibratedAt: nowForDateTimeInput().slice(0, 10), dueAt: "", reference: "", performedBy: "", passed: true,
    inflowBuretteAreaMm2: "", outflowBuretteAreaMm2: "",
  });
  const form = useForm<Values, unknown, z.output<typeof recordCalibrationSchema>>({ resolver: zodResolver(recordCalibrationSchema), defaultValues: blank() });
  const { register, handleSubmit, formState, reset } = form;
  const onSubmit = handleSubmit(async (values) => {
    const result = await recordCalibrationAction(values);
    setNotice({ ok: result.ok, text: result.message });
    if (result.ok) {
      reset(blank());
      router.refresh();
    } else applyServerErrors(form, result.fieldErrors);
  });
  const errors = formState.errors;
  const areaHint = `mm², ${BURETTE_AREA_MM2.min} to ${BURETTE_AREA_MM2.max}`;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Record a calibration">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      <div className={styles.areaPair}>
        <Field label="Calibrated on" error={errors.calibratedAt?.message}><input type="date" {...register("calibratedAt")} /></Field>
        <Field label="Next due" error={errors.dueAt?.message}><input type="date" {...register("dueAt")} /></Field>
      </div>
      <Field label="Certificate reference" error={errors.reference?.message}><input className="mono" {...register("reference")} /></Field>
      <Field label="Performed by" hint="The calibration laboratory or person." error={errors.performedBy?.message}><input {...register("performedBy")} /></Field>
      {kind === "BURETTE_PANEL" && (
        <div className={styles.areaPair}>
          <Field label="Inflow burette area" hint={areaHint} error={errors.inflowBuretteAreaMm2?.message}><input inputMode="decimal" {...register("inflowBuretteAreaMm2")} /></Field>
          <Field label="Outflow burette area" hint={areaHint} error={errors.outflowBuretteAreaMm2?.message}><input inputMode="decimal" {...register("outflowBuretteAreaMm2")} /></Field>
        </div>
      )}
      <label className={styles.checkRow}><input type="checkbox" {...register("passed")} /> Passed (within tolerance)</label>
      {errors.passed?.message && <span className="field-error">{errors.passed.message}</span>}
      <button className="button" type="submit" disabled={formState.isSubmitting}>Record calibration</button>
    </form>
  );
}
