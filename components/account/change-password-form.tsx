"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { changeOwnPasswordAction } from "@/app/(account)/account/actions";
import { changeOwnPasswordSchema, type ChangeOwnPasswordInput } from "@/lib/validation/account";
import { Field } from "@/components/ui/field";
import { applyServerErrors } from "@/components/ui/apply-server-errors";

export function ChangePasswordForm() {
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<ChangeOwnPasswordInput>({ resolver: zodResolver(changeOwnPasswordSchema) });
  const { register, handleSubmit, formState, reset } = form;

  const onSubmit = handleSubmit(async (values) => {
    const result = await changeOwnPasswordAction(values);
    setNotice({ ok: result.ok, text: result.message });
    if (result.ok) reset({ currentPassword: "", newPassword: "", confirmPassword: "" });
    else applyServerErrors(form, result.fieldErrors);
  });

  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Change password">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      <Field label="Present password" error={formState.errors.currentPassword?.message}><input type="password" autoComplete="current-password" {...register("currentPassword")} /></Field>
      <Field label="New password" hint="At least 12 characters." error={formState.errors.newPassword?.message}><input type="password" autoComplete="new-password" {...register("newPassword")} /></Field>
      <Field label="New password again" error={formState.errors.confirmPassword?.message}><input type="password" autoComplete="new-password" {...register("confirmPassword")} /></Field>
      <button className="button" type="submit" disabled={formState.isSubmitting}>Change password</button>
    </form>
  );
}
