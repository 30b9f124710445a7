import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Changes to an instrument's register entry and status since registration, newest first, each with its reason. */
export async function listEquipmentChanges(options: { actor: CurrentUser; equipmentId: string }) {
  requirePermission(options.actor, "equipment.view");
  return getDb().correction.findMany({
    where: { entity: "Equipment", entityId: options.equipmentId },
    orderBy: { createdAt: "desc" },
    select: { id: true, field: true, oldValue: true, newValue: true, reason: true, createdAt: true, actor: { select: { name: true } } },
  });
}
