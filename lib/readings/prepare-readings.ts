/**
 * Places drafted readings on a run: the time as both a date-time and seconds since permeation began,
 * the head from the two line pressures, cumulative volumes from the raw levels and the calibrated
 * burette areas, and every cross-row problem. Pure; the server saves `rows` only when `problems` is empty.
 */
import { cumulativeInflowMl, cumulativeOutflowMl } from "@/lib/hydraulics/burettes";
import { checkReadingSequence, type NeighbourReading, type SequenceField } from "./check-reading-sequence";
import { formatDateTime } from "@/lib/format/dates";
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
};

/**
 * The reading whose levels anchor the volumes: cumulative volume = its volume + the level change since
 * it × the burette area. The run's first reading (volumes 0) is the usual one; any saved reading with
 * levels gives the same answer, because the volumes are linear in the levels.
 */
export type VolumeReference = { inflowLevelMm: number; outflowLevelMm: number; inflowCumulativeMl: number; outflowCumulativeMl: number };

export type PrepareProblem = { index: number; field: SequenceField; message: string };

export function prepareReadings(input: {
  drafts: ReadonlyArray<{ label: string; draft: ReadingDraft }>;
  permeationStartedAt: Date;
  now: Date;
  /** The lab's time zone, for times named in messages (UTC when not given). */
  timeZone?: string;
  /** Burette cross-section areas from the burette panel's calibration, mm^2. */
  areasMm2: { inflow: number; outflow: number };
  /** null when the run has no reading yet: the first draft becomes the reference. */
  reference: VolumeReference | null;
  previous?: NeighbourReading | null;
  next?: NeighbourReading | null;
  pressureUnit?: PressureUnit;
}): { rows: PreparedReading[]; problems: PrepareProblem[] } {
  const start = input.permeationStartedAt.getTime();
  const problems: PrepareProblem[] = [];
  const first = input.drafts[0]?.draft;
  const reference: VolumeReference | null =
    input.reference ?? (first ? { inflowLevelMm: first.inflowLevelMm, outflowLevelMm: first.outflowLevelMm, inflowCumulativeMl: 0, outflowCumulativeMl: 0 } : null);
  if (!reference) return { rows: [], problems };

  const inflowMl = cumulativeInflowMl([reference.inflowLevelMm, ...input.drafts.map((d) => d.draft.inflowLevelMm)], input.areasMm2.inflow).slice(1);
  const outflowMl = cumulativeOutflowMl([reference.outflowLevelMm, ...input.drafts.map((d) => d.draft.outflowLevelMm)], input.areasMm2.outflow).slice(1);

  const rows = input.drafts.map(({ label, draft }, index): PreparedReading => {
    const takenAt = draft.takenAt ?? new Date(start + (draft.elapsedS ?? 0) * 1000);
    const elapsedS = draft.takenAt ? (draft.takenAt.getTime() - start) / 1000 : (draft.elapsedS ?? 0);
    if (takenAt.getTime() > input.now.getTime() + FUTURE_TOLERANCE_MS)
      problems.push({ index, field: "time", message: `${label}, time: ${formatDateTime(takenAt, input.timeZone)} is in the future; a reading is recorded after it is taken.` });
    return {
      takenAt,
      elapsedS,
      inflowLevelMm: draft.inflowLevelMm,
      outflowLevelMm: draft.outflowLevelMm,
      inflowCumulativeMl: reference.inflowCumulativeMl + inflowMl[index]!,
      outflowCumulativeMl: reference.outflowCumulativeMl + outflowMl[index]!,
      headPa: draft.influentPressurePa - draft.effluentPressurePa,
      influentPressurePa: draft.influentPressurePa,
      effluentPressurePa: draft.effluentPressurePa,
      cellPressurePa: draft.cellPressurePa ?? null,
      temperatureC: draft.temperatureC,
      influentEcMsPerM: draft.influentEcMsPerM ?? null,
      effluentEcMsPerM: draft.effluentEcMsPerM ?? null,
      influentPh: draft.influentPh ?? null,
      effluentPh: draft.effluentPh ?? null,
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
