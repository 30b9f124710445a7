"use client";

import { useRouter } from "next/navigation";
import { createClientOrganizationAction } from "@/app/(staff)/admin/clients/actions";
import { Field } from "@/components/ui/field";
import { FormNotice, useActionForm } from "@/components/ui/use-action-form";
import { clientOrganizationSchema } from "@/lib/validation/clients";

/** Takes on a new client; its page then takes contacts, portal users and projects. */
export function CreateClientForm() {
  const router = useRouter();
  const { form, onSubmit, notice } = useActionForm({
    schema: clientOrganizationSchema,
    defaultValues: { code: "", name: "", address: "" },
    action: createClientOrganizationAction,
    onSuccess: (org) => router.push(`/admin/clients/${org.code}`),
  });
  const { register, formState } = form;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="New client">
      <FormNotice notice={notice} />
      <Field label="Client code" hint="Short, on paperwork, never reused: e.g. MWA." error={formState.errors.code?.message}><input {...register("code")} /></Field>
      <Field label="Organisation name" error={formState.errors.name?.message}><input {...register("name")} /></Field>
      <Field label="Address" error={formState.errors.address?.message}><textarea rows={3} {...register("address")} /></Field>
      <div><button className="button" type="submit" disabled={formState.isSubmitting}>Create client</button></div>
    </form>
  );
}
