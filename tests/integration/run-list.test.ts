import { beforeAll, describe, expect, it } from "vitest";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { withActor } from "@/lib/server/db/transaction";
import { listRunPage } from "@/lib/server/lists/list-runs";
import { parseListQuery, type RawSearchParams } from "@/lib/validation/list-query";
import { db, makeUser } from "../support/factories";
import { makeRun } from "../support/make-permeating-run";

const q = (params: RawSearchParams) => parseListQuery("runs", params).query;
let qa: CurrentUser;
let runs: Awaited<ReturnType<typeof makeRun>>[] = [];

describe("the runs list: paged, filtered and sorted on the server", () => {
  beforeAll(async () => {
    qa = await makeUser("QA_MANAGER");
    runs = [await makeRun(), await makeRun({ state: "EQUILIBRATING" }), await makeRun({ state: "TERMINATED" })];
    // Mounted on three days of 2072, a year no other test uses, so the date filter sees only these.
    await withActor({ id: "system:test" }, async (tx) => {
      for (const [i, r] of runs.entries()) await tx.run.update({ where: { id: r.run.id }, data: { assignedAt: new Date(`2072-03-0${i + 1}T08:00:00Z`) } });
    });
  });

  it("filters by technician, cell, state and client", async () => {
    const [a, b, c] = runs as [Awaited<ReturnType<typeof makeRun>>, Awaited<ReturnType<typeof makeRun>>, Awaited<ReturnType<typeof makeRun>>];
    expect((await listRunPage({ actor: qa, query: q({ technicianId: a.technician.id }) })).rows.map((r) => r.labNumber)).toEqual([a.run.labNumber]);
    expect((await listRunPage({ actor: qa, query: q({ cellId: b.run.cellId }) })).rows.map((r) => r.labNumber)).toEqual([b.run.labNumber]);
    const specimen = await db().specimen.findUniqueOrThrow({ where: { id: c.run.specimenId }, select: { coupon: { select: { roll: { select: { project: { select: { clientOrganizationId: true } } } } } } } });
    const byClient = await listRunPage({ actor: qa, query: q({ clientOrganizationId: specimen.coupon.roll.project.clientOrganizationId, state: "TERMINATED" }) });
    expect(byClient.rows.map((r) => r.labNumber)).toEqual([c.run.labNumber]);
    expect(byClient.rows[0]?.technicianName).toBe(c.technician.name);
    expect((await listRunPage({ actor: qa, query: q({ clientOrganizationId: specimen.coupon.roll.project.clientOrganizationId, state: "PERMEATING" }) })).total).toBe(0);
  });

  it("pages a date range newest first and sorts it the other way round", async () => {
    const range = { from: "2072-03-01", to: "2072-03-03", methodCode: "D5887" };
    const first = await listRunPage({ actor: qa, query: q({ ...range, pageSize: "25" }) });
    expect(first.total).toBe(3);
    expect(first.rows.map((r) => r.labNumber)).toEqual([...runs].reverse().map((r) => r.run.labNumber));
    const oldest = await listRunPage({ actor: qa, query: q({ ...range, sort: "mounted", dir: "asc" }) });
    expect(oldest.rows.map((r) => r.labNumber)).toEqual(runs.map((r) => r.run.labNumber));
    const pastTheEnd = await listRunPage({ actor: qa, query: q({ ...range, page: "2" }) });
    expect(pastTheEnd).toMatchObject({ total: 3, rows: [] });
  });

  it("finds a run by the beginning of its lab number or its specimen's", async () => {
    const a = runs[0]!;
    const specimen = await db().specimen.findUniqueOrThrow({ where: { id: a.run.specimenId } });
    expect((await listRunPage({ actor: qa, query: q({ q: a.run.labNumber.toLowerCase() }) })).rows.map((r) => r.labNumber)).toEqual([a.run.labNumber]);
    expect((await listRunPage({ actor: qa, query: q({ q: specimen.labNumber }) })).rows.map((r) => r.labNumber)).toEqual([a.run.labNumber]);
  });

  it("says which address values it left out", () => {
    const { ignored } = parseListQuery("runs", { state: "CUT", methodCode: "d'1", sort: "readings" });
    expect(ignored.map((i) => i.key).sort()).toEqual(["methodCode", "sort", "state"]);
  });

  it("is refused to a client user", async () => {
    const client = await makeUser("CLIENT_USER");
    await expect(listRunPage({ actor: client, query: q({}) })).rejects.toMatchObject({ code: "FORBIDDEN" });
  });
});
