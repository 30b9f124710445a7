import type { FieldValues, Path, UseFormReturn } from "react-hook-form";

/** Shows the server's per-field messages on the form's own fields. */
export function applyServerErrors<T extends FieldValues>(form: UseFormReturn<T>, fieldErrors: Record<string, string>): void {
  for (const [field, message] of Object.entries(fieldErrors)) form.setError(field as Path<T>, { type: "server", message });
}
