import "server-only";
import { AppError, type FieldErrors } from "@/lib/errors/app-error";
import { readBurettePanel } from "@/lib/equipment/calibration-values";
import type { NeighbourReading } from "@/lib/readings/check-reading-sequence";
import { prepareReadings, type PrepareProblem, type PreparedReading, type VolumeReference } from "@/lib/readings/prepare-readings";
import type { ReadingDraft } from "@/lib/readings/reading-draft";
import type { PressureUnit } from "@/lib/units/pressure-entry";
import { runTransition, type RunStateName } from "@/lib/runs/run-state-machine";
import type { CurrentUser } from "../auth/current-user";
import type { Tx } from "../db/transaction";
import { readLabTimeZone } from "../lab/read-lab-time-zone";

/** The role of the RunEquipment row whose calibration holds the burette areas. */
export const BURETTE_PANEL_ROLE = "burette panel";

/** Burette areas in mm^2 from a calibration's values ({ inflowBuretteAreaM2, outflowBuretteAreaM2 }), or null. */
export function buretteAreasMm2(values: unknown): { inflow: number; outflow: number } | null {
  const panel = readBurettePanel(values);
  return panel ? { inflow: panel.inflowAreaMm2, outflow: panel.outflowAreaMm2 } : null;
}

export const readingLabel = (sequence: number) => `Reading ${sequence}`;

/**
 * Everything a reading write needs, read inside the write's transaction with the run row locked, so two
 * batches for one run cannot interleave their sequence numbers or their order checks. Refuses another
 * technician's run, a run whose state does not allow readings, a run without a permeation start or
 * without calibrated burette areas. A data-logger's API token (`instrumentCellIds`) is not a person: it may
 * record readings of any run in one of the cells it names, and of no other.
 */
export async function loadReadingContext(tx: Tx, options: { actor: CurrentUser; runId: string; instrumentCellIds?: readonly string[] }) {
  await tx.$queryRaw`SELECT id FROM "Run" WHERE id = ${options.runId} FOR UPDATE`;
  const run = await tx.run.findUnique({
    where: { id: options.runId },
    select: {
      id: true, labNumber: true, state: true, performedById: true, cellId: true, cell: { select: { assetTag: true } },
      stages: { where: { kind: "PERMEATION" }, orderBy: { sequence: "asc" }, take: 1, select: { startedAt: true } },
      equipment: { where: { role: BURETTE_PANEL_ROLE }, select: { equipment: { select: { assetTag: true } }, calibration: { select: { values: true, reference: true } } } },
    },
  });
  if (!run) throw new AppError("NOT_FOUND");
  if (options.instrumentCellIds) {
    if (!options.instrumentCellIds.includes(run.cellId))
      throw new AppError("FORBIDDEN", `${run.labNumber} is in cell ${run.cell.assetTag}, which this data-logger token does not name; it posts readings only to runs in its own cells.`);
  } else if (run.performedById !== options.actor.id)
    throw new AppError("FORBIDDEN", `${run.labNumber} is another technician's run; only the person performing it records its readings.`);
  const step = runTransition(run.state as RunStateName, "record-reading");
  if (!step.ok) throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber}: ${step.message}`, { details: { allowed: step.allowed } });
  const permeationStartedAt = run.stages[0]?.startedAt;
  if (!permeationStartedAt)
    throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber} has no permeation stage, so there is no start to count elapsed time from; record the permeation stage first.`);
  const panel = run.equipment[0];
  if (!panel) throw new AppError("INVALID_INPUT", `${run.labNumber} has no burette panel recorded, so burette levels cannot be turned into volumes.`);
  const areasMm2 = buretteAreasMm2(panel.calibration?.values);
  if (!areasMm2)
    throw new AppError("INVALID_INPUT", `The calibration of burette panel ${panel.equipment.assetTag} used by ${run.labNumber} holds no burette areas (inflowBuretteAreaM2, outflowBuretteAreaM2); ask the lab administrator to record them.`);

  const readings = await tx.reading.findMany({
    where: { runId: run.id },
    orderBy: [{ sequence: "asc" }, { createdAt: "asc" }],
    select: {
      id: true, sequence: true, elapsedS: true, inflowLevelMm: true, outflowLevelMm: true, inflowCumulativeMl: true, outflowCumulativeMl: true,
      headPa: true, influentPressurePa: true, effluentPressurePa: true, cellPressurePa: true, temperatureC: true,
      influentEcMsPerM: true, effluentEcMsPerM: true, influentPh: true, effluentPh: true, takenAt: true, afterRefill: true,
      correctedBy: { select: { id: true, createdAt: true, recordedBy: { select: { name: true } } } },
    },
  });
  const current = readings.filter((r) => !r.correctedBy).sort((a, b) => a.elapsedS - b.elapsedS);
  if (current.some((r) => r.inflowLevelMm === null || r.outflowLevelMm === null))
    throw new AppError("INVALID_INPUT", `The readings of ${run.labNumber} so far were saved as volumes without burette levels, so new levels cannot be continued from them.`);
  const scaleRangeMm = readBurettePanel(panel.calibration?.values)?.scaleRangeMm ?? null;
  /** The current reading at `index` as the volumes of readings after it continue from (null before the first). */
  const referenceAt = (index: number): VolumeReference | null => {
    const r = current[index];
    return r ? { inflowLevelMm: r.inflowLevelMm!, outflowLevelMm: r.outflowLevelMm!, inflowCumulativeMl: r.inflowCumulativeMl, outflowCumulativeMl: r.outflowCumulativeMl } : null;
  };
  const nextSequence = readings.reduce((max, r) => Math.max(max, r.sequence), 0) + 1;
  // The lab's time zone: logger times without a zone are its wall-clock times, and messages name times in it.
  const timeZone = await readLabTimeZone(tx);
  return { run, permeationStartedAt, areasMm2, scaleRangeMm, readings, current, referenceAt, nextSequence, timeZone };
}
export type ReadingContext = Awaited<ReturnType<typeof loadReadingContext>>;

export function asNeighbour(reading: { sequence: number; elapsedS: number; inflowLevelMm: number | null; outflowLevelMm: number | null; afterRefill: boolean } | undefined): NeighbourReading | null {
  return reading ? { label: readingLabel(reading.sequence), elapsedS: reading.elapsedS, inflowLevelMm: reading.inflowLevelMm, outflowLevelMm: reading.outflowLevelMm, afterRefill: reading.afterRefill } : null;
}

/** Per-field messages keyed as the form names its fields, two messages on one field joined. */
export function problemsToFieldErrors(problems: readonly PrepareProblem[], key: (problem: PrepareProblem) => string): FieldErrors {
  const errors: FieldErrors = {};
  for (const p of problems) {
    const k = key(p);
    errors[k] = errors[k] ? `${errors[k]} ${p.message}` : p.message;
  }
  return errors;
}

/** "Nothing was saved." with the first problem and a count of the rest. */
export function nothingSavedMessage(messages: readonly string[], what = "Nothing was saved."): string {
  const [first, ...rest] = messages;
  if (!first) return what;
  return `${what} ${first}${rest.length ? ` (and ${rest.length} more problem${rest.length === 1 ? "" : "s"})` : ""}`;
}

/** The rows of a save, numbered on from the run's last sequence. */
export function readingRows(prepared: readonly PreparedReading[], options: { runId: string; firstSequence: number; source: string; recordedById: string }) {
  return prepared.map((r, i) => ({ ...r, runId: options.runId, sequence: options.firstSequence + i, source: options.source, recordedById: options.recordedById }));
}

/**
 * The one check of new readings on a run, whatever brings them (the entry grid, a data-logger file, the API):
 * drafts placed after the run's latest current reading, with volumes from the calibrated burettes and every
 * cross-row problem (order, burettes moving the wrong way, scale range, the future). Saves nothing.
 */
export function prepareOnRun(ctx: ReadingContext, drafts: ReadonlyArray<{ label: string; draft: ReadingDraft }>, options: { now?: Date; pressureUnit?: PressureUnit } = {}) {
  return prepareReadings({
    drafts,
    permeationStartedAt: ctx.permeationStartedAt,
    timeZone: ctx.timeZone,
    now: options.now ?? new Date(),
    areasMm2: ctx.areasMm2,
    scaleRangeMm: ctx.scaleRangeMm,
    reference: ctx.referenceAt(ctx.current.length - 1),
    previous: asNeighbour(ctx.current[ctx.current.length - 1]),
    ...(options.pressureUnit && { pressureUnit: options.pressureUnit }),
  });
}
