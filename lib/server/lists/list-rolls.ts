import "server-only";
import { Prisma } from "@/lib/generated/prisma/client";
import type { ListQuery } from "@/lib/validation/list-query";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { inIdOrder, listPage, readSearch, type ListPage, type TextPrefix } from "./list-page";

export type RollListRow = {
  id: string;
  labNumber: string;
  rollNumber: string;
  lotNumber: string;
  product: string;
  state: string;
  clientName: string;
  projectName: string;
  locationCode: string | null;
  shipmentLabNumber: string;
  receivedAt: Date;
  couponCount: number;
};

/**
 * One page of rolls, filtered by client (through the project), project, state, received date (the
 * shipment's) and lab or roll number prefix, newest receipt first by default.
 *
 * The page's ids come from one SQL query with an inner join to Shipment: Prisma orders by a relation's
 * column through a LEFT JOIN, which makes PostgreSQL sort every roll; the inner join lets it walk
 * Shipment_receivedAt_idx and Roll_shipmentId_idx in order and stop after one page.
 */
export async function listRolls(options: { actor: CurrentUser; query: ListQuery<"rolls"> }): Promise<ListPage<RollListRow>> {
  requirePermission(options.actor, "sample.view");
  const { query } = options;
  const db = getDb();
  const { where, needsShipment } = rollConditions(query);
  const dir = Prisma.raw(query.dir === "asc" ? "ASC" : "DESC");
  // Every order ends on the unique lab number so that pages never overlap or skip a row; within a state,
  // rolls follow the order they were logged in (Roll_state_createdAt_idx).
  const orderBy =
    query.sort === "labNumber" ? Prisma.sql`r."labNumber" ${dir}`
    : query.sort === "rollNumber" ? Prisma.sql`r."rollNumber" ${dir}, r."labNumber" ${dir}`
    : query.sort === "state" ? Prisma.sql`r."state" ${dir}, r."createdAt" ${dir}, r."labNumber" ${dir}`
    : Prisma.sql`s."receivedAt" ${dir}, r."labNumber" ${dir}`;
  const shipmentJoin = Prisma.sql`JOIN "Shipment" s ON s.id = r."shipmentId"`;

  return listPage(
    query,
    async () => {
      const [row] = await db.$queryRaw<{ total: bigint }[]>`SELECT count(*) AS total FROM "Roll" r ${needsShipment ? shipmentJoin : Prisma.empty} ${where}`;
      return Number(row?.total ?? 0);
    },
    async (skip, take) => {
      const page = await db.$queryRaw<{ id: string }[]>`SELECT r.id FROM "Roll" r ${query.sort === "received" || needsShipment ? shipmentJoin : Prisma.empty} ${where} ORDER BY ${orderBy} LIMIT ${take} OFFSET ${skip}`;
      const ids = page.map((r) => r.id);
      if (ids.length === 0) return [];
      const [rolls, coupons] = await Promise.all([
        db.roll.findMany({
          where: { id: { in: ids } },
          select: {
            id: true, labNumber: true, rollNumber: true, lotNumber: true, product: true, state: true,
            project: { select: { name: true, clientOrganization: { select: { name: true } } } },
            shipment: { select: { labNumber: true, receivedAt: true } },
            storageLocation: { select: { code: true } },
          },
        }),
        db.coupon.groupBy({ by: ["rollId"], where: { rollId: { in: ids } }, _count: { _all: true } }),
      ]);
      const couponCounts = new Map(coupons.map((c) => [c.rollId, c._count._all]));
      return inIdOrder(ids, rolls).map((r) => ({
        id: r.id, labNumber: r.labNumber, rollNumber: r.rollNumber, lotNumber: r.lotNumber, product: r.product, state: r.state,
        clientName: r.project.clientOrganization.name, projectName: r.project.name, locationCode: r.storageLocation?.code ?? null,
        shipmentLabNumber: r.shipment.labNumber, receivedAt: r.shipment.receivedAt, couponCount: couponCounts.get(r.id) ?? 0,
      }));
    },
  );
}

function rollConditions(query: ListQuery<"rolls">): { where: Prisma.Sql; needsShipment: boolean } {
  const conditions: Prisma.Sql[] = [];
  let needsShipment = false;
  if (query.projectId) conditions.push(Prisma.sql`r."projectId" = ${query.projectId}`);
  if (query.clientOrganizationId) conditions.push(Prisma.sql`r."projectId" IN (SELECT p.id FROM "Project" p WHERE p."clientOrganizationId" = ${query.clientOrganizationId})`);
  if (query.state) conditions.push(Prisma.sql`r."state" = ${query.state}::"ItemState"`);
  if (query.from) conditions.push(Prisma.sql`s."receivedAt" >= ${query.from}`);
  if (query.to) conditions.push(Prisma.sql`s."receivedAt" < ${query.to}`);
  if (query.from || query.to) needsShipment = true;
  if (query.q) {
    const search = readSearch(query.q);
    const rollNumber = prefixSql(Prisma.sql`r."rollNumber"`, search.text);
    if (search.labKind === "roll") conditions.push(Prisma.sql`(${prefixSql(Prisma.sql`r."labNumber"`, search.lab)} OR ${rollNumber})`);
    else if (search.labKind === "shipment") {
      conditions.push(Prisma.sql`(${prefixSql(Prisma.sql`s."labNumber"`, search.lab)} OR ${rollNumber})`);
      needsShipment = true;
    } else if (search.labKind === "coupon")
      conditions.push(Prisma.sql`(r.id IN (SELECT c."rollId" FROM "Coupon" c WHERE ${prefixSql(Prisma.sql`c."labNumber"`, search.lab)}) OR ${rollNumber})`);
    else if (search.labKind === "specimen")
      conditions.push(Prisma.sql`(r.id IN (SELECT c."rollId" FROM "Coupon" c JOIN "Specimen" x ON x."couponId" = c.id WHERE ${prefixSql(Prisma.sql`x."labNumber"`, search.lab)}) OR ${rollNumber})`);
    else conditions.push(rollNumber);
  }
  return { where: conditions.length ? Prisma.sql`WHERE ${Prisma.join(conditions, " AND ")}` : Prisma.empty, needsShipment };
}

/** column >= prefix AND column < next prefix AND column LIKE 'prefix%', with LIKE's own characters escaped. */
function prefixSql(column: Prisma.Sql, prefix: TextPrefix): Prisma.Sql {
  const like = `${prefix.startsWith.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
  return Prisma.sql`(${column} >= ${prefix.gte} AND ${column} < ${prefix.lt} AND ${column} LIKE ${like})`;
}
