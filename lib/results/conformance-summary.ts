/**
 * A result's conformance to a specification limit, decided by lib/hydraulics (ASTM E29: absolute method,
 * or rounding once, half to even, to the limit's last written place) and stated with the numbers that
 * decided it. A result in another unit of the same kind (m/s against a limit in cm/s) is first converted
 * exactly to the limit's unit, because E29 rounds to the last place of the limit as written.
 */
import type { ConformanceSummary } from "../certificates/certificate-snapshot";
import { decideConformance } from "../hydraulics";
import { canonicalUnit, convertUnit } from "./property-units";
import { formatNumber, formatUnit } from "./format-result";
import { formatDecimalText } from "../format/result-numbers";

export type SpecificationLimitInput = {
  /** The limit exactly as the specification writes it ("5e-11", "3.66"). */
  limitText: string;
  unit: string;
  direction: "MAXIMUM" | "MINIMUM";
  conformanceMethod: "ABSOLUTE" | "ROUNDING";
};

export type ConformanceExplanation = {
  summary: ConformanceSummary;
  /** The result as given, full precision, in its own unit. */
  value: string;
  /** The result in the limit's unit (equal to `value` when the units are the same). */
  valueInLimitUnit: string;
  converted: boolean;
  /** The place the result was rounded to in the limit's unit ("1e-11"), or null for the absolute method. */
  roundingPlace: string | null;
};

/** The decision and every number behind it, for a screen that shows its working. */
export function explainConformance(result: { value: number; unit: string }, limit: SpecificationLimitInput): ConformanceExplanation {
  const resultUnit = canonicalUnit(result.unit) ?? result.unit.trim();
  const limitUnit = canonicalUnit(limit.unit) ?? limit.unit.trim();
  const converted = resultUnit !== limitUnit;
  const valueInLimitUnit = convertUnit(result.value, resultUnit, limitUnit);
  const decision = decideConformance({
    value: valueInLimitUnit,
    limit: limit.limitText,
    kind: limit.direction === "MAXIMUM" ? "max" : "min",
    method: limit.conformanceMethod === "ROUNDING" ? "rounding" : "absolute",
  });
  const value = convertUnit(result.value, resultUnit, resultUnit);
  const shownUnit = formatUnit(limitUnit);
  const measuredValue = `${formatNumber(Number(valueInLimitUnit), { significantDigits: 3 })} ${shownUnit}`;
  const measured = converted ? `${formatNumber(result.value, { significantDigits: 3 })} ${formatUnit(resultUnit)} (${measuredValue})` : measuredValue;
  const limitShown = `${formatDecimalText(decision.limit)} ${shownUnit}`;
  const how = decision.method !== "rounding"
    ? "taken as measured (absolute method)"
    : Number(decision.comparedValue) === 0 && decision.roundingPlace !== null
      ? `smaller than half of the limit's last place (${formatDecimalText(decision.roundingPlace)} ${shownUnit}), so it rounds below the limit (ASTM E29, half to even)`
      : `rounded to ${formatDecimalText(decision.comparedValue)} ${shownUnit} (ASTM E29, half to even)`;
  const relation =
    limit.direction === "MAXIMUM"
      ? decision.conforms ? "does not exceed the maximum of" : "exceeds the maximum of"
      : decision.conforms ? "is not below the minimum of" : "is below the minimum of";
  return {
    summary: {
      limitText: decision.limit,
      unit: limitUnit,
      direction: limit.direction,
      method: limit.conformanceMethod,
      comparedValue: decision.comparedValue,
      conforms: decision.conforms,
      statement: `${measured}, ${how}, ${relation} ${limitShown}: ${decision.conforms ? "conforms" : "does not conform"}.`,
      measuredValue,
      plainRule: plainRule(decision, measuredValue, shownUnit),
    },
    value,
    valueInLimitUnit,
    converted,
    roundingPlace: decision.roundingPlace,
  };
}

/**
 * The ASTM E29 rule in words. Rounding to the limit's last place can turn a small result into "0" (2.4e-9
 * against a limit of 1e-8 rounds to 0 × 10⁻⁸): say plainly that this is a rounded comparison, not a
 * measured zero.
 */
function plainRule(decision: { method: string; kind: string; comparedValue: string; roundingPlace: string | null }, measuredValue: string, unit: string): string {
  if (decision.method !== "rounding" || decision.roundingPlace === null)
    return `The result as measured, ${measuredValue}, is compared with the limit; any excursion beyond it fails (ASTM E29 absolute method).`;
  const place = `${formatDecimalText(decision.roundingPlace)} ${unit}`;
  const rule = `The specification states its limit to the nearest ${place}, so the result is rounded once to that place, halves to even, and the rounded value is compared with the limit (ASTM E29 rounding method).`;
  if (Number(decision.comparedValue) !== 0) return `${rule} Measured ${measuredValue}; rounded ${formatDecimalText(decision.comparedValue)} ${unit}.`;
  return `${rule} Measured ${measuredValue}; rounded to the nearest ${place} it reads 0. That 0 is not a measured zero: the result is smaller than half of ${place}${decision.kind === "max" ? ", so it does not exceed the maximum" : ", so it falls short of the minimum"}.`;
}

/**
 * The certificate's conformance line for one result against one limit. Throws an Error with a sentence
 * when the limit text is not a number or the units cannot be compared (m/s against mL).
 */
export function conformanceSummary(result: { value: number; unit: string }, limit: SpecificationLimitInput): ConformanceSummary {
  return explainConformance(result, limit).summary;
}
