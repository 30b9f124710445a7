/**
 * The results a run reports, from the hydraulics library's evaluation, in the shape of the Result table:
 * ASTM D5887 reports index flux and gives k20 beside it; D5084 and D6766 report hydraulic conductivity
 * at 20 °C. Values are SI (m^3/m^2/s, m/s); the expanded uncertainty has coverage factor 2.
 */
import { expandedUncertainty, type DeclaredUncertainties, type ExpandedUncertainty, type Interval, type RunEvaluation, type TestMethod, type UnitWeightBasis } from "../hydraulics";

export type ReportedProperty = "INDEX_FLUX" | "HYDRAULIC_CONDUCTIVITY";

export type RunResult = {
  property: ReportedProperty;
  /** m^3/m^2/s for INDEX_FLUX, m/s (at 20 °C) for HYDRAULIC_CONDUCTIVITY. */
  value: number;
  unit: "m3/m2/s" | "m/s";
  /** Expanded uncertainty (k = 2) in the value's unit, or null when none can be stated. */
  expandedUncertainty: number | null;
  /** Mean permeant temperature over the reported intervals, °C. */
  temperatureC: number;
  unitWeightBasis: UnitWeightBasis;
  /** True when the run ended before its termination criteria were met (a deviation to report). */
  earlyEnd: boolean;
  /** The relative standard uncertainty each input contributes (k20's budget; flux uses its own inputs), and the expanded relative U of this value, or null. */
  uncertaintyBudget: { budget: ExpandedUncertainty["budget"]; relative: number } | null;
};

export type ResultsFromEvaluationOptions = {
  /**
   * Report a run that was ended before its criteria were met (Run.terminationKind EARLY_END). The values
   * are then the means of flux and of k20 over the same window the criteria look at (the last
   * settings.consecutiveIntervals intervals, or all there are if fewer), exactly as a run that met its
   * criteria is reported, so the certificate can state them as a deviation beside the unmet criteria.
   */
  allowEarlyEnd?: boolean;
  /**
   * For early ends only: the library gives no uncertainty for a run whose criteria are not met, so pass
   * the specimen and the declared uncertainties to state one; without them it is null.
   */
  earlyEndUncertainty?: { declared: DeclaredUncertainties; diameterMm: number; thicknessMm: number };
};

/**
 * The Result rows of one evaluated run. Throws an Error with a sentence when the evaluation's method is
 * not `method`, or when its criteria are not met (reported values null) and `allowEarlyEnd` is not set.
 */
export function resultsFromEvaluation(evaluation: RunEvaluation, method: TestMethod, options: ResultsFromEvaluationOptions = {}): RunResult[] {
  if (evaluation.method !== method) throw new Error(`The run was evaluated as ASTM ${evaluation.method} but is recorded as ASTM ${method}; re-evaluate it before reporting.`);
  const window = evaluation.intervals.slice(-evaluation.settings.consecutiveIntervals);
  if (window.length === 0) throw new Error("The run has no intervals between readings, so there is nothing to report.");
  const temperatureC = mean(window, (iv) => iv.temperatureC);
  const { flux, k20 } = evaluation.reported;

  let reported: { flux: number; k20: number; fluxU: number | null; k20U: number | null; earlyEnd: boolean; u: ExpandedUncertainty | null };
  if (flux !== null && k20 !== null) {
    reported = { flux, k20, fluxU: evaluation.uncertainty?.fluxM3PerM2PerS ?? null, k20U: evaluation.uncertainty?.k20MPerS ?? null, earlyEnd: false, u: evaluation.uncertainty };
  } else if (!options.allowEarlyEnd) {
    const unmet = evaluation.termination.criteria.filter((c) => !c.met).map((c) => c.name.toLowerCase());
    throw new Error(`The termination criteria are not met${unmet.length ? ` (${unmet.join(", ")})` : ""}, so the run has no result to report; a run ended early is reported only as a deviation.`);
  } else {
    const early = { flux: mean(window, (iv) => iv.flux), k20: mean(window, (iv) => iv.k20) };
    if (!Number.isFinite(early.flux) || !Number.isFinite(early.k20)) throw new Error("The last intervals do not give finite values of flux and k20; check the entered readings before reporting the early end.");
    const u = options.earlyEndUncertainty ? earlyEndUncertainty(evaluation, window, early, options.earlyEndUncertainty) : null;
    reported = { ...early, fluxU: u?.fluxM3PerM2PerS ?? null, k20U: u?.k20MPerS ?? null, earlyEnd: true, u };
  }

  const common = { temperatureC, unitWeightBasis: evaluation.unitWeightBasis, earlyEnd: reported.earlyEnd };
  const budget = (relative: number | undefined) => (reported.u && relative !== undefined ? { budget: reported.u.budget, relative } : null);
  const conductivity: RunResult = { property: "HYDRAULIC_CONDUCTIVITY", value: reported.k20, unit: "m/s", expandedUncertainty: reported.k20U, ...common, uncertaintyBudget: budget(reported.u?.k20Relative) };
  if (method === "D5887") return [{ property: "INDEX_FLUX", value: reported.flux, unit: "m3/m2/s", expandedUncertainty: reported.fluxU, ...common, uncertaintyBudget: budget(reported.u?.fluxRelative) }, conductivity];
  return [conductivity];
}

function mean(intervals: readonly Interval[], f: (iv: Interval) => number): number {
  return intervals.reduce((a, iv) => a + f(iv), 0) / intervals.length;
}

// The same propagation evaluateRun applies to a run that met its criteria, over the same window.
function earlyEndUncertainty(
  evaluation: RunEvaluation,
  window: readonly Interval[],
  reported: { flux: number; k20: number },
  given: NonNullable<ResultsFromEvaluationOptions["earlyEndUncertainty"]>,
) {
  const volumeMl = window.reduce((a, iv) => a + (iv.inflowVolumeMl + iv.outflowVolumeMl) / 2, 0);
  if (!(volumeMl > 0)) return null;
  return expandedUncertainty({
    fluxM3PerM2PerS: reported.flux,
    k20MPerS: reported.k20,
    diameterMm: given.diameterMm,
    thicknessMm: given.thicknessMm,
    volumeMl,
    durationS: window.reduce((a, iv) => a + iv.durationS, 0),
    headM: mean(window, (iv) => iv.headM),
    unitWeightKNPerM3: mean(window, (iv) => iv.unitWeightKNPerM3),
    temperatureC: mean(window, (iv) => iv.temperatureC),
    declared: given.declared,
    viscosityRatioBasis: evaluation.viscosityRatioBasis,
  });
}
