import { z } from "zod";

/** A number typed into a form: accepts "6,8" as 6.8, refuses blanks and words with a plain message. */
export function measured(label: string, options: { min?: number; max?: number; positive?: boolean } = {}) {
  let schema = z.coerce.number({ message: `Enter ${label} as a number.` }).refine(Number.isFinite, `Enter ${label} as a number.`);
  if (options.positive) schema = schema.refine((v) => v > 0, `${capitalise(label)} must be more than 0.`);
  if (options.min !== undefined) schema = schema.refine((v) => v >= options.min!, `${capitalise(label)} must be at least ${options.min}.`);
  if (options.max !== undefined) schema = schema.refine((v) => v <= options.max!, `${capitalise(label)} must be at most ${options.max}.`);
  return z.preprocess((v) => (typeof v === "string" ? (v.trim() === "" ? undefined : v.trim().replace(",", ".")) : v), schema);
}

export function optionalMeasured(label: string, options: { min?: number; max?: number; positive?: boolean } = {}) {
  return z.preprocess((v) => (v === "" || v === null ? undefined : v), measured(label, options).optional());
}

export const requiredText = (label: string, max = 200) =>
  z.string({ message: `Enter ${label}.` }).trim().min(1, `Enter ${label}.`).max(max, `${capitalise(label)} is longer than ${max} characters.`);

export const reasonSchema = z.string({ message: "Say why, in a few words (at least 5 characters)." }).trim().min(5, "Say why, in a few words (at least 5 characters).").max(500);

/** A date-time from a datetime-local input or ISO text: a real date, within the lab's records, not in the future. */
export { pastDateTime } from "./record-dates";

export const versionSchema = z.coerce.number().int().positive();

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
