import "server-only";
import type { Prisma } from "@/lib/generated/prisma/client";
import type { ListQuery } from "@/lib/validation/list-query";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { dateWindow, listPage, textPrefix, type ListPage } from "./list-page";

export type RunListRow = {
  id: string;
  labNumber: string;
  methodCode: string;
  state: string;
  assignedAt: Date;
  specimenLabNumber: string;
  cellAssetTag: string;
  technicianName: string;
  clientName: string;
};

/**
 * One page of runs, filtered by state, cell, technician, method, client (through the specimen's roll), the
 * mounting date and a run or specimen lab number prefix, newest mounting first by default. Nothing here
 * reads the Reading table: the list's cost follows the number of runs, never the readings they hold.
 */
export async function listRunPage(options: { actor: CurrentUser; query: ListQuery<"runs"> }): Promise<ListPage<RunListRow>> {
  requirePermission(options.actor, "run.view");
  const { query } = options;
  const db = getDb();
  const assignedAt = dateWindow(query);
  const where: Prisma.RunWhereInput = {
    ...(query.state && { state: query.state }),
    ...(query.cellId && { cellId: query.cellId }),
    ...(query.technicianId && { performedById: query.technicianId }),
    ...(query.methodCode && { methodCode: query.methodCode }),
    ...(query.clientOrganizationId && { specimen: { coupon: { roll: { project: { clientOrganizationId: query.clientOrganizationId } } } } }),
    ...(assignedAt && { assignedAt }),
    ...(query.q && runSearch(query.q)),
  };
  const dir = query.dir;
  // Every order ends on the unique lab number so that pages never overlap or skip a row.
  const orderBy: Prisma.RunOrderByWithRelationInput[] =
    query.sort === "labNumber" ? [{ labNumber: dir }]
    : query.sort === "state" ? [{ state: dir }, { assignedAt: dir }, { labNumber: dir }]
    : [{ assignedAt: dir }, { labNumber: dir }];
  return listPage(
    query,
    () => db.run.count({ where }),
    async (skip, take) => {
      const runs = await db.run.findMany({
        where, orderBy, skip, take,
        select: {
          id: true, labNumber: true, methodCode: true, state: true, assignedAt: true,
          cell: { select: { assetTag: true } }, performedBy: { select: { name: true } },
          specimen: { select: { labNumber: true, coupon: { select: { roll: { select: { project: { select: { clientOrganization: { select: { name: true } } } } } } } } } },
        },
      });
      return runs.map((r) => ({
        id: r.id, labNumber: r.labNumber, methodCode: r.methodCode, state: r.state, assignedAt: r.assignedAt,
        specimenLabNumber: r.specimen.labNumber, cellAssetTag: r.cell.assetTag, technicianName: r.performedBy.name,
        clientName: r.specimen.coupon.roll.project.clientOrganization.name,
      }));
    },
  );
}

/** T… is a run's own lab number, P… its specimen's; anything else is tried as a run number. */
function runSearch(q: string): Prisma.RunWhereInput {
  const { startsWith, gte, lt } = textPrefix(q.toUpperCase());
  const prefix = { startsWith, gte, lt };
  return q.toUpperCase().startsWith("P") ? { specimen: { labNumber: prefix } } : { labNumber: prefix };
}

/** The choices the runs list's filters offer: cells, technicians (everyone who performed a run or may) and methods. */
export async function listRunFilterChoices(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "run.view");
  const db = getDb();
  const [cells, technicians, methods] = await Promise.all([
    db.equipment.findMany({ where: { kind: "PERMEAMETER_CELL" }, orderBy: { assetTag: "asc" }, select: { id: true, assetTag: true } }),
    db.user.findMany({ where: { role: "TECHNICIAN" }, orderBy: { name: "asc" }, select: { id: true, name: true } }),
    db.testMethod.findMany({ orderBy: { code: "asc" }, select: { code: true } }),
  ]);
  return { cells, technicians, methods: methods.map((m) => m.code) };
}
