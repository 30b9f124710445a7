import "server-only";
import type { z } from "zod";
import { AppError, type FieldErrors } from "@/lib/errors/app-error";
import { findUnstorableText, UNSTORABLE_TEXT_MESSAGE } from "@/lib/validation/unstorable-text";

/**
 * Parses an operation's input with its shared schema: the one door every submitted value comes through.
 * Text that cannot be stored (NUL, broken characters) is refused first, for any schema; then a schema
 * failure becomes INVALID_INPUT with one message per field.
 */
export function parseOrThrow<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const unstorable = findUnstorableText(input);
  if (unstorable !== null) throw new AppError("INVALID_INPUT", UNSTORABLE_TEXT_MESSAGE, { fieldErrors: { [unstorable]: UNSTORABLE_TEXT_MESSAGE } });
  let result: z.ZodSafeParseResult<z.output<S>>;
  try {
    result = schema.safeParse(input);
  } catch (error) {
    // A schema's own rule broke on a value of the wrong kind: a defect to fix, but the person gets a sentence.
    console.error("a validation rule failed on unexpected input", error);
    throw new AppError("INVALID_INPUT", "The values sent could not be read; reload the page and try again.");
  }
  if (result.success) return result.data;
  const fieldErrors: FieldErrors = {};
  for (const issue of result.error.issues) {
    const key = issue.path.join(".") || "form";
    fieldErrors[key] ??= issue.message;
  }
  throw new AppError("INVALID_INPUT", undefined, { fieldErrors });
}
