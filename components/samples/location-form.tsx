"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { createStorageLocationAction } from "@/app/(staff)/samples/actions";
import { storageLocationSchema } from "@/lib/validation/samples";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";

export function LocationForm() {
  const router = useRouter();
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<z.input<typeof storageLocationSchema>>({ resolver: zodResolver(storageLocationSchema) });
  const { register, handleSubmit, formState, reset } = form;
  const onSubmit = handleSubmit(async (values) => {
    const result = await createStorageLocationAction(values);
    setNotice({ ok: result.ok, text: result.message });
    if (result.ok) {
      reset({ code: "", name: "", description: "" });
      router.refresh();
    }
    else applyServerErrors(form, result.fieldErrors);
  });
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="New storage location">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      <Field label="Code" hint="Short, as written on the shelf, e.g. RACK-B3." error={formState.errors.code?.message}><input className="mono" {...register("code")} /></Field>
      <Field label="Name" error={formState.errors.name?.message}><input {...register("name")} /></Field>
      <Field label="Description" error={formState.errors.description?.message}><input {...register("description")} /></Field>
      <button className="button" type="submit" disabled={formState.isSubmitting}>Add location</button>
    </form>
  );
}
