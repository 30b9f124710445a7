/** A hydraulic method's stored settings turned into what the computations take (SI, fractions). Pure. */
import type { TerminationSettings } from "../../hydraulics/types";
import type { HydraulicSettings } from "./hydraulic-settings";

/** Overrides for evaluateRun's options.termination: percentages become fractions. */
export function terminationOverrides(s: HydraulicSettings): Partial<TerminationSettings> {
  return {
    consecutiveIntervals: s.consecutiveIntervals,
    ratioMin: s.ratioMin,
    ratioMax: s.ratioMax,
    trendAlpha: s.trendAlpha,
    trendQuantity: s.trendQuantity,
    // 0 leaves the statistical test alone, as the field's note says.
    ...(s.trendMinChangePct > 0 ? { trendMinRelativeChange: s.trendMinChangePct / 100 } : {}),
    kBandFraction: s.kBandPct / 100,
    kBandFractionBelowThreshold: s.kBandBelowThresholdPct / 100,
    kBandThresholdMPerS: s.kBandThresholdMPerS,
    ecToleranceFraction: s.ecTolerancePct / 100,
    phToleranceUnits: s.phToleranceUnits,
    minPoreVolumes: s.minPoreVolumes,
  };
}

/** The numbers the stage pressure checks apply, in pascals and seconds. */
export type StagePressureRules = {
  confiningMarginPa: number;
  /** Prescribed permeation pressures, or null when the method prescribes none. */
  permeation: { cellPa: number; influentPa: number; effluentPa: number } | null;
  permeationTolerancePa: number;
  minCellAboveInfluentPa: number;
  minEquilibrationS: number;
};

export function stagePressureRules(s: HydraulicSettings): StagePressureRules {
  const kPa = (v: number) => v * 1000;
  return {
    confiningMarginPa: kPa(s.confiningMarginKPa),
    permeation:
      s.permeationCellKPa !== null && s.permeationInfluentKPa !== null && s.permeationEffluentKPa !== null
        ? { cellPa: kPa(s.permeationCellKPa), influentPa: kPa(s.permeationInfluentKPa), effluentPa: kPa(s.permeationEffluentKPa) }
        : null,
    permeationTolerancePa: kPa(s.permeationToleranceKPa),
    minCellAboveInfluentPa: kPa(s.minCellAboveInfluentKPa),
    minEquilibrationS: s.minEquilibrationHours * 3600,
  };
}
