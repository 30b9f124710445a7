/**
 * The properties a specification may limit, the units a limit may be stated in, and exact conversions
 * between units of one kind. Conversions are done in decimal arithmetic: a binary product such as
 * 2.5e-10 × 100 = 2.5000000000000002e-8 would move a half and change an ASTM E29 rounding.
 */
import Decimal from "decimal.js";
import { CM_M } from "../hydraulics";

// Mirrors the TestProperty enum of prisma/schema.prisma (lib/ may not import Prisma).
export const TEST_PROPERTIES = [
  "INDEX_FLUX", "HYDRAULIC_CONDUCTIVITY", "SWELL_INDEX", "FLUID_LOSS", "BENTONITE_MASS_PER_AREA", "MOISTURE_CONTENT",
  "GCL_MASS_PER_AREA", "TENSILE_STRENGTH", "PEEL_STRENGTH",
] as const;
export type TestProperty = (typeof TEST_PROPERTIES)[number];

export const TEST_PROPERTY_LABELS: Record<TestProperty, string> = {
  INDEX_FLUX: "Index flux",
  HYDRAULIC_CONDUCTIVITY: "Hydraulic conductivity (20 °C)",
  SWELL_INDEX: "Bentonite swell index",
  FLUID_LOSS: "Bentonite fluid loss",
  BENTONITE_MASS_PER_AREA: "Bentonite mass per unit area",
  MOISTURE_CONTENT: "Moisture content",
  GCL_MASS_PER_AREA: "GCL mass per unit area",
  TENSILE_STRENGTH: "Tensile strength",
  PEEL_STRENGTH: "Peel strength",
};

/** A unit's kind and its size in the kind's base unit, as an exact decimal string. */
type UnitDefinition = { kind: string; factor: string };

// Base units are the ones results are stored in (SI for flux and conductivity).
const UNITS: Record<string, UnitDefinition> = {
  "m3/m2/s": { kind: "flux", factor: "1" },
  "cm3/cm2/s": { kind: "flux", factor: String(CM_M) },
  "m/s": { kind: "velocity", factor: "1" },
  "cm/s": { kind: "velocity", factor: String(CM_M) },
  "mL/2 g": { kind: "swell", factor: "1" },
  mL: { kind: "volume", factor: "1" },
  "kg/m2": { kind: "mass-per-area", factor: "1" },
  "g/m2": { kind: "mass-per-area", factor: "0.001" },
  "%": { kind: "fraction", factor: "1" },
  "kN/m": { kind: "force-per-width", factor: "1" },
  "N/m": { kind: "force-per-width", factor: "0.001" },
};

/** The units a limit of each property may be stated in; the first is the one results are stored in. */
export const PROPERTY_UNITS: Record<TestProperty, readonly string[]> = {
  INDEX_FLUX: ["m3/m2/s", "cm3/cm2/s"],
  HYDRAULIC_CONDUCTIVITY: ["m/s", "cm/s"],
  SWELL_INDEX: ["mL/2 g"],
  FLUID_LOSS: ["mL"],
  BENTONITE_MASS_PER_AREA: ["kg/m2", "g/m2"],
  MOISTURE_CONTENT: ["%"],
  GCL_MASS_PER_AREA: ["kg/m2", "g/m2"],
  TENSILE_STRENGTH: ["kN/m", "N/m"],
  PEEL_STRENGTH: ["N/m", "kN/m"],
};

const D = Decimal.clone({ precision: 60 });

/** A unit as typed, with superscripts and spaces made canonical ("m³/m²/s" -> "m3/m2/s"); null if unknown. */
export function canonicalUnit(unit: string): string | null {
  const plain = unit.trim().replace(/³/g, "3").replace(/²/g, "2").replace(/\s+/g, " ");
  if (plain in UNITS) return plain;
  const folded = Object.keys(UNITS).find((u) => u.toLowerCase() === plain.toLowerCase());
  return folded ?? null;
}

/** Whether a value in unit `from` can be expressed in unit `to`. */
export function unitsComparable(from: string, to: string): boolean {
  const a = canonicalUnit(from);
  const b = canonicalUnit(to);
  return a !== null && b !== null && UNITS[a]!.kind === UNITS[b]!.kind;
}

/**
 * `value` in unit `from`, expressed in unit `to`, as an exact decimal string. A number is read by its
 * shortest decimal form (String(5.4e-11) = "5.4e-11"), the number a person means. Throws a sentence
 * when the units are unknown or of different kinds.
 */
export function convertUnit(value: number | string, from: string, to: string): string {
  const a = canonicalUnit(from);
  const b = canonicalUnit(to);
  if (a === null) throw new Error(`The unit "${from}" is not one Seepline knows.`);
  if (b === null) throw new Error(`The unit "${to}" is not one Seepline knows.`);
  if (UNITS[a]!.kind !== UNITS[b]!.kind) throw new Error(`A value in ${a} cannot be compared with a limit in ${b}: they measure different things.`);
  if (typeof value === "number" && !Number.isFinite(value)) throw new Error(`The value must be a finite number, got ${value}.`);
  const v = new D(typeof value === "number" ? String(value) : value);
  return a === b ? v.toString() : v.times(UNITS[a]!.factor).div(UNITS[b]!.factor).toString();
}

/** One limit of a specification as stored: the limit exactly as written, its unit, direction and digits. */
export type SpecificationLimitRow = {
  id: string;
  property: TestProperty;
  limitText: string;
  unit: string;
  direction: "MAXIMUM" | "MINIMUM";
  significantDigits: number;
  conformanceMethod: "ABSOLUTE" | "ROUNDING";
  testMethodCode: string | null;
  /** One test per so many m² delivered; null: no area rule. */
  testingFrequencyAreaM2?: number | null;
  /** One test per lot as well. */
  testingFrequencyPerLot?: boolean;
};
