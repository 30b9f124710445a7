/**
 * How the certificate writes units, custody steps, roles and numbers. Pure, so the document and its
 * tests say the same thing.
 */
import { formatDate, formatDateTime } from "../format/dates";
import { ROLE_LABELS, type RoleName } from "../policy/permissions";

/** The two statements every certificate carries (DOMAIN.md, "Cautions the software must carry"). */
export const CERTIFICATE_CAUTIONS = [
  "The results relate only to the specimens tested, as received and prepared by the laboratory.",
  "Design decisions based on these results rest with the responsible engineer, under local codes and licensed practice.",
] as const;

/** "m3/m2/s" -> "m³/m²/s": unit text as entered, with powers of metres set as superscripts. */
export function prettyUnit(unit: string): string {
  return unit.replace(/\b([ckm]?m)([23])(?![0-9])/g, (_, metres: string, power: string) => `${metres}${power === "2" ? "²" : "³"}`);
}

const CUSTODY_WORDS: Record<string, string> = {
  RECEIVED: "Received", STORED: "Stored", MOVED: "Moved", CUT: "Cut", PREPARED: "Prepared", ASSIGNED: "Mounted in cell",
  TEST_STARTED: "Test started", TESTED: "Tested", RETAINED: "Retained", DISPOSED: "Disposed", CORRECTED: "Corrected", WITHDRAWN: "Taken out of cell",
};

/** Text with its first letter capitalised, for table cells ("received" -> "Received"). */
export function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** A custody action as a word ("TEST_STARTED" -> "Test started"); other text is kept, capitalised. */
export function custodyActionLabel(action: string): string {
  return CUSTODY_WORDS[action] ?? capitalise(action);
}

/**
 * A result as printed with its unit. The snapshot's display may already carry the unit
 * ("2.4 × 10⁻⁹ m³/m²/s") or not ("2.4e-9"); the unit is added only when it is missing.
 */
export function valueWithUnit(display: string, unit: string): string {
  const text = display.trim();
  // A display written in another unit of the same kind (cm/s for a result stored in m/s) carries it already.
  const units = [unit, prettyUnit(unit), ...DISPLAY_UNITS];
  return units.some((u) => text.endsWith(` ${u}`)) ? text : `${text} ${prettyUnit(unit)}`;
}

const DISPLAY_UNITS = ["m³/m²/s", "cm³/cm²/s", "m/s", "cm/s", "mL/2 g", "mL", "kg/m²", "g/m²", "%", "kN/m", "N/m"];

/** An uncertainty as printed under a heading that already says "(k = 2)": the repeated coverage factor is dropped. */
export function withoutCoverageFactor(uncertainty: string): string {
  return uncertainty.replace(/\s*\(k\s*=\s*2\)\s*$/, "");
}

/** A role code as a person's title ("QA_MANAGER" -> "QA manager"); any other text stays as given. */
export function roleLabel(role: string): string {
  return ROLE_LABELS[role as RoleName] ?? role;
}

/**
 * A measured condition for print: at most `decimals` places, trailing zeros dropped ("34.50" -> "34.5"),
 * or "not recorded" when there is no value.
 */
export function conditionValue(value: number | null, unit: string, decimals = 1): string {
  if (value === null || !Number.isFinite(value)) return "not recorded";
  const text = value.toFixed(decimals).replace(/(\.\d*?)0+$/, "$1").replace(/\.$/, "");
  return `${text} ${unit}`;
}

/** The date of an ISO time in the lab's time zone ("2026-12-01"), as the lab writes dates; "—" when missing. */
export function isoDate(iso: string | null, zone = "UTC"): string {
  if (!iso) return "—";
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso.slice(0, 10) : formatDate(date, zone);
}

/** "2026-12-01 14:05 UTC" (or "... CET" in the lab's zone) from an ISO time; "—" when missing. */
export function isoDateTime(iso: string | null, zone = "UTC"): string {
  if (!iso) return "—";
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : formatDateTime(date, zone);
}
