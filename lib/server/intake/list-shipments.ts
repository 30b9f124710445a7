import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Shipments, newest first, with their rolls counted. */
export async function listShipments(options: { actor: CurrentUser; take?: number }) {
  requirePermission(options.actor, "shipment.view");
  return getDb().shipment.findMany({
    orderBy: { receivedAt: "desc" },
    take: options.take ?? 50,
    select: {
      id: true, labNumber: true, receivedAt: true, deliveredBy: true, conditionNotes: true, acknowledgedAt: true,
      clientOrganization: { select: { name: true } }, project: { select: { name: true } }, _count: { select: { rolls: true } },
    },
  });
}
