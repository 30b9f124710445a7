"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type FieldValues } from "react-hook-form";
import type { z } from "zod";
import { applyServerErrors } from "./apply-server-errors";
import { isUnreachable, SERVER_UNREACHABLE } from "./server-unreachable";

type Outcome<T> = { ok: true; data: T; message: string } | { ok: false; message: string; fieldErrors: Record<string, string> };
export type FormNoticeValue = { ok: boolean; text: string } | null;

/**
 * A form checked with its shared zod schema and sent to a server action: the server's refusal lands on the
 * form's fields and in a notice; success shows the action's sentence and refreshes the page's data.
 */
export function useActionForm<S extends z.ZodType<FieldValues, FieldValues>, T>(options: {
  schema: S;
  /** The form's values from the record; when the page's data changes (after a save), the form follows it. */
  defaultValues: z.input<S>;
  action: (values: z.output<S>) => Promise<Outcome<T>>;
  /** After a success: e.g. go to the new record's page. Default: refresh the page's data. */
  onSuccess?: (data: T) => void;
  /** A form that adds records starts blank again after each success; an edit form keeps the saved values. */
  clearOnSuccess?: boolean;
}) {
  const router = useRouter();
  const [notice, setNotice] = useState<FormNoticeValue>(null);
  const form = useForm<z.input<S>, unknown, z.output<S>>({ resolver: zodResolver(options.schema as never) as never, values: options.defaultValues });
  const onSubmit = form.handleSubmit(async (values) => {
    let result: Outcome<T>;
    try {
      result = await options.action(values);
    } catch (error) {
      if (!isUnreachable(error)) throw error;
      return setNotice({ ok: false, text: SERVER_UNREACHABLE });
    }
    setNotice({ ok: result.ok, text: result.message });
    if (!result.ok) return applyServerErrors(form, result.fieldErrors);
    if (options.onSuccess) return options.onSuccess(result.data);
    if (options.clearOnSuccess) form.reset(options.defaultValues);
    router.refresh();
  });
  return { form, onSubmit, notice };
}

/** The sentence a form's last send ended with. */
export function FormNotice({ notice }: { notice: FormNoticeValue }) {
  if (!notice) return null;
  return <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>;
}
