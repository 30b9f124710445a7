import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { ApiPage, ApiRoll } from "@/lib/validation/api";
import { getDb } from "../db/client";
import { decodeCursor, encodeCursor, pageLimit } from "./api-cursor";
import { apiOrganizationScope, pageOf } from "./api-scope";
import type { ApiCaller } from "./authenticate-api-request";

const SELECT = {
  labNumber: true, rollNumber: true, lotNumber: true, product: true, manufacturer: true, state: true,
  project: { select: { code: true, name: true } }, shipment: { select: { receivedAt: true } },
} as const;

type Row = { labNumber: string; rollNumber: string; lotNumber: string; product: string; manufacturer: string; state: string; project: { code: string; name: string }; shipment: { receivedAt: Date } };

const toApi = (r: Row): ApiRoll => ({
  labNumber: r.labNumber, rollNumber: r.rollNumber, lotNumber: r.lotNumber, product: r.product, manufacturer: r.manufacturer, state: r.state, project: r.project,
  receivedAt: r.shipment.receivedAt.toISOString(),
});

/** Rolls by lab number, a page at a time; `project` narrows to one project's. */
export async function listApiRolls(caller: ApiCaller, query: URLSearchParams): Promise<ApiPage<ApiRoll>> {
  const take = pageLimit(query.get("limit"));
  const after = decodeCursor("rolls", query.get("cursor"));
  const projectCode = query.get("project");
  const rows = await getDb().roll.findMany({
    where: { project: { ...apiOrganizationScope(caller), ...(projectCode ? { code: projectCode } : {}) }, ...(after ? { labNumber: { gt: after } } : {}) },
    orderBy: { labNumber: "asc" },
    take: take + 1,
    select: SELECT,
  });
  const paged = pageOf(rows, take, (r) => r.labNumber, (k) => encodeCursor("rolls", k));
  return { data: paged.rows.map(toApi), nextCursor: paged.nextCursor };
}

export async function getApiRoll(caller: ApiCaller, labNumber: string): Promise<ApiRoll> {
  const row = await getDb().roll.findFirst({ where: { labNumber, project: apiOrganizationScope(caller) }, select: SELECT });
  if (!row) throw new AppError("NOT_FOUND", `No roll ${labNumber} that this token may read.`);
  return toApi(row);
}
