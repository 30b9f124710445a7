import "server-only";
import { canApproveRun } from "@/lib/policy/permissions";
import { runTransition, type RunStateName } from "@/lib/runs/run-state-machine";
import { AppError } from "@/lib/errors/app-error";
import { DEMO_LAB_DECLARED_UNCERTAINTIES } from "@/lib/results/declared-uncertainties";
import { resultsFromEvaluation } from "@/lib/results/results-from-evaluation";
import { approveRunSchema } from "@/lib/validation/review";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { evaluateRunRecords } from "../runs/evaluate-run-records";
import { parseOrThrow } from "../validation/parse";

/**
 * A QA manager approves a submitted run they did not perform: the review is recorded and the run's
 * results (from the hydraulics library, with expanded uncertainty) become approved results.
 */
export async function approveRun(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.review");
  const input = parseOrThrow(approveRunSchema, options.input);
  const now = options.now ?? new Date();
  return withActor(options.actor, async (tx) => {
    const run = await tx.run.findUnique({ where: { id: input.runId }, select: { id: true, labNumber: true, state: true, version: true, performedById: true, methodCode: true, terminationKind: true } });
    if (!run) throw new AppError("NOT_FOUND");
    const allowed = canApproveRun(options.actor, run);
    if (!allowed.ok) throw new AppError("FORBIDDEN", allowed.reason);
    if (run.version !== input.version) throw new AppError("CONFLICT", `${run.labNumber} was changed since you opened it; reload and review again.`);
    const step = runTransition(run.state as RunStateName, "approve");
    if (!step.ok) throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber}: ${step.message}`);

    const { evaluation, reason } = await evaluateRunRecords(tx, run.id, { uncertainty: DEMO_LAB_DECLARED_UNCERTAINTIES });
    if (!evaluation) throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber} has no result to approve: ${reason}`);
    const results = resultsFromEvaluation(evaluation, run.methodCode as "D5887" | "D5084" | "D6766", { allowEarlyEnd: run.terminationKind === "EARLY_END" });

    await tx.review.create({ data: { runId: run.id, reviewerId: options.actor.id, decision: "APPROVED", comments: input.comments, createdAt: now } });
    const updated = await tx.run.updateMany({ where: { id: run.id, version: run.version }, data: { state: step.toState, version: { increment: 1 } } });
    if (updated.count !== 1) throw new AppError("CONFLICT");
    for (const r of results)
      await tx.result.create({
        data: { runId: run.id, property: r.property, value: r.value, unit: r.unit, expandedUncertainty: r.expandedUncertainty, temperatureC: r.temperatureC, unitWeightBasis: r.unitWeightBasis, approvedById: options.actor.id, approvedAt: now },
      });
    return { labNumber: run.labNumber, results: results.length };
  });
}
