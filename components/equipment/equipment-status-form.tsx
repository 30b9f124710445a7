"use client";

import { Field } from "@/components/ui/field";
import { FormNotice, useActionForm } from "@/components/ui/use-action-form";
import { setEquipmentStatusAction } from "@/app/(staff)/equipment/actions";
import { EQUIPMENT_STATUS_LABELS, EQUIPMENT_STATUSES, setEquipmentStatusSchema, type EquipmentStatus } from "@/lib/validation/equipment";
import styles from "./equipment.module.css";

/** Puts equipment in or out of service, or retires it, with the reason; a stale version is refused by the server. */
export function EquipmentStatusForm({ equipmentId, version, status }: { equipmentId: string; version: number; status: EquipmentStatus }) {
  const { form, onSubmit, notice } = useActionForm({
    schema: setEquipmentStatusSchema,
    defaultValues: { equipmentId, version, status, reason: "" },
    action: setEquipmentStatusAction,
  });
  const { register, formState } = form;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Change status">
      <FormNotice notice={notice} />
      <div className={styles.statusLine}>
        <div className={styles.grow}>
          <Field label="Status" error={formState.errors.status?.message}>
            <select {...register("status")}>{EQUIPMENT_STATUSES.map((s) => <option key={s} value={s}>{EQUIPMENT_STATUS_LABELS[s]}</option>)}</select>
          </Field>
        </div>
      </div>
      <Field label="Reason for the change" hint="e.g. membrane seal failed the leak check; back from repair" error={formState.errors.reason?.message}>
        <input {...register("reason")} />
      </Field>
      <div><button className="button button-quiet" type="submit" disabled={formState.isSubmitting}>Change status</button></div>
      <p className="hint">Only equipment in service can be used for a new run. Runs under way are not stopped.</p>
    </form>
  );
}
