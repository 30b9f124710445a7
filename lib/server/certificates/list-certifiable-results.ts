import "server-only";
import type { TestProperty } from "@/lib/results/property-units";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { findProjectLimits } from "../specifications/find-project-limits";
import { missingLimitMessage } from "./draft-problems";
import { LIVE_REVISION_STATES } from "./certificate-collision";
import { listFreeIndexResults, type FreeIndexResult } from "./list-free-index-results";

/**
 * Approved results (of runs, and of index tests) no live (draft or issued) certificate includes, grouped by
 * project, for drafting a new certificate.
 */
export async function listCertifiableResults(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "certificate.issue");
  const found = await getDb().result.findMany({
    where: { approvedAt: { not: null } },
    orderBy: { approvedAt: "asc" },
    select: {
      id: true, property: true, value: true, unit: true, approvedAt: true,
      certificateResults: { where: { revision: { status: { in: [...LIVE_REVISION_STATES] } } }, select: { revision: { select: { contents: { orderBy: { version: "desc" }, take: 1, select: { resultIds: true } } } } } },
      run: { select: { labNumber: true, methodCode: true, specimen: { select: { labNumber: true, coupon: { select: { roll: { select: { labNumber: true, shipment: { select: { labNumber: true } }, project: { select: { id: true, name: true, code: true, clientOrganization: { select: { name: true } } } } } } } } } } } },
    },
  });
  // Held by a live revision unless that revision's newest content leaves it out (as the database decides).
  const results = found.filter((r) => !r.certificateResults.some((cr) => !cr.revision.contents[0] || cr.revision.contents[0].resultIds.includes(r.id)));
  const byProject = new Map<string, { project: { id: string; name: string; code: string; client: string }; results: typeof results; indexResults: FreeIndexResult[] }>();
  for (const r of results) {
    const p = r.run.specimen.coupon.roll.project;
    const entry = byProject.get(p.id) ?? { project: { id: p.id, name: p.name, code: p.code, client: p.clientOrganization.name }, results: [], indexResults: [] };
    entry.results.push(r);
    byProject.set(p.id, entry);
  }
  for (const r of await listFreeIndexResults(getDb())) {
    const entry = byProject.get(r.project.id) ?? { project: r.project, results: [], indexResults: [] };
    entry.indexResults.push(r);
    byProject.set(r.project.id, entry);
  }
  // What the project's newest specification (the one a new draft takes) limits, so the form can choose every
  // result it will judge, and say beside the others the words signing would refuse them with.
  return Promise.all([...byProject.values()].map(async (g) => {
    const limits = await findProjectLimits({ projectId: g.project.id });
    const lines = [...g.results.map((r) => ({ id: r.id, property: r.property as TestProperty, of: r.run.labNumber })), ...g.indexResults];
    const noLimit = limits ? Object.fromEntries(lines.filter((r) => !limits.get(r.property)).map((r) => [r.id, missingLimitMessage(limits.specificationName, r)])) : {};
    return { ...g, limited: (limits?.limits ?? []).map((l) => l.property), noLimit: noLimit as Record<string, string> };
  }));
}
