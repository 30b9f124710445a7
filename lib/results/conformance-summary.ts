/**
 * A result's conformance to a specification limit, decided by lib/hydraulics (ASTM E29: absolute method,
 * or rounding once, half to even, to the limit's last written place) and stated with the numbers that
 * decided it. A result in another unit of the same kind (m/s against a limit in cm/s) is first converted
 * exactly to the limit's unit, because E29 rounds to the last place of the limit as written.
 */
import type { ConformanceSummary } from "../certificates/certificate-snapshot";
import { decideConformance } from "../hydraulics";
import { canonicalUnit, convertUnit } from "./property-units";
import { formatUnit } from "./format-result";

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
  const measured = converted ? `${value} ${formatUnit(resultUnit)} (${decision.value} ${shownUnit})` : `${decision.value} ${shownUnit}`;
  const how = decision.method === "rounding" ? `rounded to ${decision.comparedValue} (ASTM E29, half to even)` : "taken as measured (absolute method)";
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
      statement: `${measured}, ${how}, ${relation} ${decision.limit} ${shownUnit}: ${decision.conforms ? "conforms" : "does not conform"}.`,
    },
    value,
    valueInLimitUnit,
    converted,
    roundingPlace: decision.roundingPlace,
  };
}

/**
 * The certificate's conformance line for one result against one limit. Throws an Error with a sentence
 * when the limit text is not a number or the units cannot be compared (m/s against mL).
 */
export function conformanceSummary(result: { value: number; unit: string }, limit: SpecificationLimitInput): ConformanceSummary {
  return explainConformance(result, limit).summary;
}
