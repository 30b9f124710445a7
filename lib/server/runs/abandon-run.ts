import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { abandonRunSchema } from "@/lib/validation/abandon-run";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { applyCustodyAction } from "../custody/apply-custody-action";
import { markRollTestedIfDone } from "../custody/mark-roll-tested";
import { parseOrThrow } from "../validation/parse";
import { advanceRun, loadRunForStep } from "./run-guards";

const DAY_MS = 86_400_000;

/**
 * The technician abandons their run before approval (a membrane leak, a blocked line), with the reason.
 * The run keeps every record it has and leaves the cell free; it can no longer be submitted, reviewed or
 * certified. The specimen is taken out of the cell and kept in storage on retention, or disposed of, as the
 * technician chooses; each step is a custody event.
 */
export async function abandonRun(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.operate");
  const input = parseOrThrow(abandonRunSchema, options.input);
  const now = options.now ?? new Date();
  return withActor(options.actor, async (tx) => {
    const { run, toState } = await loadRunForStep(tx, { actor: options.actor, runId: input.runId, version: input.version, step: "abandon" });
    if (input.storageLocationId) {
      const location = await tx.storageLocation.findUnique({ where: { id: input.storageLocationId }, select: { active: true } });
      if (!location?.active) throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { storageLocationId: "Choose a storage location in use." } });
    }
    await advanceRun(tx, run, toState, { abandonedAt: now, abandonmentReason: input.reason, abandonedById: options.actor.id });
    await tx.runStage.updateMany({ where: { runId: run.id, endedAt: null }, data: { endedAt: now } });

    const note = `Run ${run.labNumber} abandoned: ${input.reason}`;
    const specimen = await tx.specimen.findUniqueOrThrow({ where: { id: run.specimen.id }, select: { state: true } });
    const lab = await tx.laboratory.findUnique({ where: { id: "lab" }, select: { retentionDays: true } });
    const retainUntil = new Date(now.getTime() + (lab?.retentionDays ?? 90) * DAY_MS);
    const toLocationId = input.specimenFate === "storage" ? input.storageLocationId! : null;
    // Still in the cell: taken out. Already out after termination: put on retention. Already retained or disposed of: left as it is.
    if (specimen.state === "ASSIGNED" || specimen.state === "UNDER_TEST")
      await applyCustodyAction(tx, { actor: options.actor, kind: "specimen", id: run.specimen.id, action: "WITHDRAWN", at: now, toLocationId, retainUntil, note });
    else if (specimen.state === "TESTED")
      await applyCustodyAction(tx, { actor: options.actor, kind: "specimen", id: run.specimen.id, action: "RETAINED", at: now, toLocationId, retainUntil, note });
    if (input.specimenFate === "disposal" && specimen.state !== "DISPOSED")
      await applyCustodyAction(tx, { actor: options.actor, kind: "specimen", id: run.specimen.id, action: "DISPOSED", at: now, toLocationId: null, note });
    // With this specimen out of its cell, a roll whose other run was approved is now tested.
    await markRollTestedIfDone(tx, { actor: options.actor, rollId: run.specimen.coupon.rollId, at: now, note });
    return { labNumber: run.labNumber, specimenLabNumber: run.specimen.labNumber };
  });
}
