import { parseLabNumber, type LabNumberKind } from "../numbering/lab-number";

/** The kinds of item that get a printed label. */
export const LABEL_KINDS = ["roll", "coupon", "specimen"] as const;
export type LabelKind = (typeof LABEL_KINDS)[number];

/** The most labels one request may ask for (ten sheets of 21). */
export const MAX_LABELS = 210;

export type ParsedLabelNumbers = {
  /** Normalised lab numbers of labelled kinds, in the order given, each once. */
  numbers: Array<{ labNumber: string; kind: LabelKind }>;
  /** What was given but is not a roll, coupon or specimen number, as typed (trimmed), each once. */
  rejected: string[];
};

function isLabelKind(kind: LabNumberKind): kind is LabelKind {
  return (LABEL_KINDS as readonly string[]).includes(kind);
}

/**
 * Reads lab numbers typed, pasted or scanned as a list ("R26-00001, r26-00002 C26-00003"): separated by
 * commas, semicolons or white space, case-insensitive, duplicates dropped.
 */
export function parseLabelNumbers(input: string | readonly string[]): ParsedLabelNumbers {
  const parts = (typeof input === "string" ? [input] : input).flatMap((text) => text.split(/[\s,;]+/)).filter(Boolean);
  const seen = new Set<string>();
  const result: ParsedLabelNumbers = { numbers: [], rejected: [] };
  for (const part of parts) {
    const parsed = parseLabNumber(part);
    const labNumber = part.toUpperCase();
    if (seen.has(labNumber)) continue;
    seen.add(labNumber);
    if (parsed && isLabelKind(parsed.kind)) result.numbers.push({ labNumber, kind: parsed.kind });
    else result.rejected.push(part);
  }
  return result;
}
