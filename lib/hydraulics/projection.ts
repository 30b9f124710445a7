/**
 * A projection of when the termination criteria will probably be met, for planning the cell board.
 * Given only when the data support one; otherwise null with the reason. Cheap: it looks only at the
 * last 2N intervals and the last few paired chemistry readings.
 *
 * Models (each used only when its premise is visible in the data):
 * - too few intervals, but those so far meet the ratio band: met after the missing intervals at
 *   the median interval length;
 * - a trend that is dying away: the slope of the last N intervals is smaller than that of the N
 *   before, same sign, so it is extrapolated as a geometric decay until the slope test would
 *   no longer be significant (or the k spread would fit its band);
 * - ratio band, EC and pH: a significant straight-line approach toward the band, extrapolated to
 *   where it enters, plus N intervals to confirm;
 * - pore volumes: the present rate of outflow continued.
 */
import { leastSquaresSlopeTest, studentTQuantile } from "./trend";
import type { Criterion, CriterionKey, Interval, Projection, Reading, TerminationSettings } from "./types";

interface Part {
  key: CriterionKey;
  projectedAtS: number | null;
  reason: string;
}

export interface ProjectionContext {
  intervals: readonly Interval[];
  readings: readonly Reading[];
  settings: TerminationSettings;
  criteria: readonly Criterion[];
  poreVolumes: { value: number; ratePerS: number } | { value: null; reason: string };
}

const MAX_WINDOWS_AHEAD = 50; // beyond this, a decay extrapolation is guesswork

/** Projected elapsed time (s) when all criteria will probably be met, or null with the reason. */
export function projectTermination(ctx: ProjectionContext): Projection {
  const { intervals, settings } = ctx;
  const n = settings.consecutiveIntervals;
  const lastInterval = intervals[intervals.length - 1];
  const nowS = lastInterval ? lastInterval.toS : 0;
  const unmet = ctx.criteria.filter((c) => !c.met);
  if (unmet.length === 0) return { projectedAtS: nowS, reason: "The termination criteria are already met.", byCriterion: [] };
  const recent = intervals.slice(-n);
  const stepS = median(recent.map((iv) => iv.durationS));
  const parts: Part[] = unmet.map((c) => projectCriterion(c.key, ctx, nowS, stepS));
  const missing = parts.find((p) => p.projectedAtS === null);
  if (missing) return { projectedAtS: null, reason: missing.reason, byCriterion: parts };
  const at = Math.max(...parts.map((p) => p.projectedAtS as number));
  return { projectedAtS: at, reason: `Latest of the criteria projections: ${parts.map((p) => p.reason).join(" ")}`, byCriterion: parts };
}

function projectCriterion(key: CriterionKey, ctx: ProjectionContext, nowS: number, stepS: number): Part {
  const s = ctx.settings;
  const n = s.consecutiveIntervals;
  const m = ctx.intervals.length;
  const none = (reason: string): Part => ({ key, projectedAtS: null, reason });
  const after = (t: number, reason: string): Part => ({ key, projectedAtS: Math.max(nowS, t), reason });
  switch (key) {
    case "ratio-band": {
      const recent = ctx.intervals.slice(-n);
      if (m < n) {
        const inBand = recent.every((iv) => iv.ratio >= s.ratioMin && iv.ratio <= s.ratioMax);
        return inBand
          ? after(nowS + (n - m) * stepS, `Ratio in band so far; ${n - m} more interval(s) needed.`)
          : none("Ratio outside its band with too few intervals to see where it is going.");
      }
      const w = ctx.intervals.slice(-2 * n);
      return approachBand(key, w.map(mid), w.map((iv) => iv.ratio), s.ratioMin, s.ratioMax, s.trendAlpha, nowS, n * stepS, "outflow/inflow ratio");
    }
    case "trend":
    case "k-band": {
      if (m < 2 * n) return none(`Projecting a trend needs ${2 * n} intervals; there are ${m}.`);
      const useK = key === "k-band" || s.trendQuantity === "k20";
      const value = (iv: Interval) => (useK ? iv.k20 : iv.flux);
      const now = ctx.intervals.slice(-n);
      const before = ctx.intervals.slice(-2 * n, -n);
      const fitNow = windowSlope(now, value);
      const fitBefore = windowSlope(before, value);
      if (!fitNow || !fitBefore) return none("The slope of the recent intervals could not be computed.");
      const r = fitNow.slopePerS / fitBefore.slopePerS;
      if (!(r > 0 && r < 0.95)) return none("The trend is not dying away, so no end can be projected yet.");
      const spanS = now.reduce((acc, iv) => acc + iv.durationS, 0);
      // Target slope: where the t test stops being significant (same scatter as now), or where a
      // straight line over the window would stay inside the k band around the window mean.
      let target: number;
      if (key === "trend") {
        const tCrit = studentTQuantile(1 - s.trendAlpha / 2, n - 2);
        target = tCrit * fitNow.standardErrorPerS;
      } else {
        const mean = fitNow.mean;
        const band = mean >= s.kBandThresholdMPerS ? s.kBandFraction : s.kBandFractionBelowThreshold;
        target = (band * mean) / (spanS / 2);
      }
      const current = Math.abs(fitNow.slopePerS);
      if (current <= target) return after(nowS + stepS, "The slope is already near the limit; one more interval should show it.");
      const windows = Math.log(target / current) / Math.log(r);
      if (!(windows > 0) || windows > MAX_WINDOWS_AHEAD) return none("The trend is dying away too slowly to project its end with any confidence.");
      return after(nowS + windows * spanS, `The ${useK ? "k20" : "flux"} trend is shrinking by a factor ${r.toFixed(2)} per ${n} intervals.`);
    }
    case "ec-equilibrium":
    case "ph-equilibrium": {
      const ec = key === "ec-equilibrium";
      const pts = pairedChemistry(ctx.readings, ec, 2 * n + 2);
      if (pts.x.length < 4) return none(`Projecting ${ec ? "EC" : "pH"} needs at least 4 paired readings.`);
      const lo = ec ? 1 - s.ecToleranceFraction : -s.phToleranceUnits;
      const hi = ec ? 1 + s.ecToleranceFraction : s.phToleranceUnits;
      return approachBand(key, pts.x, pts.y, lo, hi, s.trendAlpha, nowS, 0, ec ? "effluent/influent EC" : "effluent − influent pH");
    }
    case "pore-volumes": {
      const pv = ctx.poreVolumes;
      if (pv.value === null) return none(`Pore volumes cannot be counted: ${pv.reason}.`);
      if (!(pv.ratePerS > 0)) return none("No outflow over the recent intervals, so pore volumes are not increasing.");
      return after(nowS + (s.minPoreVolumes - pv.value) / pv.ratePerS, `${pv.value.toFixed(2)} pore volumes so far at the present outflow rate.`);
    }
  }
}

const mid = (iv: Interval): number => (iv.fromS + iv.toS) / 2;

function median(xs: number[]): number {
  if (xs.length === 0) return 0;
  const s = [...xs].sort((a, b) => a - b);
  const h = Math.floor(s.length / 2);
  return s.length % 2 ? (s[h] as number) : ((s[h - 1] as number) + (s[h] as number)) / 2;
}

// Absolute slopes: for an exponential approach to a plateau the slope itself decays geometrically,
// whereas a relative slope also shrinks for a quantity that keeps growing.
function windowSlope(ivs: readonly Interval[], value: (iv: Interval) => number) {
  const y = ivs.map(value);
  const mean = y.reduce((a, b) => a + b, 0) / y.length;
  const fit = leastSquaresSlopeTest(ivs.map(mid), y);
  if (!(mean > 0) || !Number.isFinite(fit.slope) || fit.slope === 0) return null;
  const se = Number.isFinite(fit.slopeStandardError) ? fit.slopeStandardError : 0;
  return { slopePerS: fit.slope, standardErrorPerS: se, mean };
}

/** Straight-line approach of y(x) into [lo, hi]; confirmS is added after it enters. */
function approachBand(
  key: CriterionKey, x: number[], y: number[], lo: number, hi: number, alpha: number,
  nowS: number, confirmS: number, what: string,
): Part {
  const fit = leastSquaresSlopeTest(x, y);
  const latest = y[y.length - 1] as number;
  const inside = latest >= lo && latest <= hi;
  if (inside) return { key, projectedAtS: nowS + confirmS, reason: `The ${what} is inside its band now; it needs to stay there.` };
  const edge = latest < lo ? lo : hi;
  const towards = latest < lo ? fit.slope > 0 : fit.slope < 0;
  if (fit.pValue === null || !(fit.pValue < alpha) || !towards) {
    return { key, projectedAtS: null, reason: `The ${what} shows no clear approach to its band, so no time can be projected.` };
  }
  const crossS = (edge - fit.intercept) / fit.slope;
  return { key, projectedAtS: Math.max(nowS, crossS) + confirmS, reason: `The ${what} is moving toward its band in a straight line.` };
}

function pairedChemistry(readings: readonly Reading[], ec: boolean, max: number): { x: number[]; y: number[] } {
  const x: number[] = [];
  const y: number[] = [];
  for (let i = readings.length - 1; i >= 0 && x.length < max; i--) {
    const r = readings[i] as Reading;
    if (ec && r.influentEcMsPerM !== undefined && r.effluentEcMsPerM !== undefined && r.influentEcMsPerM > 0) {
      x.push(r.elapsedS);
      y.push(r.effluentEcMsPerM / r.influentEcMsPerM);
    } else if (!ec && r.influentPh !== undefined && r.effluentPh !== undefined) {
      x.push(r.elapsedS);
      y.push(r.effluentPh - r.influentPh);
    }
  }
  return { x: x.reverse(), y: y.reverse() };
}
