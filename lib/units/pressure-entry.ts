/**
 * Pressures as people enter and read them. Seepline stores pascals; each person chooses kPa or psi
 * (User.pressureUnit) for entry and display. The psi factor is the exact one from lib/hydraulics
 * (NIST SP 811), so there is one source for it. Pure.
 */
import { KPA_PA, PSI_PA } from "../hydraulics/units";

export const PRESSURE_UNITS = ["KPA", "PSI"] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];

/** The symbol shown beside a value: "kPa" or "psi". */
export const PRESSURE_UNIT_SYMBOLS: Record<PressureUnit, string> = { KPA: "kPa", PSI: "psi" };

/** Pascals in one of the unit: 1000 for kPa, 6894.757 293 168 361 for psi. */
export function paPerUnit(unit: PressureUnit): number {
  return unit === "PSI" ? PSI_PA : KPA_PA;
}

/** A pressure entered in `unit` (kPa or psi) -> Pa. */
export function enteredPressureToPa(value: number, unit: PressureUnit): number {
  return value * paPerUnit(unit);
}

/** A pressure in Pa -> the person's unit (kPa or psi), unrounded. */
export function paToEnteredPressure(pa: number, unit: PressureUnit): number {
  return pa / paPerUnit(unit);
}

/** Default decimals: whole kPa and tenths of a psi (1 kPa ≈ 0.145 psi, so both resolve about 1 kPa). */
const DEFAULT_DECIMALS: Record<PressureUnit, number> = { KPA: 0, PSI: 1 };

/**
 * A stored pressure (Pa) as text in the person's unit, e.g. "1000 kPa" or "145.0 psi"; "—" when there is none.
 * `decimals` overrides the default rounding (whole kPa, tenths of a psi).
 */
export function formatPressure(pa: number | null | undefined, unit: PressureUnit = "KPA", options: { decimals?: number } = {}): string {
  if (pa === null || pa === undefined || !Number.isFinite(pa)) return "—";
  return `${formatPressureNumber(pa, unit, options)} ${PRESSURE_UNIT_SYMBOLS[unit]}`;
}

/** The number alone, as formatPressure rounds it (for an input's default value or a table cell with the unit in its head). */
export function formatPressureNumber(pa: number, unit: PressureUnit, options: { decimals?: number } = {}): string {
  const text = paToEnteredPressure(pa, unit).toFixed(options.decimals ?? DEFAULT_DECIMALS[unit]);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}
