"use client";

import { updateClientContactAction } from "@/app/(staff)/admin/clients/actions";
import { FormNotice, useActionForm } from "@/components/ui/use-action-form";
import { updateClientContactSchema } from "@/lib/validation/clients";
import { ContactFields } from "./contact-fields";

type Props = { contactId: string; version: number; name: string; email: string; phone: string; jobTitle: string; active: boolean; hasPortalAccount: boolean };

/** Changes a contact's details or deactivates the contact (and their portal account). */
export function EditContactForm({ hasPortalAccount, ...values }: Props) {
  const { form, onSubmit, notice } = useActionForm({ schema: updateClientContactSchema, defaultValues: values, action: updateClientContactAction });
  const { register, formState } = form;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label={`Edit contact ${values.name}`}>
      <FormNotice notice={notice} />
      <ContactFields field={(name) => register(name)} errors={formState.errors} />
      <label><input type="checkbox" {...register("active")} /> Active contact</label>
      {hasPortalAccount && <p className="hint">The portal account follows the name and e-mail; deactivating the contact deactivates the account.</p>}
      <div><button className="button button-quiet" type="submit" disabled={formState.isSubmitting}>Save contact</button></div>
    </form>
  );
}
