import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Rolls, newest first, with where they are and how many coupons were cut. */
export async function listRolls(options: { actor: CurrentUser; take?: number }) {
  requirePermission(options.actor, "sample.view");
  return getDb().roll.findMany({
    orderBy: { createdAt: "desc" },
    take: options.take ?? 50,
    select: {
      id: true, labNumber: true, rollNumber: true, lotNumber: true, product: true, state: true,
      project: { select: { name: true, clientOrganization: { select: { name: true } } } },
      storageLocation: { select: { code: true } }, _count: { select: { coupons: true } },
    },
  });
}
