/**
 * One permeation reading as entered (grid) or read (data-logger CSV), before it is placed on the run:
 * raw burette levels in mm, pressures already converted to Pa, time either as a date-time or as
 * seconds since permeation began. Pure.
 */
export type ReadingDraft = {
  takenAt?: Date;
  /** Seconds since permeation began (the startedAt of the run's PERMEATION stage). */
  elapsedS?: number;
  inflowLevelMm: number;
  outflowLevelMm: number;
  influentPressurePa: number;
  effluentPressurePa: number;
  cellPressurePa?: number | null;
  temperatureC: number;
  influentEcMsPerM?: number | null;
  effluentEcMsPerM?: number | null;
  influentPh?: number | null;
  effluentPh?: number | null;
  /** Taken right after a refill of the inflow burette or a drain of the outflow burette (the reading before is the one just before it). */
  afterRefill?: boolean;
};

/** A water permeation test runs between freezing and 40 °C; lib/hydraulics refuses anything else. */
export const TEMPERATURE_RANGE_C = { min: 0, max: 40 } as const;

/** How far a burette level may move the "wrong" way between readings (reading noise, meniscus), mm. */
export const LEVEL_TOLERANCE_MM = 0.5;

/** Readings may carry a clock a few minutes ahead of the server's. */
export const FUTURE_TOLERANCE_MS = 5 * 60_000;
