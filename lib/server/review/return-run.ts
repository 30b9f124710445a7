import "server-only";
import { runTransition, type RunStateName } from "@/lib/runs/run-state-machine";
import { AppError } from "@/lib/errors/app-error";
import { returnRunSchema } from "@/lib/validation/review";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/** A QA manager sends a submitted run back to its technician with what to change; the technician sees the comments on the run. */
export async function returnRun(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.review");
  const input = parseOrThrow(returnRunSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const run = await tx.run.findUnique({ where: { id: input.runId }, select: { id: true, labNumber: true, state: true, version: true } });
    if (!run) throw new AppError("NOT_FOUND");
    if (run.version !== input.version) throw new AppError("CONFLICT", `${run.labNumber} was changed since you opened it; reload and review again.`);
    const step = runTransition(run.state as RunStateName, "return");
    if (!step.ok) throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber}: ${step.message}`);
    await tx.review.create({ data: { runId: run.id, reviewerId: options.actor.id, decision: "RETURNED", comments: input.comments, createdAt: options.now ?? new Date() } });
    await tx.run.update({ where: { id: run.id }, data: { state: step.toState, version: { increment: 1 } } });
    return { labNumber: run.labNumber };
  });
}
