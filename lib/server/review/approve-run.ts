import "server-only";
import { canApproveRun } from "@/lib/policy/permissions";
import { runTransition, type RunStateName } from "@/lib/runs/run-state-machine";
import { AppError } from "@/lib/errors/app-error";
import { resultRecord } from "@/lib/results/result-record";
import { resultsOfVerdict } from "@/lib/results/results-of-verdict";
import { approveRunSchema } from "@/lib/validation/review";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { markRollTestedIfDone } from "../custody/mark-roll-tested";
import { evaluateRunRecords } from "../runs/evaluate-run-records";
import { parseOrThrow } from "../validation/parse";

/**
 * A QA manager approves a submitted run they did not perform: the review is recorded and the run's
 * results (from the hydraulics library, judged by the run's method settings version, with the expanded
 * uncertainty propagated from the standard uncertainties of the instruments it used) become approved
 * results, each with the record of how it was obtained. A cell whose latest leakage check is at or above
 * the method's limit of the measured flow needs the QA manager's explicit acknowledgement.
 */
export async function approveRun(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.review");
  const input = parseOrThrow(approveRunSchema, options.input);
  const now = options.now ?? new Date();
  return withActor(options.actor, async (tx) => {
    const run = await tx.run.findUnique({ where: { id: input.runId }, select: { id: true, labNumber: true, state: true, version: true, performedById: true, methodCode: true, terminationKind: true, specimen: { select: { coupon: { select: { rollId: true } } } } } });
    if (!run) throw new AppError("NOT_FOUND");
    const allowed = canApproveRun(options.actor, run);
    if (!allowed.ok) throw new AppError("FORBIDDEN", allowed.reason);
    if (run.version !== input.version) throw new AppError("CONFLICT", `${run.labNumber} was changed since you opened it; reload and review again.`);
    const step = runTransition(run.state as RunStateName, "approve");
    if (!step.ok) throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber}: ${step.message}`);

    const verdict = await evaluateRunRecords(tx, run.id);
    if (!verdict.evaluation) throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber} has no result to approve: ${verdict.reason}`);
    let results: ReturnType<typeof resultsOfVerdict>;
    try {
      results = resultsOfVerdict(verdict, run.methodCode as "D5887" | "D5084" | "D6766", { earlyEnd: run.terminationKind === "EARLY_END" });
    } catch (error) {
      // The criteria of the settings version in use are not met (QA may have chosen another version): say so.
      throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber} (judged by ${verdict.settings.label}): ${error instanceof Error ? error.message : String(error)}`);
    }
    if (verdict.leakage?.flagged && !input.acknowledgeLeakage)
      throw new AppError("INVALID_INPUT", `${verdict.leakage.statement} Tick the acknowledgement to approve anyway; the certificate will state it.`, {
        fieldErrors: { acknowledgeLeakage: "Acknowledge the apparatus leakage to approve." },
        details: { leakageWarning: true },
      });

    await tx.review.create({ data: { runId: run.id, reviewerId: options.actor.id, decision: "APPROVED", comments: input.comments, createdAt: now } });
    const updated = await tx.run.updateMany({ where: { id: run.id, version: run.version }, data: { state: step.toState, version: { increment: 1 } } });
    if (updated.count !== 1) throw new AppError("CONFLICT");
    const acknowledgedBy = verdict.leakage?.flagged ? options.actor.name : null;
    for (const r of results)
      await tx.result.create({
        data: {
          runId: run.id, property: r.property, value: r.value, unit: r.unit, expandedUncertainty: r.expandedUncertainty, temperatureC: r.temperatureC, unitWeightBasis: r.unitWeightBasis,
          methodSettingsVersionId: verdict.settings.versionId, evaluation: resultRecord(r.property, verdict, r.uncertaintyBudget, acknowledgedBy),
          approvedById: options.actor.id, approvedAt: now,
        },
      });
    await markRollTestedIfDone(tx, { actor: options.actor, rollId: run.specimen.coupon.rollId, at: now, note: `Run ${run.labNumber} approved` });
    return { labNumber: run.labNumber, results: results.length };
  });
}
