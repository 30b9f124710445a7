import type { UseFormRegisterReturn } from "react-hook-form";
import { Field } from "@/components/ui/field";

type Key = "name" | "siteName" | "siteLocation";

/** The fields every project has, shared by the add and edit forms (`field` registers one of them). */
export function ProjectFields({ field, errors }: { field: (name: Key) => UseFormRegisterReturn; errors: Partial<Record<Key, { message?: string }>> }) {
  return (
    <>
      <Field label="Project name" error={errors.name?.message}><input {...field("name")} /></Field>
      <Field label="Site" hint="The site the liner is for, e.g. the landfill cell or pond." error={errors.siteName?.message}><input {...field("siteName")} /></Field>
      <Field label="Site location" error={errors.siteLocation?.message}><input {...field("siteLocation")} /></Field>
    </>
  );
}
