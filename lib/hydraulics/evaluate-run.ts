/** evaluateRun: the whole calculation of one permeation run, as the app and certificate use it. */
import { computeIntervals, readingHeadM } from "./intervals";
import { poreVolumeMl, resolvePorosity } from "./pore-volumes";
import { projectTermination } from "./projection";
import { evaluateTermination, resolveTerminationSettings } from "./termination";
import type { EvaluateRunOptions, ExpandedUncertainty, Interval, RunEvaluation, RunInput } from "./types";
import { expandedUncertainty, validateDeclaredUncertainties } from "./uncertainty";
import { DEFAULT_UNIT_WEIGHT_BASIS, unitWeightOfWaterKNPerM3 } from "./units";
import { D5084_EQUATION_RANGE_C } from "./water";
import { validateRunInput } from "./validate-run-input";

/**
 * Evaluate a run: per-interval flux (m^3/m^2/s), ratio, gradient, k and k20 (m/s); the method's
 * termination criteria; and, once they are all met, the reported values = the arithmetic mean of
 * flux and of k20 over the last N intervals (N = settings.consecutiveIntervals, 4 by default), the
 * intervals the criteria were judged on. For D5887 the reported quantity is index flux; k20 is
 * given beside it. Throws an Error naming the field for invalid input. O(n) in readings.
 */
export function evaluateRun(input: RunInput, options: EvaluateRunOptions = {}): RunEvaluation {
  validateRunInput(input);
  if (options.uncertainty) validateDeclaredUncertainties(options.uncertainty);
  const settings = resolveTerminationSettings(input.method, options.termination);
  const unitWeightBasis = options.unitWeightBasis ?? DEFAULT_UNIT_WEIGHT_BASIS;
  const viscosityRatioBasis = options.viscosityRatioBasis ?? "D5084-in-range";
  const { readings, specimen, burettes } = input;
  const warnings: string[] = [];

  const withLevels = (readings[0] as RunInput["readings"][number]).inflowLevelMm !== undefined;
  if (burettes || withLevels) {
    const from = withLevels ? "the burette levels" : "burettes.initialLevelDifferenceMm";
    for (let i = 0; i < readings.length; i++) {
      const r = readings[i] as RunInput["readings"][number];
      const h = readingHeadM(r, unitWeightOfWaterKNPerM3(r.temperatureC, unitWeightBasis), burettes, readings[0] as RunInput["readings"][number]);
      if (!(h > 0)) {
        throw new Error(`readings[${i}]: total head from headKPa and ${from} is not positive (${h.toFixed(4)} m)`);
      }
    }
  }

  const intervals = computeIntervals(readings, specimen, {
    unitWeightBasis,
    viscosityRatioBasis,
    ...(burettes ? { burettes } : {}),
  });
  collectWarnings(intervals, viscosityRatioBasis, warnings);

  const n = settings.consecutiveIntervals;
  const last = readings[readings.length - 1] as RunInput["readings"][number];
  const porosity = resolvePorosity(specimen);
  let poreVolumesOfFlow: number | null = null;
  let pvRatePerS = 0;
  if (porosity.porosity !== null) {
    const pvMl = poreVolumeMl({ ...specimen, porosity: porosity.porosity });
    poreVolumesOfFlow = last.outflowMl / pvMl;
    const window = intervals.slice(-n);
    const volMl = window.reduce((a, iv) => a + iv.outflowVolumeMl, 0);
    const durS = window.reduce((a, iv) => a + iv.durationS, 0);
    pvRatePerS = durS > 0 ? volMl / pvMl / durS : 0;
  }
  const poreVolumes =
    poreVolumesOfFlow !== null
      ? { value: poreVolumesOfFlow }
      : { value: null, reason: (porosity as { reason: string }).reason };

  const termination = evaluateTermination({ intervals, readings, settings, poreVolumes });

  let reported: RunEvaluation["reported"] = { flux: null, k20: null };
  let uncertainty: ExpandedUncertainty | null = null;
  if (termination.met) {
    const window = intervals.slice(-n);
    const mean = (f: (iv: Interval) => number) => window.reduce((a, iv) => a + f(iv), 0) / window.length;
    reported = { flux: mean((iv) => iv.flux), k20: mean((iv) => iv.k20) };
    const volumeMl = window.reduce((a, iv) => a + (iv.inflowVolumeMl + iv.outflowVolumeMl) / 2, 0);
    if (!Number.isFinite(reported.flux) || !Number.isFinite(reported.k20)) {
      // Only reachable with extreme inputs (overflow) or criteria sets that do not check the flow:
      // a non-number must never reach a certificate, and reported is null unless the criteria are met.
      reported = { flux: null, k20: null };
      termination.met = false;
      warnings.push("The reported values could not be computed as finite numbers from these readings; check the entered volumes, times and specimen size.");
    } else if (options.uncertainty && !(volumeMl > 0)) {
      warnings.push("No uncertainty is given because no flow passed over the reported intervals.");
    } else if (options.uncertainty) {
      uncertainty = expandedUncertainty({
        fluxM3PerM2PerS: reported.flux as number,
        k20MPerS: reported.k20 as number,
        diameterMm: specimen.diameterMm,
        thicknessMm: specimen.thicknessMm,
        volumeMl,
        durationS: window.reduce((a, iv) => a + iv.durationS, 0),
        headM: mean((iv) => iv.headM),
        unitWeightKNPerM3: mean((iv) => iv.unitWeightKNPerM3),
        temperatureC: mean((iv) => iv.temperatureC),
        declared: options.uncertainty,
        viscosityRatioBasis,
      });
    }
  }

  const projection = projectTermination({
    intervals,
    readings,
    settings,
    criteria: termination.criteria,
    poreVolumes: poreVolumesOfFlow !== null ? { value: poreVolumesOfFlow, ratePerS: pvRatePerS } : (poreVolumes as { value: null; reason: string }),
  });

  return {
    intervals,
    reported,
    termination,
    method: input.method,
    calculation: burettes ? "falling-head-rising-tail" : "constant-head",
    unitWeightBasis,
    viscosityRatioBasis,
    reportedBasis: `arithmetic mean of flux and of k20 over the last ${n} intervals, reported once every termination criterion is met`,
    settings,
    poreVolumesOfFlow,
    uncertainty,
    projection,
    warnings,
  };
}

function collectWarnings(intervals: readonly Interval[], basis: string, warnings: string[]): void {
  let negative = 0;
  let outside = 0;
  let iapws = 0;
  for (const iv of intervals) {
    if (iv.inflowVolumeMl < 0 || iv.outflowVolumeMl < 0) negative++;
    const inRange = iv.temperatureC >= D5084_EQUATION_RANGE_C.min && iv.temperatureC <= D5084_EQUATION_RANGE_C.max;
    if (!inRange) {
      if (iv.viscosityRatioSource === "IAPWS-2008") iapws++;
      else outside++;
    }
  }
  if (negative > 0) warnings.push(`${negative} interval(s) show a cumulative inflow or outflow that decreased; check for burette refills entered without correction.`);
  if (iapws > 0 && basis === "D5084-in-range") warnings.push(`${iapws} interval(s) are outside 15–30 °C, so R_T there comes from IAPWS 2008 viscosities instead of the D5084 equation.`);
  if (outside > 0) warnings.push(`${outside} interval(s) are outside 15–30 °C, where the D5084 R_T equation drifts from measured viscosity (about 1.2 % at 10 °C).`);
}
