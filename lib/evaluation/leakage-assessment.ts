/**
 * ASTM D5887 apparatus leakage: the rate found with an impermeable dummy specimen in the cell must be under
 * 10 % (the method settings' limit) of the measured flow. A rate given as a flux is taken over the same
 * specimen area as the run. Pure.
 */
import type { LeakageCheck } from "../equipment/calibration-values";
import { formatNumber } from "../results/format-result";

export type LeakageAssessment = {
  cell: string;
  checkedAt: string;
  method: string;
  /** Leakage as a flux over the run's specimen area, m³/m²/s. */
  leakageFluxM3PerM2PerS: number;
  /** Leakage / measured flow. */
  fraction: number;
  limitPct: number;
  /** At or above the limit: QA must acknowledge it before approving, and the certificate states it as a deviation. */
  flagged: boolean;
  statement: string;
};

export function assessLeakage(input: { cell: string; check: LeakageCheck; measuredFluxM3PerM2PerS: number; specimenAreaM2: number; limitPct: number }): LeakageAssessment {
  const { check } = input;
  const leakageFlux = check.fluxM3PerM2PerS ?? check.rateM3PerS! / input.specimenAreaM2;
  const fraction = input.measuredFluxM3PerM2PerS > 0 ? leakageFlux / input.measuredFluxM3PerM2PerS : Number.POSITIVE_INFINITY;
  // A relative 1e-9 of slack so that a rate of exactly the limit counts as at it despite binary rounding.
  const flagged = !(fraction < (input.limitPct / 100) * (1 - 1e-9));
  const given = check.rateM3PerS !== undefined ? `${formatNumber(check.rateM3PerS)} m³/s` : `${formatNumber(check.fluxM3PerM2PerS!)} m³/m²/s`;
  const share = Number.isFinite(fraction) ? `${+(fraction * 100).toPrecision(2)} %` : "more than all";
  return {
    cell: input.cell,
    checkedAt: check.checkedAt,
    method: check.method,
    leakageFluxM3PerM2PerS: leakageFlux,
    fraction,
    limitPct: input.limitPct,
    flagged,
    statement: `Apparatus leakage of cell ${input.cell}, checked ${check.checkedAt.slice(0, 10)} (${check.method}): ${given}, ${share} of the measured flow; ASTM D5887 asks for less than ${input.limitPct} %${flagged ? ", which this check does not meet" : ""}.`,
  };
}
