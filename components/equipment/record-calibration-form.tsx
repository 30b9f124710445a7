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
import { UNCERTAINTY_BY_KIND } from "@/lib/equipment/calibration-values";
import { BURETTE_AREA_MM2, LEAKAGE_UNIT_LABELS, LEAKAGE_UNITS, recordCalibrationSchema, type EquipmentKind } from "@/lib/validation/equipment";
import styles from "./equipment.module.css";

type Values = z.input<typeof recordCalibrationSchema>;

/**
 * The administrator records a calibration certificate: a burette panel's form asks for both burette areas
 * (and each zero's height above the datum, and the scale's calibrated range); a measuring instrument's for its
 * standard uncertainty; a cell's for its apparatus leakage check.
 */
export function RecordCalibrationForm({ equipmentId, kind }: { equipmentId: string; kind: EquipmentKind }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const blank = (): Values => ({
    equipmentId, equipmentKind: kind, calibratedAt: nowForDateTimeInput().slice(0, 10), dueAt: "", reference: "", performedBy: "", passed: true,
    inflowBuretteAreaMm2: "", outflowBuretteAreaMm2: "", inflowZeroAboveDatumMm: "", outflowZeroAboveDatumMm: "", scaleMinMm: "", scaleMaxMm: "",
    standardUncertainty: "", leakageCheckedAt: "", leakageMethod: "", leakageRate: "", leakageUnit: "M3_PER_S",
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
  const measures = UNCERTAINTY_BY_KIND[kind];
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
      {kind === "BURETTE_PANEL" && (
        <div className={styles.areaPair}>
          <Field label="Inflow zero above datum (mm)" hint="Height of the inflow burette's 0 mark above the datum both share; blank = 0." error={errors.inflowZeroAboveDatumMm?.message}><input inputMode="decimal" {...register("inflowZeroAboveDatumMm")} /></Field>
          <Field label="Outflow zero above datum (mm)" hint="The same for the outflow burette." error={errors.outflowZeroAboveDatumMm?.message}><input inputMode="decimal" {...register("outflowZeroAboveDatumMm")} /></Field>
        </div>
      )}
      {kind === "BURETTE_PANEL" && (
        <div className={styles.areaPair}>
          <Field label="Calibrated scale from (mm)" hint="Optional: readings outside the range are refused." error={errors.scaleMinMm?.message}><input inputMode="decimal" {...register("scaleMinMm")} /></Field>
          <Field label="Calibrated scale to (mm)" error={errors.scaleMaxMm?.message}><input inputMode="decimal" {...register("scaleMaxMm")} /></Field>
        </div>
      )}
      {measures && (
        <Field label={`Standard uncertainty (${measures.unit})`} hint={`Of ${measures.what}, k = 1: a certificate's U (k = 2) is U / 2; a resolution ±a is a / √3.`} error={errors.standardUncertainty?.message}>
          <input inputMode="decimal" {...register("standardUncertainty")} />
        </Field>
      )}
      {kind === "PERMEAMETER_CELL" && (
        <fieldset className="stack" aria-label="Apparatus leakage check">
          <legend><strong>Apparatus leakage check</strong> <span className="muted">(ASTM D5887: under 10 % of the measured flux)</span></legend>
          <div className={styles.areaPair}>
            <Field label="Checked on" error={errors.leakageCheckedAt?.message}><input type="date" {...register("leakageCheckedAt")} /></Field>
            <Field label="Leakage rate" error={errors.leakageRate?.message}><input inputMode="decimal" {...register("leakageRate")} /></Field>
          </div>
          <Field label="Leakage given as" error={errors.leakageUnit?.message}>
            <select {...register("leakageUnit")}>{LEAKAGE_UNITS.map((u) => <option key={u} value={u}>{LEAKAGE_UNIT_LABELS[u]}</option>)}</select>
          </Field>
          <Field label="How it was checked" hint="e.g. dummy impermeable specimen at the permeation pressures for 24 h." error={errors.leakageMethod?.message}><input {...register("leakageMethod")} /></Field>
        </fieldset>
      )}
      <label className={styles.checkRow}><input type="checkbox" {...register("passed")} /> Passed (within tolerance)</label>
      {errors.passed?.message && <span className="field-error">{errors.passed.message}</span>}
      <button className="button" type="submit" disabled={formState.isSubmitting}>Record calibration</button>
    </form>
  );
}
