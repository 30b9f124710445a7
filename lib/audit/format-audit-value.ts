/**
 * One value of an audited row as a person reads it: pressures in their unit, seconds as hours, times in
 * UTC to the second, states in words, ids as the lab number or name they point at. Values are shown to
 * ten significant digits (which removes binary noise such as 0.30000000000000004 and nothing else), so a
 * correction of the last digit stays visible. Pure.
 */
import { formatUnit } from "../results/format-result";
import { paToEnteredPressure, PRESSURE_UNIT_SYMBOLS, type PressureUnit } from "../units/pressure-entry";
import { auditFieldSpec, type AuditFieldSpec, type AuditRefKind } from "./audit-fields";
import { wordsOf } from "./audit-tables";

export type AuditValueContext = {
  pressureUnit: PressureUnit;
  /** The row the value belongs to (for a unit named in another column). */
  row: Record<string, unknown>;
  /** The lab number or name behind an id, when the server found it. */
  refLabel: (ref: AuditRefKind, id: string) => string | undefined;
};

export const NO_VALUE = "—";
const MAX_TEXT = 300;

/** A number without float noise: 10 significant digits, trailing zeros dropped. */
export function cleanNumber(value: number): string {
  return String(Number(value.toPrecision(10)));
}

/** A stored timestamp (text without a zone is UTC, as Prisma stores it) as "2026-12-01 14:05:09 UTC". */
export function formatAuditTime(value: string | Date): string {
  const date = value instanceof Date ? value : new Date(/[zZ]|[+-]\d{2}:?\d{2}$/.test(value) ? value : `${value}Z`);
  return Number.isNaN(date.getTime()) ? String(value) : `${date.toISOString().slice(0, 19).replace("T", " ")} UTC`;
}

function plain(value: unknown, ctx: AuditValueContext): string {
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (typeof value === "number") return cleanNumber(value);
  if (typeof value === "string") return value.length > MAX_TEXT ? `${value.slice(0, MAX_TEXT)}…` : value;
  if (Array.isArray(value)) return truncate(JSON.stringify(value));
  if (typeof value === "object" && value) {
    // A flat set of values (a calibration's burette areas) reads like the row itself; deeper ones as JSON.
    const entries = Object.entries(value as Record<string, unknown>);
    if (entries.some(([, v]) => typeof v === "object" && v !== null)) return truncate(JSON.stringify(value));
    return entries.map(([k, v]) => `${auditFieldSpec("", k).label}: ${formatAuditValue(auditFieldSpec("", k), v, ctx)}`).join("; ");
  }
  return String(value);
}

const truncate = (text: string) => (text.length > MAX_TEXT ? `${text.slice(0, MAX_TEXT)}…` : text);

/** `value` of a column described by `spec`, as text; "—" for none. */
export function formatAuditValue(spec: AuditFieldSpec, value: unknown, ctx: AuditValueContext): string {
  if (value === null || value === undefined || value === "") return NO_VALUE;
  switch (spec.kind) {
    case "hidden":
    case "secret":
      return NO_VALUE;
    case "summary":
      return "stored (too large to show here; see the record itself)";
    case "datetime":
      return typeof value === "string" || value instanceof Date ? formatAuditTime(value) : plain(value, ctx);
    case "enum":
      return typeof value === "string" ? (spec.words[value] ?? wordsOf(value)) : plain(value, ctx);
    case "ref":
      return typeof value === "string" ? (ctx.refLabel(spec.ref, value) ?? value) : plain(value, ctx);
    case "pressure":
      return typeof value === "number" ? `${cleanNumber(paToEnteredPressure(value, ctx.pressureUnit))} ${PRESSURE_UNIT_SYMBOLS[ctx.pressureUnit]}` : plain(value, ctx);
    case "elapsed":
      return typeof value === "number" ? `${Number((value / 3600).toFixed(4))} h` : plain(value, ctx);
    case "number":
      return typeof value === "number" ? `${cleanNumber(value)}${spec.unit ? ` ${spec.unit}` : ""}` : plain(value, ctx);
    case "row-unit": {
      const unit = typeof ctx.row.unit === "string" ? ` ${formatUnit(ctx.row.unit)}` : "";
      return typeof value === "number" ? `${cleanNumber(value)}${unit}` : plain(value, ctx);
    }
    case "plain":
      return plain(value, ctx);
  }
}
