import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { formatDateTime } from "@/lib/format/dates";
import type { SequenceField } from "@/lib/readings/check-reading-sequence";
import { prepareReadings, type PreparedReading } from "@/lib/readings/prepare-readings";
import { readingEntryToDraft } from "@/lib/readings/reading-entry-to-draft";
import { correctReadingSchema } from "@/lib/validation/readings";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { asNeighbour, loadReadingContext, nothingSavedMessage, problemsToFieldErrors, readingLabel } from "./reading-context";

const FORM_FIELD: Record<SequenceField, string> = { time: "takenAt", inflowLevelMm: "inflowLevelMm", outflowLevelMm: "outflowLevelMm", head: "effluentPressure", temperatureC: "temperatureC" };

const COMPARED = [
  "elapsedS", "inflowLevelMm", "outflowLevelMm", "influentPressurePa", "effluentPressurePa", "cellPressurePa", "temperatureC",
  "influentEcMsPerM", "effluentEcMsPerM", "influentPh", "effluentPh", "afterRefill",
] as const satisfies ReadonlyArray<keyof PreparedReading>;

/**
 * Corrects a saved reading: a new reading with the same sequence number that points at the one it
 * replaces and says why. The original row is never changed (a database trigger refuses that) and stays
 * in the reading's history. Only the latest version of a reading can be corrected, and the corrected
 * values must still fit between the readings before and after it.
 */
export async function correctReading(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.operate");
  const input = parseOrThrow(correctReadingSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const target = await tx.reading.findUnique({ where: { id: input.readingId }, select: { runId: true } });
    if (!target) throw new AppError("NOT_FOUND");
    const ctx = await loadReadingContext(tx, { actor: options.actor, runId: target.runId });
    const original = ctx.readings.find((r) => r.id === input.readingId)!;
    const label = readingLabel(original.sequence);
    if (original.correctedBy)
      throw new AppError("CONFLICT", `${label} was already corrected by ${original.correctedBy.recordedBy.name} on ${formatDateTime(original.correctedBy.createdAt)}; correct the latest version instead.`);

    const index = ctx.current.findIndex((r) => r.id === original.id);
    const { rows, problems } = prepareReadings({
      drafts: [{ label, draft: readingEntryToDraft(input.values, input.pressureUnit) }],
      permeationStartedAt: ctx.permeationStartedAt,
      now: options.now ?? new Date(),
      areasMm2: ctx.areasMm2,
      scaleRangeMm: ctx.scaleRangeMm,
      reference: ctx.referenceAt(index - 1),
      previous: asNeighbour(ctx.current[index - 1]),
      next: asNeighbour(ctx.current[index + 1]),
      pressureUnit: input.pressureUnit,
    });
    if (problems.length)
      throw new AppError("INVALID_INPUT", nothingSavedMessage(problems.map((p) => p.message), "The correction was not saved."), { fieldErrors: problemsToFieldErrors(problems, (p) => `values.${FORM_FIELD[p.field]}`) });
    const corrected = rows[0]!;
    // Times are compared to the second: a datetime input cannot show more.
    const same = COMPARED.every((k) => (k === "elapsedS" ? Math.round(corrected[k]) === Math.round(original[k]) : sameNumber(corrected[k], original[k])));
    if (same) throw new AppError("INVALID_INPUT", `The values are the same as the saved ${label.toLowerCase()}; change the value that is wrong.`, { fieldErrors: { form: "Nothing changed." } });

    const created = await tx.reading.create({
      data: { ...corrected, runId: ctx.run.id, sequence: original.sequence, source: "manual", correctsId: original.id, correctionReason: input.reason, recordedById: options.actor.id },
      select: { id: true, sequence: true },
    });
    return { labNumber: ctx.run.labNumber, readingId: created.id, sequence: created.sequence, correctsId: original.id };
  });
}

function sameNumber(a: number | boolean | null, b: number | boolean | null): boolean {
  if (typeof a !== "number" || typeof b !== "number") return a === b;
  // A value shown in psi and sent back differs from the stored pascals in the last digits only.
  return Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(a), Math.abs(b));
}
