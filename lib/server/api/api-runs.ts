import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { ApiPage, ApiRun, ApiRunDetail } from "@/lib/validation/api";
import { getDb } from "../db/client";
import { evaluateRunRecords } from "../runs/evaluate-run-records";
import { decodeCursor, encodeCursor, pageLimit } from "./api-cursor";
import { apiOrganizationScope, isClientCaller, pageOf } from "./api-scope";
import type { ApiCaller } from "./authenticate-api-request";

const SELECT = {
  id: true, labNumber: true, methodCode: true, state: true, assignedAt: true, terminatedAt: true,
  specimen: { select: { labNumber: true } }, cell: { select: { assetTag: true } },
  _count: { select: { readings: { where: { correctedBy: null } } } },
} as const;

type Row = { id: string; labNumber: string; methodCode: string; state: string; assignedAt: Date; terminatedAt: Date | null; specimen: { labNumber: string }; cell: { assetTag: string }; _count: { readings: number } };

const toApi = (r: Row): ApiRun => ({
  labNumber: r.labNumber, specimen: r.specimen.labNumber, cell: r.cell.assetTag, method: r.methodCode, state: r.state,
  assignedAt: r.assignedAt.toISOString(), terminatedAt: r.terminatedAt?.toISOString() ?? null, readings: r._count.readings,
});

const scoped = (caller: ApiCaller) => ({ specimen: { coupon: { roll: { project: apiOrganizationScope(caller) } } } });

/** Runs by lab number, a page at a time; `state` narrows to one state (PERMEATING, ...). */
export async function listApiRuns(caller: ApiCaller, query: URLSearchParams): Promise<ApiPage<ApiRun>> {
  const take = pageLimit(query.get("limit"));
  const after = decodeCursor("runs", query.get("cursor"));
  const state = query.get("state");
  const states = ["SET_UP", "SATURATING", "EQUILIBRATING", "PERMEATING", "TERMINATED", "POST_TEST_RECORDED", "SUBMITTED", "RETURNED", "APPROVED", "ABANDONED"] as const;
  if (state && !(states as readonly string[]).includes(state))
    throw new AppError("INVALID_INPUT", `state must be one of ${states.join(", ")}.`, { fieldErrors: { state: "Not a run state." } });
  const rows = await getDb().run.findMany({
    where: { ...scoped(caller), ...(state ? { state: state as (typeof states)[number] } : {}), ...(after ? { labNumber: { gt: after } } : {}) },
    orderBy: { labNumber: "asc" },
    take: take + 1,
    select: SELECT,
  });
  const paged = pageOf(rows, take, (r) => r.labNumber, (k) => encodeCursor("runs", k));
  return { data: paged.rows.map(toApi), nextCursor: paged.nextCursor };
}

/**
 * One run with, for lab tokens, the termination criteria and reported values on its readings so far, from the
 * same evaluation the run page shows (evaluateRunRecords). A client token gets the run's progress only.
 */
export async function getApiRun(caller: ApiCaller, labNumber: string): Promise<ApiRunDetail> {
  const row = await getDb().run.findFirst({ where: { labNumber, ...scoped(caller) }, select: SELECT });
  if (!row) throw new AppError("NOT_FOUND", `No run ${labNumber} that this token may read.`);
  if (isClientCaller(caller)) return { ...toApi(row), criteria: null, criteriaMet: null, reported: null };
  const verdict = await evaluateRunRecords(getDb(), row.id);
  const evaluation = verdict.evaluation;
  return {
    ...toApi(row),
    criteria: evaluation ? evaluation.termination.criteria.map((c) => ({ key: c.key, name: c.name, met: c.met, value: Number.isFinite(c.value) ? c.value : null, limit: c.limit, message: c.message })) : null,
    criteriaMet: evaluation ? evaluation.termination.met : null,
    reported: evaluation ? { fluxM3PerM2PerS: evaluation.reported.flux, k20MPerS: evaluation.reported.k20 } : null,
  };
}
