/**
 * Places drafted readings on a run: the time as both a date-time and seconds since permeation began,
 * the head from the two line pressures, cumulative volumes from the raw levels and the calibrated
 * burette areas (carried across refills and drains, which count no flow), and every cross-row problem.
 * Pure; the server saves `rows` only when `problems` is empty.
 */
import { cumulativeVolumesAcrossRefillsMl } from "@/lib/hydraulics/burettes";
import { checkReadingSequence, type NeighbourReading, type SequenceField } from "./check-reading-sequence";
import type { PressureUnit } from "@/lib/units/pressure-entry";
import { FUTURE_TOLERANCE_MS, type ReadingDraft } from "./reading-draft";

export type PreparedReading = {
  takenAt: Date;
  elapsedS: number;
  inflowLevelMm: number;
  outflowLevelMm: number;
  inflowCumulativeMl: number;
  outflowCumulativeMl: number;
  headPa: number;
  influentPressurePa: number;
  effluentPressurePa: number;
  cellPressurePa: number | null;
  temperatureC: number;
  influentEcMsPerM: number | null;
  effluentEcMsPerM: number | null;
  influentPh: number | null;
  effluentPh: number | null;
  afterRefill: boolean;
};

/**
 * The saved reading just before the drafts (the run's latest, or the one before a corrected reading): the
 * drafts' cumulative volumes continue from its volumes by the level changes since it, except across a
 * refill. null when the drafts start the run: the first draft's volumes are then 0.
 */
export type VolumeReference = { inflowLevelMm: number; outflowLevelMm: number; inflowCumulativeMl: number; outflowCumulativeMl: number };

export type PrepareProblem = { index: number; field: SequenceField; message: string };

export function prepareReadings(input: {
  drafts: ReadonlyArray<{ label: string; draft: ReadingDraft }>;
  permeationStartedAt: Date;
  now: Date;
  /** Burette cross-section areas from the burette panel's calibration, mm^2. */
  areasMm2: { inflow: number; outflow: number };
  /** The calibrated range of the burette scales, mm; readings outside it are refused. */
  scaleRangeMm?: { min: number; max: number } | null;
  /** The saved reading just before the drafts, or null when the drafts start the run. */
  reference: VolumeReference | null;
  previous?: NeighbourReading | null;
  next?: NeighbourReading | null;
  pressureUnit?: PressureUnit;
}): { rows: PreparedReading[]; problems: PrepareProblem[] } {
  const start = input.permeationStartedAt.getTime();
  const problems: PrepareProblem[] = [];
  const reference = input.reference;
  const levels = [...(reference ? [reference] : []), ...input.drafts.map((d) => ({ ...d.draft, afterRefill: d.draft.afterRefill ?? false }))];
  const volumes = cumulativeVolumesAcrossRefillsMl(levels, { inflowAreaMm2: input.areasMm2.inflow, outflowAreaMm2: input.areasMm2.outflow }, reference ? { inflowMl: reference.inflowCumulativeMl, outflowMl: reference.outflowCumulativeMl } : undefined).slice(reference ? 1 : 0);
  const range = input.scaleRangeMm ?? null;

  const rows = input.drafts.map(({ label, draft }, index): PreparedReading => {
    const takenAt = draft.takenAt ?? new Date(start + (draft.elapsedS ?? 0) * 1000);
    const elapsedS = draft.takenAt ? (draft.takenAt.getTime() - start) / 1000 : (draft.elapsedS ?? 0);
    if (takenAt.getTime() > input.now.getTime() + FUTURE_TOLERANCE_MS)
      problems.push({ index, field: "time", message: `${label}, time: ${formatLocal(takenAt)} is in the future; a reading is recorded after it is taken.` });
    if (range)
      for (const [field, side] of [["inflowLevelMm", "inflow"], ["outflowLevelMm", "outflow"]] as const)
        if (draft[field] < range.min || draft[field] > range.max)
          problems.push({ index, field, message: `${label}, ${side} burette level: ${draft[field]} mm is outside the scale's calibrated range, ${range.min} to ${range.max} mm; check the reading, or recalibrate the panel.` });
    return {
      takenAt,
      elapsedS,
      inflowLevelMm: draft.inflowLevelMm,
      outflowLevelMm: draft.outflowLevelMm,
      inflowCumulativeMl: volumes[index]!.inflowMl,
      outflowCumulativeMl: volumes[index]!.outflowMl,
      headPa: draft.influentPressurePa - draft.effluentPressurePa,
      influentPressurePa: draft.influentPressurePa,
      effluentPressurePa: draft.effluentPressurePa,
      cellPressurePa: draft.cellPressurePa ?? null,
      temperatureC: draft.temperatureC,
      influentEcMsPerM: draft.influentEcMsPerM ?? null,
      effluentEcMsPerM: draft.effluentEcMsPerM ?? null,
      influentPh: draft.influentPh ?? null,
      effluentPh: draft.effluentPh ?? null,
      afterRefill: draft.afterRefill ?? false,
    };
  });

  problems.push(
    ...checkReadingSequence({
      rows: rows.map((r, i) => ({ label: input.drafts[i]!.label, ...r })),
      previous: input.previous ?? null,
      next: input.next ?? null,
      ...(input.pressureUnit ? { pressureUnit: input.pressureUnit } : {}),
    }),
  );
  problems.sort((a, b) => a.index - b.index);
  return { rows, problems };
}

function formatLocal(d: Date): string {
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())} ${pad(d.getHours())}:${pad(d.getMinutes())}`;
}
