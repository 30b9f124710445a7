"use client";

import { Field } from "@/components/ui/field";
import { FormNotice, useActionForm } from "@/components/ui/use-action-form";
import { editEquipmentAction } from "@/app/(staff)/equipment/actions";
import { editEquipmentSchema } from "@/lib/validation/equipment-edit";

type Props = { equipmentId: string; version: number; name: string; serialNumber: string | null; ratedMaxPressure: string; pressureUnit: "KPA" | "PSI" };

/** Corrects an instrument's register entry; each changed field is kept with its old value and the reason. */
export function EditEquipmentForm({ equipmentId, version, name, serialNumber, ratedMaxPressure, pressureUnit }: Props) {
  const { form, onSubmit, notice } = useActionForm({
    schema: editEquipmentSchema,
    defaultValues: { equipmentId, version, name, serialNumber: serialNumber ?? "", ratedMaxPressure, pressureUnit, reason: "" },
    action: editEquipmentAction,
  });
  const { register, formState } = form;
  const unit = pressureUnit === "PSI" ? "psi" : "kPa";
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Edit the register entry">
      <FormNotice notice={notice} />
      <Field label="Name" error={formState.errors.name?.message}><input {...register("name")} /></Field>
      <Field label="Serial number" error={formState.errors.serialNumber?.message}><input {...register("serialNumber")} /></Field>
      <Field label={`Rated maximum pressure (${unit})`} error={formState.errors.ratedMaxPressure?.message}><input inputMode="decimal" {...register("ratedMaxPressure")} /></Field>
      <Field label="Reason for the change" error={formState.errors.reason?.message}><input {...register("reason")} /></Field>
      <div><button className="button button-quiet" type="submit" disabled={formState.isSubmitting}>Save changes</button></div>
    </form>
  );
}
