"use client";

import { useWatch } from "react-hook-form";
import { addClientContactAction } from "@/app/(staff)/admin/clients/actions";
import { Field } from "@/components/ui/field";
import { FormNotice, useActionForm } from "@/components/ui/use-action-form";
import { clientContactSchema } from "@/lib/validation/clients";
import { ContactFields } from "./contact-fields";

/** A new contact of the client; with portal access, also the client user who signs in to the portal. */
export function AddContactForm({ clientOrganizationId }: { clientOrganizationId: string }) {
  const { form, onSubmit, notice } = useActionForm({
    schema: clientContactSchema,
    defaultValues: { clientOrganizationId, name: "", email: "", phone: "", jobTitle: "", portalAccess: false, password: "" },
    action: addClientContactAction,
    clearOnSuccess: true,
  });
  const { register, formState, control } = form;
  const portal = useWatch({ control, name: "portalAccess" });
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="New contact">
      <FormNotice notice={notice} />
      <ContactFields field={(name) => register(name)} errors={formState.errors} />
      <label><input type="checkbox" {...register("portalAccess")} /> Portal access: this contact signs in to see the client&apos;s projects and certificates</label>
      {portal && (
        <Field label="First portal password" hint="At least 12 characters; give it by a safe route. They can change it under My account." error={formState.errors.password?.message}>
          <input type="password" autoComplete="new-password" {...register("password")} />
        </Field>
      )}
      <div><button className="button" type="submit" disabled={formState.isSubmitting}>Add contact</button></div>
    </form>
  );
}
