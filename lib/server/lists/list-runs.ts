import "server-only";
import { Prisma } from "@/lib/generated/prisma/client";
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
  return listPage(
    query,
    () => db.run.count({ where }),
    (skip, take) => db.$queryRaw<RunListRow[]>`
      SELECT r.id, r."labNumber", r."methodCode", r.state::text AS state, r."assignedAt", s."labNumber" AS "specimenLabNumber",
             e."assetTag" AS "cellAssetTag", u.name AS "technicianName", o.name AS "clientName"
      FROM "Run" r
      JOIN "Specimen" s ON s.id = r."specimenId"
      JOIN "Coupon" c ON c.id = s."couponId"
      JOIN "Roll" ro ON ro.id = c."rollId"
      JOIN "Project" p ON p.id = ro."projectId"
      JOIN "ClientOrganization" o ON o.id = p."clientOrganizationId"
      JOIN "Equipment" e ON e.id = r."cellId"
      JOIN "User" u ON u.id = r."performedById"
      WHERE ${runConditions(query, assignedAt)}
      ORDER BY ${runOrder(query)}
      LIMIT ${take} OFFSET ${skip}`,
  );
}

/** The filters of `listRunPage` again, in SQL for its one joined query of a page's rows (the count keeps Prisma's). */
function runConditions(query: ListQuery<"runs">, assignedAt: { gte?: Date; lt?: Date } | undefined): Prisma.Sql {
  const parts: Prisma.Sql[] = [Prisma.sql`TRUE`];
  if (query.state) parts.push(Prisma.sql`r.state = ${query.state}::"RunState"`);
  if (query.cellId) parts.push(Prisma.sql`r."cellId" = ${query.cellId}`);
  if (query.technicianId) parts.push(Prisma.sql`r."performedById" = ${query.technicianId}`);
  if (query.methodCode) parts.push(Prisma.sql`r."methodCode" = ${query.methodCode}`);
  if (query.clientOrganizationId) parts.push(Prisma.sql`o.id = ${query.clientOrganizationId}`);
  if (assignedAt?.gte) parts.push(Prisma.sql`r."assignedAt" >= ${assignedAt.gte}`);
  if (assignedAt?.lt) parts.push(Prisma.sql`r."assignedAt" < ${assignedAt.lt}`);
  if (query.q) {
    const { startsWith, gte, lt } = textPrefix(query.q.toUpperCase());
    const column = query.q.toUpperCase().startsWith("P") ? Prisma.sql`s."labNumber"` : Prisma.sql`r."labNumber"`;
    parts.push(Prisma.sql`${column} >= ${gte} AND ${column} < ${lt} AND ${column} LIKE ${`${startsWith.replace(/[\\%_]/g, "\\$&")}%`}`);
  }
  return Prisma.join(parts, " AND ");
}

/** Every order ends on the unique lab number so that pages never overlap or skip a row. */
function runOrder(query: ListQuery<"runs">): Prisma.Sql {
  const dir = Prisma.raw(query.dir === "asc" ? "ASC" : "DESC");
  if (query.sort === "labNumber") return Prisma.sql`r."labNumber" ${dir}`;
  if (query.sort === "state") return Prisma.sql`r.state ${dir}, r."assignedAt" ${dir}, r."labNumber" ${dir}`;
  return Prisma.sql`r."assignedAt" ${dir}, r."labNumber" ${dir}`;
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
