import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { canApproveRun } from "@/lib/policy/permissions";
import { chooseRunSettingsSchema } from "@/lib/validation/review";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * A QA manager reviewing a run judges it by another version of its method's settings than the one in force
 * when it started (for example a corrected criterion), with the reason; the run, its results and its
 * certificate then name that version and who chose it. Only while the run awaits review.
 */
export async function chooseRunSettings(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "run.review");
  const input = parseOrThrow(chooseRunSettingsSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const run = await tx.run.findUnique({ where: { id: input.runId }, select: { id: true, labNumber: true, state: true, version: true, performedById: true, methodCode: true, methodSettingsVersionId: true } });
    if (!run) throw new AppError("NOT_FOUND");
    const allowed = canApproveRun(options.actor, run);
    if (!allowed.ok) throw new AppError("FORBIDDEN", allowed.reason);
    if (run.state !== "SUBMITTED") throw new AppError("ILLEGAL_TRANSITION", `${run.labNumber} is not awaiting review; its settings version can be chosen only during review.`);
    if (run.version !== input.version) throw new AppError("CONFLICT", `${run.labNumber} was changed since you opened it; reload and choose again.`);
    const chosen = await tx.methodSettingsVersion.findUnique({ where: { id: input.settingsVersionId }, select: { id: true, methodCode: true, version: true } });
    if (!chosen || chosen.methodCode !== run.methodCode)
      throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { settingsVersionId: `Choose a version of the ASTM ${run.methodCode} settings.` } });
    if (chosen.id === run.methodSettingsVersionId)
      throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { settingsVersionId: `${run.labNumber} is already judged by version ${chosen.version}.` } });
    const updated = await tx.run.updateMany({
      where: { id: run.id, version: run.version },
      data: { methodSettingsVersionId: chosen.id, settingsChoiceReason: input.reason, settingsChosenById: options.actor.id, version: { increment: 1 } },
    });
    if (updated.count !== 1) throw new AppError("CONFLICT");
    return { labNumber: run.labNumber, version: chosen.version };
  });
}
