/** A run's cumulative volumes as the evaluation sees them. Pure. */
import { cumulativeVolumesAcrossRefillsMl } from "../hydraulics/burettes";

export type StoredVolumes = {
  inflowLevelMm: number | null;
  outflowLevelMm: number | null;
  inflowCumulativeMl: number;
  outflowCumulativeMl: number;
  afterRefill: boolean;
};

/**
 * Cumulative inflow and outflow (mL) of the current readings, in the order given (by elapsed time), counted
 * from the first of them. When every reading has its burette levels and the panel's areas are known, the
 * volumes are recomputed from the levels, carried across refills: a reading stores the volumes computed
 * when it was entered, which a later correction of an earlier reading next to a refill can leave behind.
 * Otherwise (volumes only, a data-logger file without levels) the stored volumes are used; a volume a hair
 * below zero (burette noise within the entry tolerance) is given as 0.
 */
export function currentVolumesMl(readings: readonly StoredVolumes[], areasMm2: { inflow: number; outflow: number } | null): Array<{ inflowMl: number; outflowMl: number }> {
  const withLevels = readings.every((r) => r.inflowLevelMm !== null && r.outflowLevelMm !== null);
  if (withLevels && areasMm2 && readings.length > 0) {
    return cumulativeVolumesAcrossRefillsMl(
      readings.map((r) => ({ inflowLevelMm: r.inflowLevelMm!, outflowLevelMm: r.outflowLevelMm!, afterRefill: r.afterRefill })),
      { inflowAreaMm2: areasMm2.inflow, outflowAreaMm2: areasMm2.outflow },
    );
  }
  const base = readings[0];
  return readings.map((r) => ({
    inflowMl: Math.max(0, r.inflowCumulativeMl - (base?.inflowCumulativeMl ?? 0)),
    outflowMl: Math.max(0, r.outflowCumulativeMl - (base?.outflowCumulativeMl ?? 0)),
  }));
}
