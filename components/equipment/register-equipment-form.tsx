"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { registerEquipmentAction } from "@/app/(staff)/equipment/actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { EQUIPMENT_KIND_LABELS } from "@/lib/format/states";
import { PRESSURE_UNIT_SYMBOLS, PRESSURE_UNITS, type PressureUnit } from "@/lib/units/pressure-entry";
import { EQUIPMENT_KINDS, EQUIPMENT_STATUS_LABELS, EQUIPMENT_STATUSES, registerEquipmentSchema } from "@/lib/validation/equipment";
import styles from "./equipment.module.css";

/** The administrator's form for adding an instrument; opens its page once saved. */
export function RegisterEquipmentForm({ pressureUnit }: { pressureUnit: PressureUnit }) {
  const router = useRouter();
  const [notice, setNotice] = useState<string | null>(null);
  const form = useForm<z.input<typeof registerEquipmentSchema>, unknown, z.output<typeof registerEquipmentSchema>>({
    resolver: zodResolver(registerEquipmentSchema),
    defaultValues: { assetTag: "", kind: "PERMEAMETER_CELL", name: "", serialNumber: "", ratedMaxPressure: "", pressureUnit, status: "IN_SERVICE" },
  });
  const { register, handleSubmit, formState } = form;
  const onSubmit = handleSubmit(async (values) => {
    const result = await registerEquipmentAction(values);
    if (result.ok) {
      router.push(`/equipment/${encodeURIComponent(result.data.assetTag)}`);
      return;
    }
    setNotice(result.message);
    applyServerErrors(form, result.fieldErrors);
  });
  const errors = formState.errors;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Register equipment">
      {notice && <div className="notice notice-error" role="status">{notice}</div>}
      <Field label="Asset tag" hint="As on the label fixed to it, e.g. CELL-07. Never reused." error={errors.assetTag?.message}>
        <input className="mono" autoComplete="off" {...register("assetTag")} />
      </Field>
      <Field label="Kind" error={errors.kind?.message}>
        <select {...register("kind")}>{EQUIPMENT_KINDS.map((k) => <option key={k} value={k}>{EQUIPMENT_KIND_LABELS[k]}</option>)}</select>
      </Field>
      <Field label="Name" hint="What the lab calls it, e.g. Flexible-wall permeameter cell 7." error={errors.name?.message}><input {...register("name")} /></Field>
      <Field label="Serial number" hint="The maker's, if it has one." error={errors.serialNumber?.message}><input {...register("serialNumber")} /></Field>
      <div className={styles.pressureRow}>
        <Field label="Rated maximum pressure" hint="From the maker's plate or certificate; required for cells and transducers." error={errors.ratedMaxPressure?.message}>
          <input inputMode="decimal" {...register("ratedMaxPressure")} />
        </Field>
        <Field label="Unit" error={errors.pressureUnit?.message}>
          <select {...register("pressureUnit")}>{PRESSURE_UNITS.map((u) => <option key={u} value={u}>{PRESSURE_UNIT_SYMBOLS[u]}</option>)}</select>
        </Field>
      </div>
      <Field label="Status" hint="Equipment not in service cannot be used for a new run." error={errors.status?.message}>
        <select {...register("status")}>{EQUIPMENT_STATUSES.map((s) => <option key={s} value={s}>{EQUIPMENT_STATUS_LABELS[s]}</option>)}</select>
      </Field>
      <button className="button" type="submit" disabled={formState.isSubmitting}>Register equipment</button>
    </form>
  );
}
