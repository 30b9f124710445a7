/**
 * The lab's numbering scheme for numbers people read: a kind letter, the two-digit year and a counter,
 * e.g. R26-00042 for the 42nd roll logged in 2026. The counter lives in the database and only goes up.
 */
export const LAB_NUMBER_KINDS = {
  shipment: "S",
  roll: "R",
  coupon: "C",
  specimen: "P",
  run: "T",
  certificate: "Q",
} as const;
export type LabNumberKind = keyof typeof LAB_NUMBER_KINDS;

/** The counter key for a kind and year, e.g. "roll-2026". */
export function sequenceKey(kind: LabNumberKind, year: number): string {
  return `${kind}-${year}`;
}

/** Formats a lab number; `value` is the counter's new value (1 or more). */
export function formatLabNumber(kind: LabNumberKind, year: number, value: number): string {
  if (!Number.isInteger(value) || value < 1) throw new RangeError(`counter value must be a positive integer, got ${value}`);
  // Two digits name the year only within one century; record dates are kept inside it (lib/validation/record-dates).
  if (!Number.isInteger(year) || year < 2000 || year > 2099) throw new RangeError(`lab numbers are for the years 2000 to 2099, got ${year}`);
  const yy = String(year % 100).padStart(2, "0");
  return `${LAB_NUMBER_KINDS[kind]}${yy}-${String(value).padStart(5, "0")}`;
}

const PATTERN = /^([SRCPTQ])(\d{2})-(\d{5,})$/;

/** Reads a typed or scanned lab number back into its parts; null when it is not one. */
export function parseLabNumber(text: string): { kind: LabNumberKind; yy: number; value: number } | null {
  const match = PATTERN.exec(text.trim().toUpperCase());
  if (!match) return null;
  const [, letter, yy, value] = match;
  const kind = (Object.keys(LAB_NUMBER_KINDS) as LabNumberKind[]).find((k) => LAB_NUMBER_KINDS[k] === letter);
  if (!kind) return null;
  return { kind, yy: Number(yy), value: Number(value) };
}
