"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { createProjectSpecificationAction } from "@/app/(staff)/specifications/actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { createProjectSpecificationSchema } from "@/lib/validation/specifications";

type Option = { id: string; label: string };

const suggestedName = (projects: Array<Option & { code: string }>, projectId: string) => {
  const project = projects.find((p) => p.id === projectId);
  return project ? `${project.code} liner specification` : "";
};

/** A new specification for a project, from a lab template (its limits copied) or empty; opens it once saved. */
export function CreateSpecificationForm({ projects, templates, projectId }: { projects: Array<Option & { code: string }>; templates: Option[]; projectId?: string }) {
  const router = useRouter();
  const [notice, setNotice] = useState<string | null>(null);
  const initialProject = projects.find((p) => p.id === projectId)?.id ?? "";
  const form = useForm<z.input<typeof createProjectSpecificationSchema>, unknown, z.output<typeof createProjectSpecificationSchema>>({
    resolver: zodResolver(createProjectSpecificationSchema),
    defaultValues: { projectId: initialProject, name: suggestedName(projects, initialProject), revision: "", templateId: templates[0]?.id ?? "" },
  });
  const { register, handleSubmit, formState, getValues, setValue } = form;
  const onProjectChange = (previous: string, next: string) => {
    // Keep a name the person typed; replace only the one we suggested.
    const name = getValues("name");
    if (!name || name === suggestedName(projects, previous)) setValue("name", suggestedName(projects, next));
  };
  const onSubmit = handleSubmit(async (values) => {
    const result = await createProjectSpecificationAction(values);
    if (result.ok) {
      router.push(`/specifications/${result.data.id}`);
      return;
    }
    setNotice(result.message);
    applyServerErrors(form, result.fieldErrors);
  });
  const errors = formState.errors;
  const project = register("projectId");
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="New project specification">
      {notice && <div className="notice notice-error" role="status">{notice}</div>}
      <Field label="Project" error={errors.projectId?.message}>
        <select {...project} onChange={(e) => { const previous = getValues("projectId"); void project.onChange(e); onProjectChange(previous, e.target.value); }}>
          <option value="">Choose the project…</option>
          {projects.map((p) => <option key={p.id} value={p.id}>{p.label}</option>)}
        </select>
      </Field>
      <Field label="Name" hint="As the project's documents call it, e.g. Cell 3 liner, GCL specification rev. B." error={errors.name?.message}>
        <input {...register("name")} />
      </Field>
      <Field label="Revision" hint="The specification's own revision or date, e.g. Rev. B, 2026-05; printed on certificates." error={errors.revision?.message}>
        <input {...register("revision")} />
      </Field>
      <Field label="Start from" hint="A template's limits are copied; later changes to the template do not alter this specification." error={errors.templateId?.message}>
        <select {...register("templateId")}>
          {templates.length > 0 && <optgroup label="Lab templates">{templates.map((t) => <option key={t.id} value={t.id}>{t.label}</option>)}</optgroup>}
          <option value="">Nothing: start empty</option>
        </select>
      </Field>
      <p className="hint">The project's newest specification is the one certificates apply.</p>
      <button className="button" type="submit" disabled={formState.isSubmitting}>Create specification</button>
    </form>
  );
}
