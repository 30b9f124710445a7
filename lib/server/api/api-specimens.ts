import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { ApiPage, ApiSpecimen } from "@/lib/validation/api";
import { getDb } from "../db/client";
import { decodeCursor, encodeCursor, pageLimit } from "./api-cursor";
import { apiOrganizationScope, pageOf } from "./api-scope";
import type { ApiCaller } from "./authenticate-api-request";

const SELECT = {
  labNumber: true, dieDiameterMm: true, initialThicknessMm: true, initialMassG: true, intendedMethodCode: true, state: true, preparedAt: true,
  coupon: { select: { labNumber: true, roll: { select: { labNumber: true } } } },
} as const;

type Row = { labNumber: string; dieDiameterMm: number; initialThicknessMm: number; initialMassG: number; intendedMethodCode: string; state: string; preparedAt: Date; coupon: { labNumber: string; roll: { labNumber: string } } };

const toApi = (s: Row): ApiSpecimen => ({
  labNumber: s.labNumber, coupon: s.coupon.labNumber, roll: s.coupon.roll.labNumber, dieDiameterMm: s.dieDiameterMm, initialThicknessMm: s.initialThicknessMm,
  initialMassG: s.initialMassG, intendedMethod: s.intendedMethodCode, state: s.state, preparedAt: s.preparedAt.toISOString(),
});

const scoped = (caller: ApiCaller) => ({ coupon: { roll: { project: apiOrganizationScope(caller) } } });

/** Specimens by lab number, a page at a time; `roll` narrows to one roll's. */
export async function listApiSpecimens(caller: ApiCaller, query: URLSearchParams): Promise<ApiPage<ApiSpecimen>> {
  const take = pageLimit(query.get("limit"));
  const after = decodeCursor("specimens", query.get("cursor"));
  const roll = query.get("roll");
  const rows = await getDb().specimen.findMany({
    where: { coupon: { roll: { project: apiOrganizationScope(caller), ...(roll ? { labNumber: roll } : {}) } }, ...(after ? { labNumber: { gt: after } } : {}) },
    orderBy: { labNumber: "asc" },
    take: take + 1,
    select: SELECT,
  });
  const paged = pageOf(rows, take, (r) => r.labNumber, (k) => encodeCursor("specimens", k));
  return { data: paged.rows.map(toApi), nextCursor: paged.nextCursor };
}

export async function getApiSpecimen(caller: ApiCaller, labNumber: string): Promise<ApiSpecimen> {
  const row = await getDb().specimen.findFirst({ where: { labNumber, ...scoped(caller) }, select: SELECT });
  if (!row) throw new AppError("NOT_FOUND", `No specimen ${labNumber} that this token may read.`);
  return toApi(row);
}
