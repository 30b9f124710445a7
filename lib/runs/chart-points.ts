import type { Interval } from "../hydraulics";

/**
 * The points the run charts draw: one per interval end, elapsed in hours, with the cumulative volumes and,
 * when the specimen's pore volume (mL) is known, the pore volumes of outflow passed by then.
 */
export function toChartPoints(intervals: readonly Interval[], readings: ReadonlyArray<{ elapsedS: number; inflowMl: number; outflowMl: number }>, poreVolumeMl: number | null = null) {
  // Readings and intervals both run by elapsed time, so one walk pairs each interval's end with its reading
  // (the last reading at that time, as a lookup by time would); anything out of order falls back to a lookup.
  let next = 0;
  let byTime: Map<number, (typeof readings)[number]> | null = null;
  const readingAt = (elapsedS: number) => {
    while (next < readings.length && readings[next]!.elapsedS < elapsedS) next++;
    if (readings[next]?.elapsedS === elapsedS) {
      while (readings[next + 1]?.elapsedS === elapsedS) next++;
      return readings[next];
    }
    byTime ??= new Map(readings.map((r) => [r.elapsedS, r]));
    return byTime.get(elapsedS);
  };
  return intervals.map((iv) => {
    const reading = readingAt(iv.toS);
    const outflowMl = reading?.outflowMl ?? Number.NaN;
    return {
      hours: iv.toS / 3600,
      inflowFlux: iv.inflowFlux,
      outflowFlux: iv.outflowFlux,
      ratio: Number.isFinite(iv.ratio) ? iv.ratio : Number.NaN,
      k20: iv.k20,
      inflowMl: reading?.inflowMl ?? Number.NaN,
      outflowMl,
      poreVolumes: poreVolumeMl ? outflowMl / poreVolumeMl : Number.NaN,
    };
  });
}
