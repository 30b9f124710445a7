"use client";

import { updateClientOrganizationAction } from "@/app/(staff)/admin/clients/actions";
import { Field } from "@/components/ui/field";
import { FormNotice, useActionForm } from "@/components/ui/use-action-form";
import { updateClientOrganizationSchema } from "@/lib/validation/clients";

type Props = { clientOrganizationId: string; version: number; name: string; address: string; active: boolean };

/** A client's name and address, and whether the lab still takes work from it. */
export function ClientDetailsForm(props: Props) {
  const { form, onSubmit, notice } = useActionForm({ schema: updateClientOrganizationSchema, defaultValues: props, action: updateClientOrganizationAction });
  const { register, formState } = form;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Client details">
      <FormNotice notice={notice} />
      <Field label="Organisation name" error={formState.errors.name?.message}><input {...register("name")} /></Field>
      <Field label="Address" error={formState.errors.address?.message}><textarea rows={3} {...register("address")} /></Field>
      <label><input type="checkbox" {...register("active")} /> Active: offered at intake, its portal users may sign in</label>
      <p className="hint">Deactivating the client also deactivates its portal accounts; nothing of its record is deleted.</p>
      <div><button className="button button-quiet" type="submit" disabled={formState.isSubmitting}>Save client</button></div>
    </form>
  );
}
