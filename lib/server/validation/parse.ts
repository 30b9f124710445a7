import "server-only";
import type { z } from "zod";
import { AppError, type FieldErrors } from "@/lib/errors/app-error";

/** Parses with a shared schema; a failure becomes INVALID_INPUT with one message per field. */
export function parseOrThrow<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const fieldErrors: FieldErrors = {};
  for (const issue of result.error.issues) {
    const key = issue.path.join(".") || "form";
    fieldErrors[key] ??= issue.message;
  }
  throw new AppError("INVALID_INPUT", undefined, { fieldErrors });
}
