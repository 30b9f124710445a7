"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type Path } from "react-hook-form";
import { createMethodSettingsVersionAction } from "@/app/(staff)/methods/actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { methodSettingsDefinition } from "@/lib/methods/registry";
import { methodSettingsChangeSchema } from "@/lib/validation/methods";
import styles from "./methods.module.css";

type FormValues = { methodCode: string; basedOnVersion: number; reason: string; values: Record<string, string> };

/**
 * Changing a method's settings: every field of the method's definition, prefilled with the version in
 * force, and the reason. Saving makes a new version; the old one stays as it was.
 */
export function MethodSettingsForm({ methodCode, basedOnVersion, current }: { methodCode: string; basedOnVersion: number; current: Record<string, unknown> }) {
  const router = useRouter();
  const definition = methodSettingsDefinition(methodCode)!;
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const initial = (): FormValues => ({
    methodCode, basedOnVersion, reason: "",
    values: Object.fromEntries(definition.fields.map((f) => [f.key, current[f.key] === null || current[f.key] === undefined ? "" : String(current[f.key])])),
  });
  const form = useForm<FormValues>({ resolver: zodResolver(methodSettingsChangeSchema(definition)) as never, defaultValues: initial() });
  const { register, handleSubmit, formState } = form;
  const errors = (formState.errors.values ?? {}) as Record<string, { message?: string } | undefined>;
  const onSubmit = handleSubmit(async (values) => {
    const result = await createMethodSettingsVersionAction(values);
    setNotice({ ok: result.ok, text: result.message });
    if (result.ok) router.refresh();
    else applyServerErrors(form, result.fieldErrors);
  });
  const groups = [...new Set(definition.fields.map((f) => f.group))];
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label={`Change the ASTM ${methodCode} settings`}>
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status" data-testid="settings-message">{notice.text}</div>}
      {groups.map((group) => (
        <fieldset key={group} className={styles.group}>
          <legend><strong>{group}</strong></legend>
          <div className={styles.fields}>
            {definition.fields.filter((f) => f.group === group).map((f) => (
              <Field key={f.key} label={`${f.label}${f.unit ? ` (${f.unit})` : ""}`} hint={f.optional ? "May be left blank." : undefined} error={errors[f.key]?.message}>
                {f.choices ? (
                  <select {...register(`values.${f.key}` as Path<FormValues>)}>{f.choices.map((c) => <option key={c.value} value={c.value}>{c.label}</option>)}</select>
                ) : (
                  <input inputMode="decimal" {...register(`values.${f.key}` as Path<FormValues>)} />
                )}
              </Field>
            ))}
          </div>
        </fieldset>
      ))}
      <Field label="Reason for the change" hint="Kept with the new version and shown wherever it is used." error={formState.errors.reason?.message ?? (formState.errors as Record<string, { message?: string }>).form?.message}>
        <input {...register("reason")} />
      </Field>
      <button className="button" type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? "Saving…" : `Save as version ${basedOnVersion + 1}`}</button>
    </form>
  );
}
