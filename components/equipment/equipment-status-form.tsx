"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { setEquipmentStatusAction } from "@/app/(staff)/equipment/actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { EQUIPMENT_STATUS_LABELS, EQUIPMENT_STATUSES, setEquipmentStatusSchema, type EquipmentStatus } from "@/lib/validation/equipment";
import styles from "./equipment.module.css";

/** Puts equipment in or out of service, or retires it; a stale version is refused by the server. */
export function EquipmentStatusForm({ equipmentId, version, status }: { equipmentId: string; version: number; status: EquipmentStatus }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<z.input<typeof setEquipmentStatusSchema>, unknown, z.output<typeof setEquipmentStatusSchema>>({
    resolver: zodResolver(setEquipmentStatusSchema),
    values: { equipmentId, version, status },
  });
  const { register, handleSubmit, formState } = form;
  const onSubmit = handleSubmit(async (values) => {
    const result = await setEquipmentStatusAction(values);
    setNotice({ ok: result.ok, text: result.message });
    if (result.ok) router.refresh();
    else applyServerErrors(form, result.fieldErrors);
  });
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Change status">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      <div className={styles.statusLine}>
        <div className={styles.grow}>
          <Field label="Status" error={formState.errors.status?.message}>
            <select {...register("status")}>{EQUIPMENT_STATUSES.map((s) => <option key={s} value={s}>{EQUIPMENT_STATUS_LABELS[s]}</option>)}</select>
          </Field>
        </div>
        <button className="button button-quiet" type="submit" disabled={formState.isSubmitting || !formState.isDirty}>Change status</button>
      </div>
      <p className="hint">Only equipment in service can be used for a new run. Runs under way are not stopped.</p>
    </form>
  );
}
