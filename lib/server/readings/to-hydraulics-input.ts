// Pure mapping, deliberately without "server-only": the run page's charts may use it on either side.
import type { RunInput } from "@/lib/hydraulics/types";
import { paToKPa } from "@/lib/hydraulics/units";

/** The fields of a saved Reading row that the hydraulics library needs. */
export type StoredReadingForHydraulics = {
  elapsedS: number;
  inflowCumulativeMl: number;
  outflowCumulativeMl: number;
  headPa: number;
  temperatureC: number;
  influentEcMsPerM: number | null;
  effluentEcMsPerM: number | null;
  influentPh: number | null;
  effluentPh: number | null;
};

/**
 * A run's current readings (none corrected by another) as lib/hydraulics RunInput["readings"]:
 * sorted by elapsed time, volumes counted from the first current reading (saved volumes count from the
 * run's first recorded reading, which a correction may have replaced), head in kPa, and EC/pH only where
 * recorded, since the library refuses null. A volume a hair below zero (burette noise within the entry
 * tolerance) is given as 0: the entry checks refuse anything larger.
 */
export function toHydraulicsReadings(readings: readonly StoredReadingForHydraulics[]): RunInput["readings"] {
  const sorted = [...readings].sort((a, b) => a.elapsedS - b.elapsedS);
  const base = sorted[0];
  if (!base) return [];
  return sorted.map((r) => ({
    elapsedS: r.elapsedS,
    inflowMl: Math.max(0, r.inflowCumulativeMl - base.inflowCumulativeMl),
    outflowMl: Math.max(0, r.outflowCumulativeMl - base.outflowCumulativeMl),
    headKPa: paToKPa(r.headPa),
    temperatureC: r.temperatureC,
    ...(r.influentEcMsPerM !== null && { influentEcMsPerM: r.influentEcMsPerM }),
    ...(r.effluentEcMsPerM !== null && { effluentEcMsPerM: r.effluentEcMsPerM }),
    ...(r.influentPh !== null && { influentPh: r.influentPh }),
    ...(r.effluentPh !== null && { effluentPh: r.effluentPh }),
  }));
}
