"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { createUserAction } from "@/app/(staff)/admin/users/actions";
import { ROLE_LABELS, ROLES } from "@/lib/policy/permissions";
import { createUserSchema, type CreateUserInput } from "@/lib/validation/account";
import { Field } from "@/components/ui/field";
import { applyServerErrors } from "@/components/ui/apply-server-errors";

export function CreateUserForm({ organizations }: { organizations: Array<{ id: string; name: string }> }) {
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<CreateUserInput>({ resolver: zodResolver(createUserSchema), defaultValues: { role: "TECHNICIAN", clientOrganizationId: "" } });
  const { register, handleSubmit, formState, reset, control } = form;
  const role = useWatch({ control, name: "role" });

  const onSubmit = handleSubmit(async (values) => {
    const result = await createUserAction(values);
    setNotice({ ok: result.ok, text: result.message });
    if (result.ok) reset({ role: values.role, clientOrganizationId: "", name: "", email: "", password: "" });
    else applyServerErrors(form, result.fieldErrors);
  });

  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="New account">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      <Field label="Full name" error={formState.errors.name?.message}><input {...register("name")} /></Field>
      <Field label="E-mail" error={formState.errors.email?.message}><input type="email" {...register("email")} /></Field>
      <Field label="Role" error={formState.errors.role?.message}>
        <select {...register("role")}>{ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}</select>
      </Field>
      {role === "CLIENT_USER" && (
        <Field label="Client organisation" error={formState.errors.clientOrganizationId?.message}>
          <select {...register("clientOrganizationId")}>
            <option value="">Choose…</option>
            {organizations.map((o) => <option key={o.id} value={o.id}>{o.name}</option>)}
          </select>
        </Field>
      )}
      <Field label="First password" hint="At least 12 characters." error={formState.errors.password?.message}>
        <input type="password" autoComplete="new-password" {...register("password")} />
      </Field>
      <button className="button" type="submit" disabled={formState.isSubmitting}>Create account</button>
    </form>
  );
}
