import type { FieldValues, Path, UseFormSetError } from "react-hook-form";

/** Shows the server's per-field messages on the form's own fields. */
export function applyServerErrors<T extends FieldValues>(form: { setError: UseFormSetError<T> }, fieldErrors: Record<string, string>): void {
  for (const [field, message] of Object.entries(fieldErrors)) form.setError(field as Path<T>, { type: "server", message });
}
