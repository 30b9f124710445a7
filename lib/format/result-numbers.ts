/**
 * The one way results, uncertainties and limits are written, on screens and on certificates: each property
 * with its own significant digits, in the unit system a person (or a certificate draft) chose, converted
 * exactly (decimal arithmetic, lib/results/property-units), in one notation ("2.4 × 10⁻⁹ m³/m²/s") for
 * the result, its uncertainty and the limit it is judged by. Pure.
 */
import Decimal from "decimal.js";
import { formatNumber, formatUncertainty, formatUnit } from "../results/format-result";
import { canonicalUnit, convertUnit, type TestProperty } from "../results/property-units";

/** Mirrors the ResultUnitSystem enum of prisma/schema.prisma (lib/ may not import Prisma). */
export const UNIT_SYSTEMS = ["SI", "CENTIMETRE"] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export const UNIT_SYSTEM_LABELS: Record<UnitSystem, string> = {
  SI: "SI units: flux in m³/m²/s, hydraulic conductivity in m/s",
  CENTIMETRE: "Centimetre units: flux in cm³/cm²/s, hydraulic conductivity in cm/s",
};

/**
 * Per property: the significant digits a result is written with (two for flux and k, whose spread between
 * specimens is tens of per cent: common practice on GCL reports; three for the index properties, from
 * memory) and the unit in each system. Index properties have one unit whatever the system.
 */
export const PROPERTY_FORMATS: Record<TestProperty, { significantDigits: number; units: Record<UnitSystem, string> }> = {
  INDEX_FLUX: { significantDigits: 2, units: { SI: "m3/m2/s", CENTIMETRE: "cm3/cm2/s" } },
  HYDRAULIC_CONDUCTIVITY: { significantDigits: 2, units: { SI: "m/s", CENTIMETRE: "cm/s" } },
  SWELL_INDEX: { significantDigits: 3, units: { SI: "mL/2 g", CENTIMETRE: "mL/2 g" } },
  FLUID_LOSS: { significantDigits: 3, units: { SI: "mL", CENTIMETRE: "mL" } },
  BENTONITE_MASS_PER_AREA: { significantDigits: 3, units: { SI: "kg/m2", CENTIMETRE: "kg/m2" } },
  MOISTURE_CONTENT: { significantDigits: 3, units: { SI: "%", CENTIMETRE: "%" } },
  GCL_MASS_PER_AREA: { significantDigits: 3, units: { SI: "kg/m2", CENTIMETRE: "kg/m2" } },
  TENSILE_STRENGTH: { significantDigits: 3, units: { SI: "kN/m", CENTIMETRE: "kN/m" } },
  PEEL_STRENGTH: { significantDigits: 3, units: { SI: "N/m", CENTIMETRE: "N/m" } },
};

const D = Decimal.clone({ precision: 60 });

function formatOf(property: string) {
  return PROPERTY_FORMATS[property as TestProperty] ?? { significantDigits: 2, units: null };
}

/** The unit a property is written in under a unit system (canonical ASCII, "cm/s"). */
export function reportUnit(property: string, system: UnitSystem, storedUnit: string): string {
  return formatOf(property).units?.[system] ?? storedUnit;
}

export type FormattedQuantity = {
  /** The number as written, without its unit ("2.4 × 10⁻⁹"). */
  number: string;
  /** The unit as written ("m³/m²/s"). */
  unit: string;
  /** Both ("2.4 × 10⁻⁹ m³/m²/s"). */
  text: string;
  /** The canonical unit code the number is in ("m3/m2/s"). */
  unitCode: string;
};

/** A stored result (value in `storedUnit`) written in the system's unit with the property's digits. */
export function formatPropertyValue(property: string, value: number, storedUnit: string, system: UnitSystem = "SI"): FormattedQuantity {
  const unitCode = reportUnit(property, system, storedUnit);
  const converted = Number(convertUnit(value, storedUnit, unitCode));
  const number = formatNumber(converted, { significantDigits: formatOf(property).significantDigits });
  const unit = formatUnit(unitCode);
  return { number, unit, text: `${number} ${unit}`, unitCode };
}

/**
 * An expanded uncertainty beside its result, in the same unit and power of ten ("± 0.21 × 10⁻⁹ m³/m²/s"),
 * without the coverage factor (the heading or sentence states it); null when there is none.
 */
export function formatPropertyUncertainty(property: string, expanded: number | null, value: number, storedUnit: string, system: UnitSystem = "SI"): string | null {
  if (expanded === null) return null;
  const unitCode = reportUnit(property, system, storedUnit);
  const u = Number(convertUnit(expanded, storedUnit, unitCode));
  const v = Number(convertUnit(value, storedUnit, unitCode));
  return formatUncertainty(u, unitCode, { value: v, significantDigits: formatOf(property).significantDigits })!.replace(/\s*\(k = 2\)$/, "");
}

/**
 * A decimal as written in a specification or by an E29 rounding ("1e-8", "5.0e-11", "24"), in the notation
 * results are written in, keeping exactly its written digits ("1 × 10⁻⁸", "5.0 × 10⁻¹¹", "24").
 */
export function formatDecimalText(text: string): string {
  const trimmed = text.trim();
  const d = new D(trimmed);
  if (d.isZero()) return "0";
  const mantissa = trimmed.toLowerCase().split("e")[0]!.replace(/^[-+]/, "");
  const digits = mantissa.replace(".", "").replace(/^0+/, "");
  // Trailing zeros of a whole number without a point are not significant ("200" is one digit); a written point keeps them.
  const significant = mantissa.includes(".") ? digits.length : digits.replace(/0+$/, "").length || 1;
  return formatNumber(d.toNumber(), { significantDigits: Math.max(1, Math.min(15, significant)) });
}

/** A specification limit with its direction and unit, in the results' notation: "≤ 1 × 10⁻⁸ m³/m²/s". */
export function formatLimit(limit: { limitText: string; unit: string; direction: "MAXIMUM" | "MINIMUM" }): string {
  return `${limit.direction === "MAXIMUM" ? "≤" : "≥"} ${formatDecimalText(limit.limitText)} ${formatUnit(canonicalUnit(limit.unit) ?? limit.unit)}`;
}

/** The coverage of every expanded uncertainty Seepline states (GUM, JCGM 100:2008, 6.2 and 6.3: k = 2 gives about 95 % for a normal distribution). */
export const COVERAGE_STATEMENT = "coverage factor k = 2, for a coverage probability of about 95 %";
