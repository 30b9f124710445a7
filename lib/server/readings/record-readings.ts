import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { SequenceField } from "@/lib/readings/check-reading-sequence";
import { readingEntryToDraft } from "@/lib/readings/reading-entry-to-draft";
import type { PressureUnit } from "@/lib/units/pressure-entry";
import { recordReadingsSchema, type ReadingEntry } from "@/lib/validation/readings";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor, type Tx } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { loadReadingContext, nothingSavedMessage, prepareOnRun, problemsToFieldErrors, readingRows } from "./reading-context";

/** Which grid cell a cross-row problem belongs to. */
const GRID_FIELD: Record<SequenceField, string> = { time: "takenAt", inflowLevelMm: "inflowLevelMm", outflowLevelMm: "outflowLevelMm", head: "effluentPressure", temperatureC: "temperatureC" };

/**
 * Saves a batch of readings typed into the grid, all or none: levels become cumulative volumes with the
 * burette panel's calibrated areas, the time becomes seconds since permeation began, and the batch must
 * continue the run's saved readings in time order without a burette moving the wrong way.
 */
export async function recordReadings(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.operate");
  const input = parseOrThrow(recordReadingsSchema, options.input);
  return withActor(options.actor, (tx) => saveReadingEntries(tx, { actor: options.actor, runId: input.runId, pressureUnit: input.pressureUnit, entries: input.readings, now: options.now, source: "manual" }));
}

/**
 * The checks and the save of recordReadings inside a caller's transaction, for the API's posts (which add
 * their idempotency keys in the same transaction). `instrumentCellIds`: see loadReadingContext.
 */
export async function saveReadingEntries(
  tx: Tx,
  options: { actor: CurrentUser; runId: string; pressureUnit: PressureUnit; entries: readonly ReadingEntry[]; now?: Date; source: string; instrumentCellIds?: readonly string[] },
) {
  const ctx = await loadReadingContext(tx, { actor: options.actor, runId: options.runId, instrumentCellIds: options.instrumentCellIds });
  const { rows, problems } = prepareOnRun(
    ctx,
    options.entries.map((entry, i) => ({ label: `Row ${i + 1}`, draft: readingEntryToDraft(entry, options.pressureUnit) })),
    { ...(options.now && { now: options.now }), pressureUnit: options.pressureUnit },
  );
  if (problems.length)
    throw new AppError("INVALID_INPUT", nothingSavedMessage(problems.map((p) => p.message)), { fieldErrors: problemsToFieldErrors(problems, (p) => `readings.${p.index}.${GRID_FIELD[p.field]}`) });
  await tx.reading.createMany({ data: readingRows(rows, { runId: ctx.run.id, firstSequence: ctx.nextSequence, source: options.source, recordedById: options.actor.id }) });
  return { labNumber: ctx.run.labNumber, saved: rows.length, firstSequence: ctx.nextSequence };
}
