import "server-only";
import type { Prisma } from "@/lib/generated/prisma/client";
import type { ListQuery } from "@/lib/validation/list-query";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { dateWindow, listPage, readSearch, type ListPage } from "./list-page";

export type SpecimenListRow = {
  id: string;
  labNumber: string;
  couponLabNumber: string;
  rollLabNumber: string;
  intendedMethodCode: string;
  dieDiameterMm: number;
  initialThicknessMm: number;
  preparedByName: string;
  preparedAt: Date;
  state: string;
  locationCode: string | null;
};

/** One page of specimens, filtered by the roll's client and project, state, preparation date and lab number prefix. */
export async function listSpecimens(options: { actor: CurrentUser; query: ListQuery<"specimens"> }): Promise<ListPage<SpecimenListRow>> {
  requirePermission(options.actor, "sample.view");
  const { query } = options;
  const db = getDb();
  const preparedAt = dateWindow(query);
  const roll: Prisma.RollWhereInput = {
    ...(query.projectId && { projectId: query.projectId }),
    ...(query.clientOrganizationId && { project: { clientOrganizationId: query.clientOrganizationId } }),
  };
  const where: Prisma.SpecimenWhereInput = {
    ...(Object.keys(roll).length > 0 && { coupon: { roll } }),
    ...(query.state && { state: query.state }),
    ...(preparedAt && { preparedAt }),
    ...(query.q && specimenSearch(query.q)),
  };
  const dir = query.dir;
  const orderBy: Prisma.SpecimenOrderByWithRelationInput[] =
    query.sort === "labNumber" ? [{ labNumber: dir }]
    : query.sort === "state" ? [{ state: dir }, { preparedAt: dir }, { labNumber: dir }]
    : [{ preparedAt: dir }, { labNumber: dir }];
  return listPage(
    query,
    () => db.specimen.count({ where }),
    async (skip, take) => {
      const specimens = await db.specimen.findMany({
        where, orderBy, skip, take,
        select: {
          id: true, labNumber: true, intendedMethodCode: true, dieDiameterMm: true, initialThicknessMm: true, preparedAt: true, state: true,
          coupon: { select: { labNumber: true, roll: { select: { labNumber: true } } } },
          preparedBy: { select: { name: true } }, storageLocation: { select: { code: true } },
        },
      });
      return specimens.map((s) => ({
        id: s.id, labNumber: s.labNumber, couponLabNumber: s.coupon.labNumber, rollLabNumber: s.coupon.roll.labNumber,
        intendedMethodCode: s.intendedMethodCode, dieDiameterMm: s.dieDiameterMm, initialThicknessMm: s.initialThicknessMm,
        preparedByName: s.preparedBy.name, preparedAt: s.preparedAt, state: s.state, locationCode: s.storageLocation?.code ?? null,
      }));
    },
  );
}

/** A lab number is looked up on its own kind's column; anything else is a roll number. */
function specimenSearch(q: string): Prisma.SpecimenWhereInput {
  const { labKind, lab, text } = readSearch(q);
  if (labKind === "specimen") return { labNumber: lab };
  if (labKind === "coupon") return { coupon: { labNumber: lab } };
  if (labKind === "roll") return { coupon: { roll: { OR: [{ labNumber: lab }, { rollNumber: text }] } } };
  if (labKind === "shipment") return { coupon: { roll: { shipment: { labNumber: lab } } } };
  return { coupon: { roll: { rollNumber: text } } };
}
