/**
 * Units and exact conversion factors (NIST SP 811, 2008 edition, Appendix B).
 * Everything inside lib/hydraulics is SI; these helpers convert at the edges.
 */
import { waterDensityKgPerM3 } from "./water";

/** International inch, exact by definition (1959): 0.0254 m. */
export const INCH_M = 0.0254;
/** International avoirdupois pound, exact by definition: 0.453 592 37 kg. */
export const POUND_KG = 0.45359237;
/** Standard acceleration of gravity g_n, exact by definition (3rd CGPM, 1901): 9.806 65 m/s^2. */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
/** Pound-force = pound × g_n, exact: 4.448 221 615 260 5 N. */
export const POUND_FORCE_N = POUND_KG * STANDARD_GRAVITY_M_PER_S2;
/** psi = lbf / in^2, derived from the two exact definitions: 6894.757 293 168 361 Pa. */
export const PSI_PA = POUND_FORCE_N / (INCH_M * INCH_M);
/** Millilitre = 1e-6 m^3 exactly (the litre is 1 dm^3 since 1964). */
export const ML_M3 = 1e-6;
export const MM_M = 1e-3;
export const CM_M = 1e-2;
export const KPA_PA = 1e3;
export const MINUTE_S = 60;
export const HOUR_S = 3600;
export const DAY_S = 86400;
/** Conventional unit weight of water used by many labs and textbooks: 9.81 kN/m^3. */
export const CONVENTIONAL_UNIT_WEIGHT_KN_PER_M3 = 9.81;

/** kPa -> Pa. */
export const kPaToPa = (kPa: number): number => kPa * KPA_PA;
/** Pa -> kPa. */
export const paToKPa = (pa: number): number => pa / KPA_PA;
/** psi -> kPa (exact factor 6.894757293168361). */
export const psiToKPa = (psi: number): number => (psi * PSI_PA) / KPA_PA;
/** kPa -> psi. */
export const kPaToPsi = (kPa: number): number => (kPa * KPA_PA) / PSI_PA;
/** inch -> mm (exact 25.4). */
export const inchToMm = (inch: number): number => (inch * INCH_M) / MM_M;
/** mm -> inch. */
export const mmToInch = (mm: number): number => (mm * MM_M) / INCH_M;
/** mm -> m. */
export const mmToM = (mm: number): number => mm * MM_M;
/** mL -> m^3. */
export const mlToM3 = (ml: number): number => ml * ML_M3;
/** m^3 -> mL. */
export const m3ToMl = (m3: number): number => m3 / ML_M3;
/** m/s -> cm/s (factor 100). */
export const mPerSToCmPerS = (mPerS: number): number => mPerS / CM_M;
/** cm/s -> m/s. */
export const cmPerSToMPerS = (cmPerS: number): number => cmPerS * CM_M;
/** minutes -> s. */
export const minutesToS = (min: number): number => min * MINUTE_S;
/** hours -> s. */
export const hoursToS = (h: number): number => h * HOUR_S;
/** s -> hours. */
export const sToHours = (s: number): number => s / HOUR_S;
/** days -> s. */
export const daysToS = (d: number): number => d * DAY_S;

/**
 * Which unit weight of water converts pressure to head. The two differ by 0.2 to 0.3 % in k,
 * so a result records which one it used.
 * - "conventional-9.81": 9.81 kN/m^3 whatever the temperature (the default: it is what most
 *   lab worksheets and the usual textbook examples use).
 * - "density-at-temperature": rho_w(T) × g_n, with rho_w from Tanaka et al. (2001).
 */
export type UnitWeightBasis = "conventional-9.81" | "density-at-temperature";

export const DEFAULT_UNIT_WEIGHT_BASIS: UnitWeightBasis = "conventional-9.81";

/** Unit weight of water in kN/m^3 at temperatureC (°C) on the given basis. */
export function unitWeightOfWaterKNPerM3(
  temperatureC: number,
  basis: UnitWeightBasis = DEFAULT_UNIT_WEIGHT_BASIS,
): number {
  if (basis === "conventional-9.81") return CONVENTIONAL_UNIT_WEIGHT_KN_PER_M3;
  return (waterDensityKgPerM3(temperatureC) * STANDARD_GRAVITY_M_PER_S2) / 1000;
}

/** Pressure (kPa) -> head of water (m) for a unit weight in kN/m^3: h = p / gamma_w. */
export function pressureKPaToHeadM(pressureKPa: number, unitWeightKNPerM3: number): number {
  return pressureKPa / unitWeightKNPerM3;
}
