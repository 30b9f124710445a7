import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { setEquipmentStatusSchema } from "@/lib/validation/equipment";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * Puts equipment in or out of service, or retires it, with the reason kept as a correction of its status
 * (the audit trail keeps the before and after too). Runs already under way keep going (stopping them is the
 * technician's call); equipment not in service cannot be chosen for a new run. The version check refuses
 * a change made on a stale screen.
 */
export async function setEquipmentStatus(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "equipment.manage");
  const input = parseOrThrow(setEquipmentStatusSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const current = await tx.equipment.findUnique({ where: { id: input.equipmentId }, select: { status: true, version: true } });
    if (!current) throw new AppError("NOT_FOUND");
    if (current.version !== input.version) throw new AppError("CONFLICT");
    if (current.status === input.status) throw new AppError("INVALID_INPUT", "The equipment already has that status.", { fieldErrors: { status: "Unchanged." } });
    const updated = await tx.equipment.updateMany({ where: { id: input.equipmentId, version: input.version }, data: { status: input.status, version: { increment: 1 } } });
    if (updated.count === 0) throw new AppError("CONFLICT");
    await tx.correction.create({
      data: { entity: "Equipment", entityId: input.equipmentId, field: "status", oldValue: current.status, newValue: input.status, reason: input.reason, actorId: options.actor.id },
    });
    return tx.equipment.findUniqueOrThrow({ where: { id: input.equipmentId }, select: { id: true, assetTag: true, status: true, version: true } });
  });
}
