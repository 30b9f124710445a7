import "server-only";
import { postTestSchema } from "@/lib/validation/runs";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { advanceRun, loadRunForStep } from "./run-guards";

/** Post-test measurements: the bentonite layer thickness on a cut section (the L of the gradient), final mass, observations. */
export async function recordPostTest(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.operate");
  const input = parseOrThrow(postTestSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const { run, toState } = await loadRunForStep(tx, { actor: options.actor, runId: input.runId, version: input.version, step: "record-post-test" });
    await advanceRun(tx, run, toState, {
      postTestThicknessMm: input.thicknessMm, postTestMassG: input.finalMassG, postTestObservations: input.observations, postTestRecordedAt: options.now ?? new Date(),
    });
    return { labNumber: run.labNumber };
  });
}
