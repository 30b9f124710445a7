import "server-only";
import type { ApiPage, ApiResult } from "@/lib/validation/api";
import { getDb } from "../db/client";
import { decodeCursor, encodeCursor, pageLimit } from "./api-cursor";
import { apiOrganizationScope, isClientCaller, pageOf } from "./api-scope";
import type { ApiCaller } from "./authenticate-api-request";

/**
 * Results, a page at a time (by id); `project` and `run` narrow them. A client token sees, as the portal does,
 * only results on an issued certificate of its organisation; a lab token every result.
 */
export async function listApiResults(caller: ApiCaller, query: URLSearchParams): Promise<ApiPage<ApiResult>> {
  const take = pageLimit(query.get("limit"));
  const after = decodeCursor("results", query.get("cursor"));
  const projectCode = query.get("project");
  const run = query.get("run");
  const scope = apiOrganizationScope(caller);
  const rows = await getDb().result.findMany({
    where: {
      run: { ...(run ? { labNumber: run } : {}), specimen: { coupon: { roll: { project: { ...scope, ...(projectCode ? { code: projectCode } : {}) } } } } },
      ...(isClientCaller(caller) ? { certificateResults: { some: { revision: { status: "ISSUED", certificate: scope } } } } : {}),
      ...(after ? { id: { gt: after } } : {}),
    },
    orderBy: { id: "asc" },
    take: take + 1,
    select: { id: true, property: true, value: true, unit: true, expandedUncertainty: true, temperatureC: true, approvedAt: true, run: { select: { labNumber: true } } },
  });
  const paged = pageOf(rows, take, (r) => r.id, (k) => encodeCursor("results", k));
  return {
    data: paged.rows.map((r) => ({ id: r.id, run: r.run.labNumber, property: r.property, value: r.value, unit: r.unit, expandedUncertainty: r.expandedUncertainty, temperatureC: r.temperatureC, approvedAt: r.approvedAt?.toISOString() ?? null })),
    nextCursor: paged.nextCursor,
  };
}
