/**
 * What a calibration record holds beyond its dates (Calibration.values), by kind of instrument, read back
 * from the stored JSON. A burette panel: the two burette areas, each burette's zero above the datum the
 * two share, and the calibrated range of its scale. Every measuring instrument: its standard uncertainty
 * (k = 1) in the unit of what it measures. A permeameter cell: its apparatus leakage check (ASTM D5887).
 * Pure.
 */
import { z } from "zod";

export type UncertaintyQuantity = "volumeMl" | "pressureKPa" | "temperatureC" | "thicknessMm" | "timeS";
/** What an instrument measures: the hydraulic quantities, and the masses and forces of index tests. */
export type InstrumentQuantity = UncertaintyQuantity | "massG" | "forceN";

/** What each kind of instrument measures, for its standard uncertainty. */
export const UNCERTAINTY_BY_KIND: Readonly<Record<string, { quantity: InstrumentQuantity; unit: string; what: string }>> = {
  BURETTE_PANEL: { quantity: "volumeMl", unit: "mL", what: "one burette reading (volume)" },
  PRESSURE_TRANSDUCER: { quantity: "pressureKPa", unit: "kPa", what: "the differential pressure" },
  THERMOMETER: { quantity: "temperatureC", unit: "°C", what: "the permeant temperature" },
  THICKNESS_GAUGE: { quantity: "thicknessMm", unit: "mm", what: "the bentonite layer thickness" },
  TIMER: { quantity: "timeS", unit: "s", what: "one time stamp" },
  BALANCE: { quantity: "massG", unit: "g", what: "one weighing" },
  OVEN: { quantity: "temperatureC", unit: "°C", what: "the oven temperature" },
  GRADUATED_CYLINDER: { quantity: "volumeMl", unit: "mL", what: "one volume reading" },
  FILTER_PRESS: { quantity: "pressureKPa", unit: "kPa", what: "the filter-press pressure" },
  LOAD_CELL: { quantity: "forceN", unit: "N", what: "one force reading" },
};

const num = z.number().refine(Number.isFinite);
const storedSchema = z
  .object({
    inflowBuretteAreaM2: num.positive(),
    outflowBuretteAreaM2: num.positive(),
    inflowZeroAboveDatumMm: num,
    outflowZeroAboveDatumMm: num,
    scaleMinMm: num,
    scaleMaxMm: num,
    standardUncertainty: num.nonnegative(),
    leakageCheckedAt: z.string(),
    leakageMethod: z.string(),
    leakageRateM3PerS: num.nonnegative(),
    leakageFluxM3PerM2PerS: num.nonnegative(),
  })
  .partial();
export type StoredCalibrationValues = z.infer<typeof storedSchema>;

/** The stored values, keeping only the keys that parse (an older record may lack any of them). */
export function readCalibrationValues(values: unknown): StoredCalibrationValues {
  if (values === null || typeof values !== "object") return {};
  const out: Record<string, unknown> = {};
  const shape = storedSchema.shape;
  for (const [key, value] of Object.entries(values as Record<string, unknown>)) {
    const field = shape[key as keyof typeof shape];
    if (field && field.safeParse(value).success) out[key] = value;
  }
  return out as StoredCalibrationValues;
}

/** A burette panel as the readings and the head need it: areas (mm²), zero offsets above the datum and scale range (mm). */
export type BurettePanelCalibration = {
  inflowAreaMm2: number;
  outflowAreaMm2: number;
  /** Height of each burette's zero mark above the datum the two share, mm (0 when not recorded). */
  inflowZeroAboveDatumMm: number;
  outflowZeroAboveDatumMm: number;
  /** The calibrated range of the scale readings, mm, or null when the calibration gives none. */
  scaleRangeMm: { min: number; max: number } | null;
};

/** The burette panel's calibration, or null when it records no burette areas. */
export function readBurettePanel(values: unknown): BurettePanelCalibration | null {
  const v = readCalibrationValues(values);
  if (v.inflowBuretteAreaM2 === undefined || v.outflowBuretteAreaM2 === undefined) return null;
  return {
    inflowAreaMm2: v.inflowBuretteAreaM2 * 1e6,
    outflowAreaMm2: v.outflowBuretteAreaM2 * 1e6,
    inflowZeroAboveDatumMm: v.inflowZeroAboveDatumMm ?? 0,
    outflowZeroAboveDatumMm: v.outflowZeroAboveDatumMm ?? 0,
    scaleRangeMm: v.scaleMinMm !== undefined && v.scaleMaxMm !== undefined ? { min: v.scaleMinMm, max: v.scaleMaxMm } : null,
  };
}

/** A cell's apparatus leakage check: when, how, and the rate as a flow (m³/s) or as a flux (m³/m²/s). */
export type LeakageCheck = { checkedAt: string; method: string } & ({ rateM3PerS: number; fluxM3PerM2PerS?: undefined } | { fluxM3PerM2PerS: number; rateM3PerS?: undefined });

export function readLeakageCheck(values: unknown): LeakageCheck | null {
  const v = readCalibrationValues(values);
  if (v.leakageCheckedAt === undefined || v.leakageMethod === undefined) return null;
  if (v.leakageRateM3PerS !== undefined) return { checkedAt: v.leakageCheckedAt, method: v.leakageMethod, rateM3PerS: v.leakageRateM3PerS };
  if (v.leakageFluxM3PerM2PerS !== undefined) return { checkedAt: v.leakageCheckedAt, method: v.leakageMethod, fluxM3PerM2PerS: v.leakageFluxM3PerM2PerS };
  return null;
}

/** The values to store for a new calibration of an instrument of `kind`, from the form's parsed input (mm², kPa …). */
export function calibrationValuesToStore(
  kind: string,
  input: {
    inflowBuretteAreaMm2?: number; outflowBuretteAreaMm2?: number; inflowZeroAboveDatumMm?: number; outflowZeroAboveDatumMm?: number;
    scaleMinMm?: number; scaleMaxMm?: number; standardUncertainty?: number;
    leakageCheckedAt?: Date; leakageMethod?: string; leakageRate?: number; leakageUnit?: "M3_PER_S" | "M3_PER_M2_PER_S";
  },
): StoredCalibrationValues {
  const out: StoredCalibrationValues = {};
  if (kind === "BURETTE_PANEL") {
    out.inflowBuretteAreaM2 = input.inflowBuretteAreaMm2! * 1e-6;
    out.outflowBuretteAreaM2 = input.outflowBuretteAreaMm2! * 1e-6;
    if (input.inflowZeroAboveDatumMm !== undefined) out.inflowZeroAboveDatumMm = input.inflowZeroAboveDatumMm;
    if (input.outflowZeroAboveDatumMm !== undefined) out.outflowZeroAboveDatumMm = input.outflowZeroAboveDatumMm;
    if (input.scaleMinMm !== undefined && input.scaleMaxMm !== undefined) Object.assign(out, { scaleMinMm: input.scaleMinMm, scaleMaxMm: input.scaleMaxMm });
  }
  if (UNCERTAINTY_BY_KIND[kind] && input.standardUncertainty !== undefined) out.standardUncertainty = input.standardUncertainty;
  if (kind === "PERMEAMETER_CELL" && input.leakageCheckedAt && input.leakageMethod && input.leakageRate !== undefined) {
    out.leakageCheckedAt = input.leakageCheckedAt.toISOString();
    out.leakageMethod = input.leakageMethod;
    if (input.leakageUnit === "M3_PER_M2_PER_S") out.leakageFluxM3PerM2PerS = input.leakageRate;
    else out.leakageRateM3PerS = input.leakageRate;
  }
  return out;
}
