"use client";

import { createProjectAction } from "@/app/(staff)/admin/clients/actions";
import { Field } from "@/components/ui/field";
import { FormNotice, useActionForm } from "@/components/ui/use-action-form";
import { projectSchema } from "@/lib/validation/clients";
import { ProjectFields } from "./project-fields";

/** A new project of this client, with its site, optionally starting from one of the lab's specification templates. */
export function AddProjectForm({ clientOrganizationId, templates }: { clientOrganizationId: string; templates: Array<{ id: string; name: string }> }) {
  const { form, onSubmit, notice } = useActionForm({
    schema: projectSchema,
    defaultValues: { clientOrganizationId, code: "", name: "", siteName: "", siteLocation: "", specificationTemplateId: "" },
    action: createProjectAction,
    clearOnSuccess: true,
  });
  const { register, formState } = form;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="New project">
      <FormNotice notice={notice} />
      <Field label="Project code" hint="On receipts and certificates, never reused: e.g. MWA-C5." error={formState.errors.code?.message}><input {...register("code")} /></Field>
      <ProjectFields field={(name) => register(name)} errors={formState.errors} />
      <Field label="Specification" hint="A copy of a template's limits; edit them under Specifications." error={formState.errors.specificationTemplateId?.message}>
        <select {...register("specificationTemplateId")}>
          <option value="">None yet</option>
          {templates.map((t) => <option key={t.id} value={t.id}>Copy of {t.name}</option>)}
        </select>
      </Field>
      <div><button className="button" type="submit" disabled={formState.isSubmitting}>Add project</button></div>
    </form>
  );
}
