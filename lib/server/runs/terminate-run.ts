import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { terminateRunSchema } from "@/lib/validation/runs";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { applyCustodyAction } from "../custody/apply-custody-action";
import { requireEventOrder } from "../custody/require-event-order";
import { readLabTimeZone } from "../lab/read-lab-time-zone";
import { parseOrThrow } from "../validation/parse";
import { evaluateRunRecords } from "./evaluate-run-records";
import { advanceRun, loadRunForStep } from "./run-guards";

/**
 * Ends permeation: either because every termination criterion is met (checked again here, from the
 * saved readings), or early, with the reason recorded. The specimen is then tested. The end is the time the
 * technician gives (not before permeation began or the last reading, not in the future), or now.
 */
export async function terminateRun(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.operate");
  const input = parseOrThrow(terminateRunSchema, options.input);
  const now = options.now ?? new Date();
  return withActor(options.actor, async (tx) => {
    const { run, toState } = await loadRunForStep(tx, { actor: options.actor, runId: input.runId, version: input.version, step: "terminate" });
    const endedAt = input.endedAt ?? now;
    const [permeation, lastReading] = await Promise.all([
      tx.runStage.findFirst({ where: { runId: run.id, kind: "PERMEATION" }, orderBy: { sequence: "asc" }, select: { startedAt: true } }),
      tx.reading.findFirst({ where: { runId: run.id }, orderBy: { takenAt: "desc" }, select: { takenAt: true, sequence: true } }),
    ]);
    requireEventOrder("endedAt", {
      label: "The end of permeation", at: endedAt, now, zone: await readLabTimeZone(tx),
      after: [
        permeation && { at: permeation.startedAt, what: "permeation began" },
        lastReading && { at: lastReading.takenAt, what: `reading ${lastReading.sequence} was taken` },
      ],
    });
    if (input.kind === "CRITERIA_MET") {
      const { evaluation, reason } = await evaluateRunRecords(tx, run.id);
      if (!evaluation?.termination.met) {
        const unmet = evaluation?.termination.criteria.filter((c) => !c.met).map((c) => c.message).join(" ") ?? reason;
        throw new AppError("ILLEGAL_TRANSITION", `The termination criteria are not met yet: ${unmet} Keep permeating, or end the run early with a reason.`);
      }
    }
    await advanceRun(tx, run, toState, { terminatedAt: endedAt, terminationKind: input.kind, terminationReason: input.kind === "EARLY_END" ? input.reason! : null });
    const stage = await tx.runStage.findFirst({ where: { runId: run.id, endedAt: null }, orderBy: { sequence: "desc" } });
    if (stage) await tx.runStage.update({ where: { id: stage.id }, data: { endedAt } });
    await applyCustodyAction(tx, { actor: options.actor, kind: "specimen", id: run.specimen.id, action: "TESTED", at: endedAt, note: input.kind === "EARLY_END" ? `Ended early: ${input.reason}` : "Termination criteria met" });
    return { labNumber: run.labNumber };
  });
}
