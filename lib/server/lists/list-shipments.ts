import "server-only";
import type { Prisma } from "@/lib/generated/prisma/client";
import type { ListQuery } from "@/lib/validation/list-query";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { dateWindow, listPage, readSearch, type ListPage } from "./list-page";

export type ShipmentListRow = {
  id: string;
  labNumber: string;
  clientName: string;
  projectName: string;
  receivedAt: Date;
  deliveredBy: string;
  conditionNotes: string;
  rollCount: number;
  acknowledgedAt: Date | null;
};

/**
 * One page of shipments, filtered by client, project, received date, acknowledged or not, and a lab
 * number prefix (the shipment's or one of its items') or a roll number prefix.
 */
export async function listShipments(options: { actor: CurrentUser; query: ListQuery<"shipments"> }): Promise<ListPage<ShipmentListRow>> {
  requirePermission(options.actor, "shipment.view");
  const { query } = options;
  const db = getDb();
  const receivedAt = dateWindow(query);
  const where: Prisma.ShipmentWhereInput = {
    ...(query.clientOrganizationId && { clientOrganizationId: query.clientOrganizationId }),
    ...(query.projectId && { projectId: query.projectId }),
    ...(receivedAt && { receivedAt }),
    ...(query.acknowledged !== undefined && { acknowledgedAt: query.acknowledged ? { not: null } : null }),
    ...(query.q && shipmentSearch(query.q)),
  };
  const dir = query.dir;
  const orderBy: Prisma.ShipmentOrderByWithRelationInput[] = query.sort === "labNumber" ? [{ labNumber: dir }] : [{ receivedAt: dir }, { labNumber: dir }];
  return listPage(
    query,
    () => db.shipment.count({ where }),
    async (skip, take) => {
      const shipments = await db.shipment.findMany({
        where, orderBy, skip, take,
        select: {
          id: true, labNumber: true, receivedAt: true, deliveredBy: true, conditionNotes: true, acknowledgedAt: true,
          clientOrganization: { select: { name: true } }, project: { select: { name: true } },
        },
      });
      // Counts per page row by index, not Prisma's _count, which joins a count of the whole child table.
      const ids = shipments.map((s) => s.id);
      const counts = ids.length ? await db.roll.groupBy({ by: ["shipmentId"], where: { shipmentId: { in: ids } }, _count: { _all: true } }) : [];
      const rollCounts = new Map(counts.map((c) => [c.shipmentId, c._count._all]));
      return shipments.map((s) => ({
        id: s.id, labNumber: s.labNumber, clientName: s.clientOrganization.name, projectName: s.project.name, receivedAt: s.receivedAt,
        deliveredBy: s.deliveredBy, conditionNotes: s.conditionNotes, rollCount: rollCounts.get(s.id) ?? 0, acknowledgedAt: s.acknowledgedAt,
      }));
    },
  );
}

/** A lab number is looked up on its own kind's column; anything else is a roll number. */
function shipmentSearch(q: string): Prisma.ShipmentWhereInput {
  const { labKind, lab, text } = readSearch(q);
  if (labKind === "shipment") return { labNumber: lab };
  if (labKind === "roll") return { rolls: { some: { OR: [{ labNumber: lab }, { rollNumber: text }] } } };
  if (labKind === "coupon") return { rolls: { some: { coupons: { some: { labNumber: lab } } } } };
  if (labKind === "specimen") return { rolls: { some: { coupons: { some: { specimens: { some: { labNumber: lab } } } } } } };
  return { rolls: { some: { rollNumber: text } } };
}
