/**
 * Result values as people read them: "2.4 × 10⁻⁹ m³/m²/s" on screens and certificates, "2.4e-9 m3/m2/s"
 * where only ASCII is safe (CSV, file names, logs). Display rounding is half to even (ASTM E29), done in
 * decimal so that no binary-float half is mis-rounded; it never feeds a conformance decision.
 */
import Decimal from "decimal.js";
import { roundToSignificantHalfEven } from "../hydraulics";
import { canonicalUnit } from "./property-units";

const D = Decimal.clone({ precision: 60 });

export type FormatOptions = {
  /** Significant digits shown; 2 by default, common practice for k and flux on GCL reports. */
  significantDigits?: number;
  /** Plain ASCII ("2.4e-9 m3/m2/s") instead of typographic ("2.4 × 10⁻⁹ m³/m²/s"). */
  ascii?: boolean;
};

const SUPERSCRIPT: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };

/** A unit for display: "m3/m2/s" -> "m³/m²/s", "kg/m2" -> "kg/m²"; ASCII form unchanged. */
export function formatUnit(unit: string, options: { ascii?: boolean } = {}): string {
  const plain = canonicalUnit(unit) ?? unit.trim();
  return options.ascii ? plain : plain.replace(/([a-z])([23])(?=\/|$)/g, (_, letter: string, power: string) => `${letter}${SUPERSCRIPT[power]}`);
}

/** Powers of ten at or beyond which a number is written in scientific form. */
const SCIENTIFIC_BELOW = -3;
const SCIENTIFIC_FROM = 5;

/** Mantissa and exponent text of `d` already rounded, padded to `significantDigits` ("2.0", -9). */
function scientificParts(d: InstanceType<typeof D>, significantDigits: number): { mantissa: string; exponent: number } {
  const [mantissa, exponent] = d.toExponential(significantDigits - 1).split("e") as [string, string];
  return { mantissa, exponent: Number(exponent) };
}

function powerOfTen(exponent: number, ascii: boolean): string {
  return ascii ? `e${exponent}` : ` × 10${String(exponent).split("").map((c) => SUPERSCRIPT[c]).join("")}`;
}

/** A number to `significantDigits`, half to even, in plain or scientific form, without the unit. */
export function formatNumber(value: number, options: FormatOptions = {}): string {
  const sd = options.significantDigits ?? 2;
  if (!Number.isInteger(sd) || sd < 1 || sd > 15) throw new Error(`significantDigits must be a whole number from 1 to 15, got ${sd}`);
  if (!Number.isFinite(value)) throw new Error(`The value must be a finite number, got ${value}`);
  const rounded = new D(roundToSignificantHalfEven(value, sd));
  if (rounded.isZero()) return "0";
  const { mantissa, exponent } = scientificParts(rounded, sd);
  if (exponent < SCIENTIFIC_BELOW || exponent >= SCIENTIFIC_FROM) return `${mantissa}${powerOfTen(exponent, options.ascii ?? false)}`;
  return rounded.toFixed(Math.max(0, sd - 1 - exponent));
}

/** A result with its unit: formatResultValue(2.43e-9, "m3/m2/s") -> "2.4 × 10⁻⁹ m³/m²/s". */
export function formatResultValue(value: number, unit: string, options: FormatOptions = {}): string {
  return `${formatNumber(value, options)} ${formatUnit(unit, options)}`;
}

/**
 * An expanded uncertainty (coverage factor 2) as stated beside a result, or null when there is none:
 * formatUncertainty(2.1e-10, "m3/m2/s", { value: 2.43e-9 }) -> "± 0.21 × 10⁻⁹ m³/m²/s (k = 2)". Given
 * the value, it is written in the value's power of ten so the two read together. Two significant digits,
 * rounded up (GUM, JCGM 100:2008, 7.2.6, allows rounding an uncertainty up rather than to the nearest).
 */
export function formatUncertainty(expanded: number | null, unit: string, options: FormatOptions & { value?: number } = {}): string | null {
  if (expanded === null) return null;
  if (!Number.isFinite(expanded) || expanded < 0) throw new Error(`The expanded uncertainty must be a finite number ≥ 0, got ${expanded}`);
  const ascii = options.ascii ?? false;
  const sd = options.significantDigits ?? 2;
  const u = new D(String(expanded)).toSignificantDigits(sd, Decimal.ROUND_UP);
  const suffix = `${formatUnit(unit, { ascii })} (k = 2)`;
  if (u.isZero()) return `± 0 ${suffix}`;
  // The value's power of ten as formatResultValue shows it (2 significant digits: 9.96e-9 reads 1.0 × 10⁻⁸).
  const valueExponent = options.value !== undefined && options.value !== 0 && Number.isFinite(options.value)
    ? new D(roundToSignificantHalfEven(options.value, 2)).e
    : u.e;
  if (valueExponent >= SCIENTIFIC_BELOW && valueExponent < SCIENTIFIC_FROM) return `± ${u.toString()} ${suffix}`;
  const scaled = u.div(new D(10).pow(valueExponent));
  return `± ${scaled.toString()}${powerOfTen(valueExponent, ascii)} ${suffix}`;
}
