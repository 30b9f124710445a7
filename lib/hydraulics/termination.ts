/**
 * Termination criteria as named sets per method. Every number is a lab-adjustable default; each
 * criterion says its value, its limit, whether it is met and one sentence for the technician.
 *
 * Sources of the defaults:
 * - Outflow/inflow ratio 0.75 to 1.25: ASTM D5084 and common practice for D5887 / D6766.
 * - No significant trend of the last consecutive values: D5084 / D5887 wording; judged here by a
 *   two-sided t test of the least-squares slope at alpha = 0.05 (common statistical practice).
 * - At least 4 consecutive k within ±25 % of their mean for k ≥ 1e-10 m/s, ±50 % below: D5084,
 *   from memory.
 * - D6766 chemical equilibrium: effluent EC within 10 % of influent (from memory); effluent pH within
 *   0.5 pH units of influent (from memory, LOW confidence: check against the lab's copy of D6766);
 *   at least 2 pore volumes of flow (from memory).
 */
import { leastSquaresSlopeTest } from "./trend";
import type { Criterion, CriterionKey, Interval, Reading, TerminationSettings, TestMethod } from "./types";

const COMMON = {
  consecutiveIntervals: 4,
  ratioMin: 0.75,
  ratioMax: 1.25,
  trendAlpha: 0.05,
  kBandFraction: 0.25,
  kBandFractionBelowThreshold: 0.5,
  kBandThresholdMPerS: 1e-10,
  ecToleranceFraction: 0.1,
  phToleranceUnits: 0.5,
  minPoreVolumes: 2,
} as const;

/** Default criteria and numbers per method. */
export const TERMINATION_DEFAULTS: Readonly<Record<TestMethod, Readonly<TerminationSettings>>> = {
  // D5887 reports index flux, so its steadiness is judged on flux.
  D5887: { ...COMMON, trendQuantity: "flux", criteria: ["ratio-band", "trend"] },
  // D5084 judges steadiness on k; k20 is used so that temperature drift does not look like a trend.
  D5084: { ...COMMON, trendQuantity: "k20", criteria: ["ratio-band", "k-band", "trend"] },
  D6766: {
    ...COMMON,
    trendQuantity: "flux",
    criteria: ["ratio-band", "trend", "ec-equilibrium", "ph-equilibrium", "pore-volumes"],
  },
};

const CRITERION_KEYS: readonly CriterionKey[] = ["ratio-band", "trend", "k-band", "ec-equilibrium", "ph-equilibrium", "pore-volumes"];

function fail(field: string, why: string): never {
  throw new Error(`options.termination.${field} ${why}`);
}

/** Method defaults with the lab's overrides applied, checked for sense. */
export function resolveTerminationSettings(
  method: TestMethod,
  overrides: Partial<TerminationSettings> = {},
): TerminationSettings {
  const s: TerminationSettings = { ...TERMINATION_DEFAULTS[method], ...stripUndefined(overrides) };
  if (!Array.isArray(s.criteria) || s.criteria.some((c) => !CRITERION_KEYS.includes(c)))
    fail("criteria", `must list only ${CRITERION_KEYS.join(", ")}, got ${String(s.criteria)}`);
  const minN = s.criteria.includes("trend") ? 3 : 2;
  if (!Number.isInteger(s.consecutiveIntervals) || s.consecutiveIntervals < minN)
    fail("consecutiveIntervals", `must be an integer ≥ ${minN} (the slope test needs 3 points), got ${s.consecutiveIntervals}`);
  if (!(Number.isFinite(s.ratioMin) && Number.isFinite(s.ratioMax) && s.ratioMin > 0 && s.ratioMin < s.ratioMax))
    fail("ratioMin", `and ratioMax must satisfy 0 < ratioMin < ratioMax, got ${s.ratioMin} and ${s.ratioMax}`);
  if (!(s.trendAlpha > 0 && s.trendAlpha < 1)) fail("trendAlpha", `must be between 0 and 1, got ${s.trendAlpha}`);
  for (const f of ["kBandFraction", "kBandFractionBelowThreshold", "kBandThresholdMPerS", "ecToleranceFraction", "phToleranceUnits", "minPoreVolumes"] as const) {
    if (!(Number.isFinite(s[f]) && s[f] >= 0)) fail(f, `must be a finite number ≥ 0, got ${s[f]}`);
  }
  if (s.trendMinRelativeChange !== undefined && !(Number.isFinite(s.trendMinRelativeChange) && s.trendMinRelativeChange >= 0))
    fail("trendMinRelativeChange", `must be a finite number ≥ 0, got ${s.trendMinRelativeChange}`);
  return s;
}

function stripUndefined<T extends object>(o: T): Partial<T> {
  const out: Partial<T> = {};
  for (const [key, v] of Object.entries(o)) if (v !== undefined) (out as Record<string, unknown>)[key] = v;
  return out;
}

const fmt = (x: number, digits = 3): string => (Number.isFinite(x) ? x.toPrecision(digits) : String(x));
const pct = (fraction: number): string => `${+(fraction * 100).toFixed(1)} %`;

export interface TerminationContext {
  intervals: readonly Interval[];
  readings: readonly Reading[];
  settings: TerminationSettings;
  /** Pore volumes of flow so far, or the reason they cannot be computed. */
  poreVolumes: { value: number } | { value: null; reason: string };
}

/** Evaluate every criterion of the settings' set; met only when all of them are met. */
export function evaluateTermination(ctx: TerminationContext): { met: boolean; criteria: Criterion[] } {
  const criteria = ctx.settings.criteria.map((key) => evaluateCriterion(key, ctx));
  return { met: criteria.length > 0 && criteria.every((c) => c.met), criteria };
}

function tooFew(key: CriterionKey, name: string, limit: string, have: number, need: number): Criterion {
  return {
    key,
    name,
    met: false,
    value: null,
    limit,
    message: `Needs ${need} consecutive intervals and there ${have === 1 ? "is" : "are"} ${have} so far; keep taking readings.`,
  };
}

/** Evaluate one criterion by key. */
export function evaluateCriterion(key: CriterionKey, ctx: TerminationContext): Criterion {
  const s = ctx.settings;
  const n = s.consecutiveIntervals;
  const last = ctx.intervals.slice(-n);
  switch (key) {
    case "ratio-band": {
      const name = "Outflow/inflow ratio";
      const limit = `${s.ratioMin} ≤ outflow/inflow ≤ ${s.ratioMax} for each of the last ${n} intervals`;
      if (last.length < n) return tooFew(key, name, limit, last.length, n);
      const noInflow = last.find((iv) => !Number.isFinite(iv.ratio));
      if (noInflow) {
        return { key, name, met: false, value: null, limit, message: `No inflow was recorded between ${noInflow.fromS} s and ${noInflow.toS} s, so the ratio cannot be judged; check the inflow burette.` };
      }
      // A cumulative volume that went down (a burette refill entered without correction) gives a
      // negative volume; two of them make a positive ratio that would pass the band unnoticed.
      const decreased = last.find((iv) => iv.inflowVolumeMl < 0 || iv.outflowVolumeMl < 0);
      if (decreased) {
        return { key, name, met: false, value: null, limit, message: `The cumulative ${decreased.inflowVolumeMl < 0 ? "inflow" : "outflow"} went down between ${decreased.fromS} s and ${decreased.toS} s; correct the readings for the burette refill before the ratio can be judged.` };
      }
      let worst = 1;
      for (const iv of last) if (Math.abs(iv.ratio - 1) > Math.abs(worst - 1)) worst = iv.ratio;
      const met = last.every((iv) => iv.ratio >= s.ratioMin && iv.ratio <= s.ratioMax);
      return {
        key, name, met, value: worst, limit,
        message: met
          ? `Outflow and inflow agree: the ratio stayed between ${s.ratioMin} and ${s.ratioMax} (furthest from 1: ${fmt(worst)}).`
          : `Outflow and inflow do not yet agree: a ratio of ${fmt(worst)} is outside ${s.ratioMin}–${s.ratioMax}; check for leaks or air and keep permeating.`,
      };
    }
    case "trend": {
      const quantity = s.trendQuantity === "flux" ? "flux" : "k20";
      const name = `No significant trend in ${quantity}`;
      const practical = s.trendMinRelativeChange;
      const limit =
        `two-sided p ≥ ${s.trendAlpha} for the least-squares slope of ${quantity} over the last ${n} intervals` +
        (practical !== undefined ? `, or a fitted change across them below ${pct(practical)} of the mean (a trend needs both)` : "");
      if (last.length < n) return tooFew(key, name, limit, last.length, n);
      const t = assessTrend(last, s);
      if (t === null) {
        return { key, name, met: false, value: null, limit, message: `The trend of ${quantity} could not be computed from the last ${n} intervals; check the readings.` };
      }
      const p = t.pValue;
      const met = !t.trend;
      const direction = t.slopePerS > 0 ? "rising" : "falling";
      const change = `fitted change ${pct(t.relativeChange)} of the mean across the window`;
      let message: string;
      if (practical === undefined) {
        message = met
          ? `No significant trend in ${quantity} over the last ${n} intervals (p = ${fmt(p, 2)}).`
          : `${quantity === "flux" ? "Flux" : "k20"} is still ${direction} by about ${pct(Math.abs(t.relativeChangePerDay))} of its mean per day (p = ${fmt(p, 2)}); keep permeating until it levels off.`;
      } else if (met) {
        message = t.statistical
          ? `The slope is statistically significant (p = ${fmt(p, 2)}) but small: ${change}, below the ${pct(practical)} that counts as a trend.`
          : `No significant trend in ${quantity} over the last ${n} intervals (p = ${fmt(p, 2)}; ${change}).`;
      } else {
        message = `${quantity === "flux" ? "Flux" : "k20"} is still ${direction}: p = ${fmt(p, 2)} and ${change}, at least the ${pct(practical)} that counts as a trend; keep permeating until it levels off.`;
      }
      return { key, name, met, value: p, limit, message };
    }
    case "k-band": {
      const name = "Consecutive k20 within band of their mean";
      const limit = `each of the last ${n} k20 within ±${pct(s.kBandFraction)} of their mean (±${pct(s.kBandFractionBelowThreshold)} when the mean is below ${s.kBandThresholdMPerS} m/s)`;
      if (last.length < n) return tooFew(key, name, limit, last.length, n);
      const mean = last.reduce((acc, iv) => acc + iv.k20, 0) / n;
      if (!(mean > 0 && Number.isFinite(mean))) {
        return { key, name, met: false, value: null, limit, message: `The mean k20 of the last ${n} intervals is not a positive number; check the readings.` };
      }
      const band = mean >= s.kBandThresholdMPerS ? s.kBandFraction : s.kBandFractionBelowThreshold;
      let worst = 0;
      for (const iv of last) worst = Math.max(worst, Math.abs(iv.k20 / mean - 1));
      const met = worst <= band;
      return {
        key, name, met, value: worst, limit,
        message: met
          ? `The last ${n} k20 values lie within ±${pct(band)} of their mean ${fmt(mean)} m/s (largest deviation ${pct(worst)}).`
          : `The last ${n} k20 values spread ${pct(worst)} from their mean, more than ±${pct(band)}; keep permeating.`,
      };
    }
    case "ec-equilibrium": {
      const name = "Effluent EC matches influent";
      const limit = `|EC effluent / EC influent − 1| ≤ ${pct(s.ecToleranceFraction)} at the latest paired reading`;
      const r = latest(ctx.readings, (x) => x.influentEcMsPerM !== undefined && x.effluentEcMsPerM !== undefined);
      if (!r) return { key, name, met: false, value: null, limit, message: "No reading has both influent and effluent EC yet; measure both to judge chemical equilibrium." };
      const inf = r.influentEcMsPerM as number;
      const eff = r.effluentEcMsPerM as number;
      if (!(inf > 0)) return { key, name, met: false, value: null, limit, message: `The influent EC at ${r.elapsedS} s is zero, so the ratio cannot be judged; check the EC meter.` };
      const ratio = eff / inf;
      // 1e-12 of slack so that a ratio of exactly 1.1 counts as within 10 % despite binary rounding.
      const met = Math.abs(ratio - 1) <= s.ecToleranceFraction + 1e-12;
      return {
        key, name, met, value: ratio, limit,
        message: met
          ? `Effluent EC is ${fmt(ratio)} times the influent's, within ${pct(s.ecToleranceFraction)}.`
          : `Effluent EC is ${fmt(ratio)} times the influent's; the specimen is not yet in chemical equilibrium with the permeant.`,
      };
    }
    case "ph-equilibrium": {
      const name = "Effluent pH matches influent";
      const limit = `|pH effluent − pH influent| ≤ ${s.phToleranceUnits} at the latest paired reading (low-confidence default)`;
      const r = latest(ctx.readings, (x) => x.influentPh !== undefined && x.effluentPh !== undefined);
      if (!r) return { key, name, met: false, value: null, limit, message: "No reading has both influent and effluent pH yet; measure both to judge chemical equilibrium." };
      const diff = (r.effluentPh as number) - (r.influentPh as number);
      const met = Math.abs(diff) <= s.phToleranceUnits + 1e-12;
      return {
        key, name, met, value: diff, limit,
        message: met
          ? `Effluent pH is within ${s.phToleranceUnits} of the influent's (difference ${fmt(Math.abs(diff), 2)}).`
          : `Effluent pH is ${fmt(Math.abs(diff), 2)} ${diff > 0 ? "above" : "below"} the influent's, more than the ${s.phToleranceUnits} allowed; keep permeating.`,
      };
    }
    case "pore-volumes": {
      const name = "Pore volumes of flow";
      const limit = `≥ ${s.minPoreVolumes} pore volumes of outflow`;
      if (ctx.poreVolumes.value === null) {
        return { key, name, met: false, value: null, limit, message: `Pore volumes cannot be counted: ${ctx.poreVolumes.reason}.` };
      }
      const pv = ctx.poreVolumes.value;
      const met = pv >= s.minPoreVolumes;
      return {
        key, name, met, value: pv, limit,
        message: met
          ? `${fmt(pv)} pore volumes have passed, at least the ${s.minPoreVolumes} required.`
          : `Only ${fmt(pv)} of the ${s.minPoreVolumes} pore volumes required have passed; keep permeating.`,
      };
    }
  }
}

/** Both judgements of a trend over a window of intervals: the statistical one and the practical one. */
export interface TrendAssessment {
  quantity: "flux" | "k20";
  /** Two-sided p-value of the least-squares slope (1 for values equal to within float rounding). */
  pValue: number;
  /** Fitted slope, units of the quantity per second. */
  slopePerS: number;
  /** |fitted change from the first to the last interval's midpoint| / |mean|. */
  relativeChange: number;
  /** Fitted change per day as a fraction of the mean (signed). */
  relativeChangePerDay: number;
  /** p below trendAlpha. */
  statistical: boolean;
  /** Fitted change at least trendMinRelativeChange, or null when no practical threshold is set. */
  practical: boolean | null;
  /** Whether the window shows a trend: the statistical test, and the practical one when it is set. */
  trend: boolean;
}

/**
 * The slope test and the practical size of a trend over `window` (normally the last N intervals),
 * or null when the window gives no finite statistic (fewer than 3 intervals, non-finite values).
 */
export function assessTrend(window: readonly Interval[], settings: Pick<TerminationSettings, "trendQuantity" | "trendAlpha" | "trendMinRelativeChange">): TrendAssessment | null {
  const x = window.map((iv) => (iv.fromS + iv.toS) / 2);
  const y = window.map((iv) => (settings.trendQuantity === "flux" ? iv.flux : iv.k20));
  if (y.length < 3) return null;
  const test = leastSquaresSlopeTest(x, y);
  const mean = y.reduce((acc, v) => acc + v, 0) / y.length;
  // Values equal to within float rounding (1e-9 of the mean) have no trend to test: rounding
  // noise of ideal or repeated readings must not read as a significant slope.
  const flat = y.every((v) => Math.abs(v - mean) <= 1e-9 * Math.abs(mean));
  const p = flat ? 1 : test.pValue;
  if (p === null || !Number.isFinite(p) || !Number.isFinite(mean)) return null;
  const span = (x[x.length - 1] as number) - (x[0] as number);
  const relativeChange = mean !== 0 ? Math.abs((test.slope * span) / mean) : 0;
  const statistical = p < settings.trendAlpha;
  const practical = settings.trendMinRelativeChange === undefined ? null : relativeChange >= settings.trendMinRelativeChange;
  return {
    quantity: settings.trendQuantity,
    pValue: p,
    slopePerS: test.slope,
    relativeChange,
    relativeChangePerDay: mean !== 0 ? (test.slope * 86400) / mean : 0,
    statistical,
    practical,
    trend: statistical && practical !== false,
  };
}

function latest(readings: readonly Reading[], has: (r: Reading) => boolean): Reading | undefined {
  for (let i = readings.length - 1; i >= 0; i--) {
    const r = readings[i] as Reading;
    if (has(r)) return r;
  }
  return undefined;
}
