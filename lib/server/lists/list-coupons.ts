import "server-only";
import type { Prisma } from "@/lib/generated/prisma/client";
import type { ListQuery } from "@/lib/validation/list-query";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { dateWindow, listPage, readSearch, type ListPage } from "./list-page";

export type CouponListRow = {
  id: string;
  labNumber: string;
  rollLabNumber: string;
  positionInSample: string;
  lengthMm: number;
  widthMm: number;
  cutByName: string;
  cutAt: Date;
  state: string;
  locationCode: string | null;
  specimenCount: number;
};

/** One page of coupons, filtered by the roll's client and project, state, cutting date and lab number prefix. */
export async function listCoupons(options: { actor: CurrentUser; query: ListQuery<"coupons"> }): Promise<ListPage<CouponListRow>> {
  requirePermission(options.actor, "sample.view");
  const { query } = options;
  const db = getDb();
  const cutAt = dateWindow(query);
  const roll: Prisma.RollWhereInput = {
    ...(query.projectId && { projectId: query.projectId }),
    ...(query.clientOrganizationId && { project: { clientOrganizationId: query.clientOrganizationId } }),
  };
  const where: Prisma.CouponWhereInput = {
    ...(Object.keys(roll).length > 0 && { roll }),
    ...(query.state && { state: query.state }),
    ...(cutAt && { cutAt }),
    ...(query.q && couponSearch(query.q)),
  };
  const dir = query.dir;
  const orderBy: Prisma.CouponOrderByWithRelationInput[] =
    query.sort === "labNumber" ? [{ labNumber: dir }]
    : query.sort === "state" ? [{ state: dir }, { cutAt: dir }, { labNumber: dir }]
    : [{ cutAt: dir }, { labNumber: dir }];
  return listPage(
    query,
    () => db.coupon.count({ where }),
    async (skip, take) => {
      // Counts per page row by index, not Prisma's _count, which joins a count of the whole child table.
      const coupons = await db.coupon.findMany({
        where, orderBy, skip, take,
        select: {
          id: true, labNumber: true, positionInSample: true, lengthMm: true, widthMm: true, cutAt: true, state: true,
          roll: { select: { labNumber: true } }, cutBy: { select: { name: true } }, storageLocation: { select: { code: true } },
        },
      });
      const ids = coupons.map((c) => c.id);
      const counts = ids.length ? await db.specimen.groupBy({ by: ["couponId"], where: { couponId: { in: ids } }, _count: { _all: true } }) : [];
      const specimenCounts = new Map(counts.map((c) => [c.couponId, c._count._all]));
      return coupons.map((c) => ({
        id: c.id, labNumber: c.labNumber, rollLabNumber: c.roll.labNumber, positionInSample: c.positionInSample, lengthMm: c.lengthMm, widthMm: c.widthMm,
        cutByName: c.cutBy.name, cutAt: c.cutAt, state: c.state, locationCode: c.storageLocation?.code ?? null, specimenCount: specimenCounts.get(c.id) ?? 0,
      }));
    },
  );
}

/** A lab number is looked up on its own kind's column; anything else is a roll number. */
function couponSearch(q: string): Prisma.CouponWhereInput {
  const { labKind, lab, text } = readSearch(q);
  if (labKind === "coupon") return { labNumber: lab };
  if (labKind === "roll") return { roll: { OR: [{ labNumber: lab }, { rollNumber: text }] } };
  if (labKind === "specimen") return { specimens: { some: { labNumber: lab } } };
  if (labKind === "shipment") return { roll: { shipment: { labNumber: lab } } };
  return { roll: { rollNumber: text } };
}
