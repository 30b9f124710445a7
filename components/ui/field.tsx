import { Children, cloneElement, isValidElement, useId } from "react";

/** A labelled form field with its error message tied to the input for screen readers. */
export function Field({ label, error, hint, children }: { label: string; error?: string; hint?: string; children: React.ReactElement }) {
  const id = useId();
  const child = Children.only(children);
  const input = isValidElement<Record<string, unknown>>(child)
    ? cloneElement(child, { id, "aria-invalid": error ? true : undefined, "aria-describedby": error ? `${id}-error` : undefined })
    : child;
  return (
    <div className="field">
      <label htmlFor={id}>{label}</label>
      {input}
      {hint && !error && <span className="hint">{hint}</span>}
      {error && <span className="field-error" id={`${id}-error`}>{error}</span>}
    </div>
  );
}
