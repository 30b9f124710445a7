"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { correctReceiptAction } from "@/app/(staff)/intake/actions";
import { YES_NO_HINT } from "@/lib/custody/yes-no";
import { RECEIPT_FIELD_LABELS } from "@/lib/format/receipt-fields";
import { correctReceiptSchema, ROLL_CORRECTABLE_FIELDS, SHIPMENT_CORRECTABLE_FIELDS } from "@/lib/validation/intake";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";

type Target = { key: string; target: "shipment" | "roll"; id: string; version: number; label: string };

// How to type the fields whose form is not obvious.
const FIELD_HINTS: Record<string, string> = { receivedAt: " (YYYY-MM-DD HH:MM, lab time)", machineDirectionMarked: ` (${YES_NO_HINT})` };
const fieldLabel = (field: string) => `${RECEIPT_FIELD_LABELS[field] ?? field}${FIELD_HINTS[field] ?? ""}`;

/** A correction of one field of a receipt, with the reason; the old value stays in the history. */
export function CorrectionForm({ targets }: { targets: Target[] }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const first = targets[0]!;
  const form = useForm<z.input<typeof correctReceiptSchema> & { targetKey: string }>({
    resolver: zodResolver(correctReceiptSchema) as never,
    defaultValues: { targetKey: first.key, target: first.target, id: first.id, version: first.version, field: SHIPMENT_CORRECTABLE_FIELDS[0], value: "", reason: "" },
  });
  const { register, handleSubmit, formState, control, setValue } = form;
  const targetKey = useWatch({ control, name: "targetKey" });
  const chosen = targets.find((t) => t.key === targetKey) ?? first;
  const fields = chosen.target === "shipment" ? SHIPMENT_CORRECTABLE_FIELDS : ROLL_CORRECTABLE_FIELDS;

  const onTarget = (key: string) => {
    const t = targets.find((x) => x.key === key) ?? first;
    setValue("target", t.target);
    setValue("id", t.id);
    setValue("version", t.version);
    setValue("field", (t.target === "shipment" ? SHIPMENT_CORRECTABLE_FIELDS : ROLL_CORRECTABLE_FIELDS)[0]);
  };

  const onSubmit = handleSubmit(async (values) => {
    const result = await correctReceiptAction(values);
    setNotice({ ok: result.ok, text: result.message });
    if (result.ok) {
      form.reset({ ...values, value: "", reason: "" });
      router.refresh();
    } else applyServerErrors(form, result.fieldErrors);
  });

  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Correct the receipt">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      <Field label="Record">
        <select {...register("targetKey", { onChange: (e) => onTarget(e.target.value) })}>
          {targets.map((t) => <option key={t.key} value={t.key}>{t.label}</option>)}
        </select>
      </Field>
      <Field label="Field" error={formState.errors.field?.message}>
        <select {...register("field")}>{fields.map((f) => <option key={f} value={f}>{fieldLabel(f)}</option>)}</select>
      </Field>
      <Field label="New value" error={formState.errors.value?.message}><input {...register("value")} /></Field>
      <Field label="Reason for the correction" error={formState.errors.reason?.message}><input {...register("reason")} /></Field>
      <button className="button" type="submit" disabled={formState.isSubmitting}>Record correction</button>
    </form>
  );
}
