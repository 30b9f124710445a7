import { createRequire } from "node:module";
import { linearRegression } from "simple-statistics";
import { describe, expect, it } from "vitest";
import { assessTrend, evaluateRun, type Reading } from "../../../lib/hydraulics";

interface JStat { studentt: { cdf(t: number, df: number): number } }
const { jStat } = createRequire(import.meta.url)("jstat") as { jStat: JStat };

// Smooth, quantised data-logger readings (invented): 1.00 mL per 6 h with the logger's 0.01 mL steps
// rounding a flow that drifts by about 1 % across the last four intervals. The slope is tiny but, with
// almost no scatter, statistically "significant"; the practical test (a fitted change of at least 10 %
// of the mean, the lab's default, from memory) says it is no trend.
const STEP_S = 6 * 3600;
const vols = [0, 1.0, 2.0, 3.0, 4.0, 5.0, 6.0, 7.0, 8.0, 9.0, 10.0].map((v, i) => Number((v - 0.0009 * i * i).toFixed(3)));
const readings: Reading[] = vols.map((v, i) => ({ elapsedS: i * STEP_S, inflowMl: v, outflowMl: v, headKPa: 14, temperatureC: 20 }));
const specimen = { diameterMm: 100, thicknessMm: 6 };

describe("a trend test that means a trend", () => {
  it("the slope is statistically significant on smooth data (p checked with simple-statistics and jstat) but small", () => {
    const ev = evaluateRun({ method: "D5887", specimen, readings });
    const window = ev.intervals.slice(-4);
    const x = window.map((iv) => (iv.fromS + iv.toS) / 2);
    const y = window.map((iv) => iv.flux);
    // Reference: least-squares line by simple-statistics, its t statistic by hand, p from jstat's Student t.
    const { m } = linearRegression(x.map((xi, i) => [xi, y[i]!]));
    const mx = x.reduce((a, b) => a + b) / 4;
    const my = y.reduce((a, b) => a + b) / 4;
    const sxx = x.reduce((a, xi) => a + (xi - mx) ** 2, 0);
    const sse = y.reduce((a, yi, i) => a + (yi - (my + m * (x[i]! - mx))) ** 2, 0);
    const t = m / Math.sqrt(sse / 2 / sxx);
    const p = 2 * (1 - jStat.studentt.cdf(Math.abs(t), 2));
    const trend = assessTrend(window, { trendQuantity: "flux", trendAlpha: 0.05, trendMinRelativeChange: 0.1 })!;
    expect(trend.pValue).toBeCloseTo(p, 6);
    expect(trend.pValue).toBeLessThan(0.05);
    expect(trend.statistical).toBe(true);
    // Fitted change across the window: |slope| × (last midpoint - first midpoint) / mean flux.
    expect(trend.relativeChange).toBeCloseTo(Math.abs(m * (x[3]! - x[0]!)) / my, 12);
    expect(trend.relativeChange).toBeLessThan(0.1);
    expect(trend.practical).toBe(false);
    expect(trend.trend).toBe(false);
  });

  it("without a practical threshold the slope test alone decides, as before; with it, the trend criterion is met and says both numbers", () => {
    const alone = evaluateRun({ method: "D5887", specimen, readings });
    expect(alone.termination.criteria.find((c) => c.key === "trend")!.met).toBe(false);
    const both = evaluateRun({ method: "D5887", specimen, readings }, { termination: { trendMinRelativeChange: 0.1 } });
    const c = both.termination.criteria.find((x) => x.key === "trend")!;
    expect(c.met).toBe(true);
    expect(c.limit).toMatch(/or a fitted change across them below 10 % of the mean \(a trend needs both\)$/);
    expect(c.message).toMatch(/^The slope is statistically significant \(p = [\d.e-]+\) but small: fitted change \d+(\.\d+)? % of the mean across the window, below the 10 % that counts as a trend\.$/);
    expect(both.termination.met).toBe(true);
  });

  it("a real trend fails both tests and keeps the run going", () => {
    // Flux falling by 30 % over the last four intervals.
    const falling = [0, 1.6, 3.0, 4.3, 5.4, 6.35, 7.15, 7.85].map((v, i) => ({ elapsedS: i * STEP_S, inflowMl: v, outflowMl: v, headKPa: 14, temperatureC: 20 }));
    const ev = evaluateRun({ method: "D5887", specimen, readings: falling }, { termination: { trendMinRelativeChange: 0.1 } });
    const c = ev.termination.criteria.find((x) => x.key === "trend")!;
    expect(c.met).toBe(false);
    expect(c.message).toMatch(/^Flux is still falling: p = .* at least the 10 % that counts as a trend; keep permeating/);
  });

  it("refuses a negative practical threshold, naming the field", () => {
    expect(() => evaluateRun({ method: "D5887", specimen, readings }, { termination: { trendMinRelativeChange: -0.1 } })).toThrowError(/^options\.termination\.trendMinRelativeChange/);
  });
});
