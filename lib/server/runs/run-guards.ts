import "server-only";
import { runTransition, type RunStateName, type RunStep } from "@/lib/runs/run-state-machine";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import type { Tx } from "../db/transaction";

/**
 * Loads a run for a change by its technician: checks the version the person saw, that they performed
 * the run, and that the state machine allows the step. Returns the run and the state it moves to.
 */
export async function loadRunForStep(tx: Tx, options: { actor: CurrentUser; runId: string; version: number; step: RunStep }) {
  const run = await tx.run.findUnique({
    where: { id: options.runId },
    include: { specimen: { select: { id: true, labNumber: true, dieDiameterMm: true, initialThicknessMm: true, coupon: { select: { rollId: true } } } }, method: true },
  });
  if (!run) throw new AppError("NOT_FOUND");
  if (run.performedById !== options.actor.id) throw new AppError("FORBIDDEN", `${run.labNumber} is another technician's run; only the person performing it records it.`);
  if (run.version !== options.version) throw new AppError("CONFLICT", `${run.labNumber} was changed since you opened it; reload the page and try again.`);
  const step = runTransition(run.state as RunStateName, options.step);
  if (!step.ok) throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber}: ${step.message}`, { details: { allowed: step.allowed } });
  return { run, toState: step.toState };
}

/** Moves the run to its next state with the version check, plus any other fields of the same step. */
export async function advanceRun(tx: Tx, run: { id: string; version: number }, toState: RunStateName, data: Record<string, unknown> = {}) {
  const updated = await tx.run.updateMany({ where: { id: run.id, version: run.version }, data: { ...data, state: toState, version: { increment: 1 } } });
  if (updated.count !== 1) throw new AppError("CONFLICT", "The run was changed by someone else at the same moment; reload and try again.");
}
