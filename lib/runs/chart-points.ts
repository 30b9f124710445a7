import type { Interval } from "../hydraulics";

/** The points the run charts draw: one per interval end, elapsed in hours. */
export function toChartPoints(intervals: readonly Interval[], readings: ReadonlyArray<{ elapsedS: number; inflowMl: number; outflowMl: number }>) {
  const volumes = new Map(readings.map((r) => [r.elapsedS, r]));
  return intervals.map((iv) => ({
    hours: iv.toS / 3600,
    inflowFlux: iv.inflowFlux,
    outflowFlux: iv.outflowFlux,
    ratio: Number.isFinite(iv.ratio) ? iv.ratio : Number.NaN,
    k20: iv.k20,
    inflowMl: volumes.get(iv.toS)?.inflowMl ?? Number.NaN,
    outflowMl: volumes.get(iv.toS)?.outflowMl ?? Number.NaN,
  }));
}
