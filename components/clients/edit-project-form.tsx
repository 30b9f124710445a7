"use client";

import { updateProjectAction } from "@/app/(staff)/admin/clients/actions";
import { FormNotice, useActionForm } from "@/components/ui/use-action-form";
import { updateProjectSchema } from "@/lib/validation/clients";
import { ProjectFields } from "./project-fields";

type Props = { projectId: string; version: number; name: string; siteName: string; siteLocation: string; active: boolean };

/** Changes a project's name or site, or deactivates it (no longer offered at intake). */
export function EditProjectForm(values: Props) {
  const { form, onSubmit, notice } = useActionForm({ schema: updateProjectSchema, defaultValues: values, action: updateProjectAction });
  const { register, formState } = form;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label={`Edit project ${values.name}`}>
      <FormNotice notice={notice} />
      <ProjectFields field={(name) => register(name)} errors={formState.errors} />
      <label><input type="checkbox" {...register("active")} /> Active project</label>
      <div><button className="button button-quiet" type="submit" disabled={formState.isSubmitting}>Save project</button></div>
    </form>
  );
}
