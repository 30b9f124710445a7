import type { UseFormRegisterReturn } from "react-hook-form";
import { Field } from "@/components/ui/field";

type Key = "name" | "email" | "phone" | "jobTitle";

/** The fields every contact has, shared by the add and edit forms (`field` registers one of them). */
export function ContactFields({ field, errors }: { field: (name: Key) => UseFormRegisterReturn; errors: Partial<Record<Key, { message?: string }>> }) {
  return (
    <>
      <Field label="Contact name" error={errors.name?.message}><input {...field("name")} /></Field>
      <Field label="Contact e-mail" hint="Required: the lab writes to its contacts." error={errors.email?.message}><input type="email" {...field("email")} /></Field>
      <Field label="Phone" error={errors.phone?.message}><input {...field("phone")} /></Field>
      <Field label="Job title" error={errors.jobTitle?.message}><input {...field("jobTitle")} /></Field>
    </>
  );
}
