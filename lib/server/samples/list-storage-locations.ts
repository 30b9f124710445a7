import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Storage places with how many items each holds now. */
export async function listStorageLocations(options: { actor: CurrentUser; activeOnly?: boolean }) {
  requirePermission(options.actor, "sample.view");
  return getDb().storageLocation.findMany({
    where: options.activeOnly ? { active: true } : {},
    orderBy: { code: "asc" },
    select: {
      id: true, code: true, name: true, description: true, active: true,
      _count: { select: { rolls: { where: { state: { not: "DISPOSED" } } }, coupons: { where: { state: { not: "DISPOSED" } } }, specimens: { where: { state: { not: "DISPOSED" } } } } },
    },
  });
}
