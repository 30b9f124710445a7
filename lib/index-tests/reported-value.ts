/**
 * An index-test result as the lab reports it: in the method's reporting unit (lab setting), rounded once,
 * half to even, to the method's decimal places (lab setting). Display only: conformance is decided on the
 * stored value by ASTM E29 against the limit as written. Pure.
 */
import { roundHalfEven } from "../hydraulics";
import { formatUnit } from "../results/format-result";
import { canonicalUnit, convertUnit } from "../results/property-units";

export type ReportingSettings = { reportingUnit?: unknown; reportingDecimals?: unknown };

/** "9.0 kN/m", "592 N/m", "3.79 kg/m²"; a unit the reporting unit cannot express stays as stored. */
export function reportIndexValue(value: number, unit: string, settings: ReportingSettings): string {
  const wanted = typeof settings.reportingUnit === "string" ? settings.reportingUnit : unit;
  const to = canonicalUnit(wanted) !== null && canonicalUnit(unit) !== null ? wanted : unit;
  let converted: string;
  try {
    converted = convertUnit(value, unit, to);
  } catch {
    converted = String(value);
  }
  const decimals = Number.isInteger(settings.reportingDecimals) ? (settings.reportingDecimals as number) : 2;
  const rounded = roundHalfEven(converted, decimals);
  return `${Number(rounded).toFixed(decimals)} ${formatUnit(to)}`;
}
