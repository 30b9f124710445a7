/**
 * Conformance to a specification limit per ASTM E29: the absolute method (any excursion fails) or
 * the rounding method (round the result once, halves to even, to the last significant place of the
 * limit as written, then compare). Decimal arithmetic, because binary floats mis-round halves:
 * (2.25).toPrecision(2) is "2.3" and (1.015).toFixed(2) is "1.01".
 */
import Decimal from "decimal.js";

// A private Decimal with ample precision so that no intermediate step rounds.
const D = Decimal.clone({ precision: 60, rounding: Decimal.ROUND_HALF_EVEN });
type Dec = InstanceType<typeof D>;

export type LimitKind = "max" | "min";
export type ConformanceMethod = "absolute" | "rounding";

export interface ConformanceDecision {
  conforms: boolean;
  method: ConformanceMethod;
  kind: LimitKind;
  /** The result as given, full precision. */
  value: string;
  /** The number actually compared with the limit: the value itself, or the value rounded once. */
  comparedValue: string;
  limit: string;
  /** Place value the result was rounded to (e.g. "1e-8"), or null for the absolute method. */
  roundingPlace: string | null;
  /** One sentence for the certificate / reviewer. */
  statement: string;
}

const NUMBER_RE = /^[+-]?(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/;

/**
 * The exponent of the last significant place of a number as written: "1e-8" -> -8, "3.66" -> -2,
 * "24" -> 0, "5.0e-11" -> -12. Trailing zeros written after a decimal point count as significant.
 */
export function lastSignificantPlaceExponent(written: string): number {
  const m = NUMBER_RE.exec(written.trim());
  if (!m || ((m[1] ?? "") === "" && (m[2] ?? "") === "")) throw new Error(`limit "${written}" is not a decimal number`);
  const fractionDigits = (m[2] ?? "").length;
  const exponent = m[3] !== undefined ? Number(m[3]) : 0;
  return exponent - fractionDigits;
}

function toDecimal(x: number | string, field: string): Dec {
  if (typeof x === "number" && !Number.isFinite(x)) throw new Error(`${field} must be a finite number, got ${x}`);
  try {
    return new D(x);
  } catch {
    throw new Error(`${field} is not a decimal number: ${String(x)}`);
  }
}

/** Round half to even, once, to the given number of decimal places; returns a decimal string. */
export function roundHalfEven(value: number | string, decimalPlaces: number): string {
  return toDecimal(value, "value").toNearest(new D(10).pow(-decimalPlaces), D.ROUND_HALF_EVEN).toString();
}

/** Round half to even, once, to the given number of significant digits; returns a decimal string. */
export function roundToSignificantHalfEven(value: number | string, significantDigits: number): string {
  return toDecimal(value, "value").toSignificantDigits(significantDigits, D.ROUND_HALF_EVEN).toString();
}

/**
 * Decide conformance of a result to a limit. Pass the limit as written in the specification
 * (a string keeps significant trailing zeros, "5.0e-11"); a number is read by its shortest form.
 * kind "max": result must not exceed the limit; "min": must not fall below it.
 */
export function decideConformance(args: {
  value: number | string;
  limit: number | string;
  kind: LimitKind;
  method: ConformanceMethod;
}): ConformanceDecision {
  const limitText = typeof args.limit === "number" ? String(args.limit) : args.limit.trim();
  const limit = toDecimal(limitText, "limit");
  const value = toDecimal(args.value, "value");
  let compared = value;
  let roundingPlace: string | null = null;
  if (args.method === "rounding") {
    const place = new D(10).pow(lastSignificantPlaceExponent(limitText));
    compared = value.toNearest(place, D.ROUND_HALF_EVEN);
    roundingPlace = place.toString();
  }
  const conforms = args.kind === "max" ? compared.lte(limit) : compared.gte(limit);
  const op = args.kind === "max" ? "≤" : "≥";
  const how =
    args.method === "rounding"
      ? `${value.toString()} rounded half-to-even to the ${roundingPlace} place is ${compared.toString()}`
      : `${value.toString()} compared as measured (absolute method)`;
  return {
    conforms,
    method: args.method,
    kind: args.kind,
    value: value.toString(),
    comparedValue: compared.toString(),
    limit: limitText,
    roundingPlace,
    statement: `${how}; required ${op} ${limitText}: ${conforms ? "conforms" : "does not conform"}.`,
  };
}
