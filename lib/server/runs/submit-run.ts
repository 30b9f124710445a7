import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { submitRunSchema } from "@/lib/validation/runs";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { advanceRun, loadRunForStep } from "./run-guards";

/** The technician hands the run to QA for review; post-test data must be in. */
export async function submitRun(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.operate");
  const input = parseOrThrow(submitRunSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const { run, toState } = await loadRunForStep(tx, { actor: options.actor, runId: input.runId, version: input.version, step: "submit" });
    if (!run.postTestThicknessMm) throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber}: record the post-test bentonite thickness before submitting.`);
    await advanceRun(tx, run, toState, { submittedAt: options.now ?? new Date() });
    return { labNumber: run.labNumber };
  });
}
