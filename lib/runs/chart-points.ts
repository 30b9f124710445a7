import type { Interval } from "../hydraulics";

/**
 * The points the run charts draw: one per interval end, elapsed in hours, with the cumulative volumes and,
 * when the specimen's pore volume (mL) is known, the pore volumes of outflow passed by then.
 */
export function toChartPoints(intervals: readonly Interval[], readings: ReadonlyArray<{ elapsedS: number; inflowMl: number; outflowMl: number }>, poreVolumeMl: number | null = null) {
  const volumes = new Map(readings.map((r) => [r.elapsedS, r]));
  return intervals.map((iv) => {
    const outflowMl = volumes.get(iv.toS)?.outflowMl ?? Number.NaN;
    return {
      hours: iv.toS / 3600,
      inflowFlux: iv.inflowFlux,
      outflowFlux: iv.outflowFlux,
      ratio: Number.isFinite(iv.ratio) ? iv.ratio : Number.NaN,
      k20: iv.k20,
      inflowMl: volumes.get(iv.toS)?.inflowMl ?? Number.NaN,
      outflowMl,
      poreVolumes: poreVolumeMl ? outflowMl / poreVolumeMl : Number.NaN,
    };
  });
}
