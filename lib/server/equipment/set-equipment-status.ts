import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { setEquipmentStatusSchema } from "@/lib/validation/equipment";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * Puts equipment in or out of service, or retires it. Runs already under way keep going (stopping them is
 * the technician's call); equipment not in service cannot be chosen for a new run. The audit trail keeps
 * the before and after; the version check refuses a change made on a stale screen.
 */
export async function setEquipmentStatus(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "equipment.manage");
  const input = parseOrThrow(setEquipmentStatusSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const updated = await tx.equipment.updateMany({
      where: { id: input.equipmentId, version: input.version },
      data: { status: input.status, version: { increment: 1 } },
    });
    if (updated.count === 0) {
      const exists = await tx.equipment.findUnique({ where: { id: input.equipmentId }, select: { id: true } });
      throw new AppError(exists ? "CONFLICT" : "NOT_FOUND");
    }
    return tx.equipment.findUniqueOrThrow({ where: { id: input.equipmentId }, select: { id: true, assetTag: true, status: true, version: true } });
  });
}
