import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { grantOverrideSchema } from "@/lib/validation/runs";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

const DAY_MS = 86_400_000;

/** A QA manager allows an instrument whose calibration is due to be used for new runs for a few days, with a reason. */
export async function grantCalibrationOverride(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "calibration.override");
  const input = parseOrThrow(grantOverrideSchema, options.input);
  const now = options.now ?? new Date();
  return withActor(options.actor, async (tx) => {
    const equipment = await tx.equipment.findUnique({ where: { id: input.equipmentId }, select: { assetTag: true, status: true } });
    if (!equipment) throw new AppError("NOT_FOUND");
    if (equipment.status !== "IN_SERVICE") throw new AppError("ILLEGAL_TRANSITION", `${equipment.assetTag} is not in service; an override cannot put it back to use.`);
    return tx.calibrationOverride.create({
      data: { equipmentId: input.equipmentId, grantedById: options.actor.id, reason: input.reason, validUntil: new Date(now.getTime() + input.validDays * DAY_MS) },
      select: { id: true, validUntil: true },
    });
  });
}
