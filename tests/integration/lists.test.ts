import { beforeAll, describe, expect, it } from "vitest";
import type { ItemState } from "@/lib/generated/prisma/client";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { allocateLabNumber } from "@/lib/server/db/allocate-lab-number";
import { withActor } from "@/lib/server/db/transaction";
import { listCoupons } from "@/lib/server/lists/list-coupons";
import { listFilterOptions } from "@/lib/server/lists/list-filter-options";
import { listRolls } from "@/lib/server/lists/list-rolls";
import { listShipments } from "@/lib/server/lists/list-shipments";
import { listSpecimens } from "@/lib/server/lists/list-specimens";
import { parseListQuery, type ListKind, type RawSearchParams } from "@/lib/validation/list-query";
import { makeOrganization, makeProject, makeUser, unique } from "../support/factories";

// Every record here is dated in 2071, a year no other test uses, and counted within this file's own
// clients and projects, because other tests share the database.
const at = (day: string) => new Date(`2071-${day}T09:00:00.000Z`);
const q = <K extends ListKind>(kind: K, params: RawSearchParams) => parseListQuery(kind, params).query;

let tech: CurrentUser;
let clerk: CurrentUser;
let clientUser: CurrentUser;
let orgA: string, orgB: string, orgC: string;
let prjA1: string, prjA2: string, prjB1: string, prjC1: string;
const rolls: Record<string, { id: string; labNumber: string; rollNumber: string }> = {};
const coupons: Record<string, { id: string; labNumber: string }> = {};
let shipmentA1 = "";

async function makeShipment(projectId: string, clientOrganizationId: string, receivedAt: Date, acknowledged: boolean) {
  return withActor(tech, async (tx) =>
    tx.shipment.create({
      data: {
        labNumber: await allocateLabNumber(tx, "shipment", receivedAt), clientOrganizationId, projectId, deliveredBy: "Test carrier", receivedAt,
        receivedById: clerk.id, ...(acknowledged && { acknowledgedAt: receivedAt, acknowledgedById: clerk.id }),
      },
    }),
  );
}

async function makeRoll(key: string, shipment: { id: string; projectId: string; receivedAt: Date }, state: ItemState) {
  const roll = await withActor(tech, async (tx) =>
    tx.roll.create({
      data: {
        labNumber: await allocateLabNumber(tx, "roll", shipment.receivedAt), shipmentId: shipment.id, projectId: shipment.projectId,
        rollNumber: unique(`RN${key}`), lotNumber: "LOT-1", product: "Test GCL", manufacturer: "Test maker", state,
      },
    }),
  );
  rolls[key] = roll;
  return roll;
}

async function makeCoupon(key: string, rollKey: string, cutAt: Date) {
  const coupon = await withActor(tech, async (tx) =>
    tx.coupon.create({ data: { labNumber: await allocateLabNumber(tx, "coupon", cutAt), rollId: rolls[rollKey]!.id, positionInSample: "Centre", lengthMm: 300, widthMm: 300, cutById: tech.id, cutAt } }),
  );
  coupons[key] = coupon;
  return coupon;
}

async function makeSpecimen(couponKey: string, preparedAt: Date, state: ItemState = "PREPARED") {
  return withActor(tech, async (tx) =>
    tx.specimen.create({
      data: {
        labNumber: await allocateLabNumber(tx, "specimen", preparedAt), couponId: coupons[couponKey]!.id, dieDiameterMm: 100, initialThicknessMm: 6.5,
        initialMassG: 95, intendedMethodCode: "D5887", preparedById: tech.id, preparedAt, state,
      },
    }),
  );
}

beforeAll(async () => {
  tech = await makeUser("TECHNICIAN");
  clerk = await makeUser("INTAKE_CLERK");
  orgA = (await makeOrganization()).id;
  orgB = (await makeOrganization()).id;
  orgC = (await makeOrganization()).id;
  clientUser = await makeUser("CLIENT_USER", { clientOrganizationId: orgA });
  prjA1 = (await makeProject(orgA)).id;
  prjA2 = (await makeProject(orgA)).id;
  prjB1 = (await makeProject(orgB)).id;
  prjC1 = (await makeProject(orgC)).id;

  const sA1 = await makeShipment(prjA1, orgA, at("03-01"), true);
  shipmentA1 = sA1.labNumber;
  const sA2 = await makeShipment(prjA2, orgA, at("04-15"), false);
  const sB1 = await makeShipment(prjB1, orgB, at("05-20"), true);
  await makeRoll("a1", sA1, "STORED");
  await makeRoll("a2", sA1, "STORED");
  await makeRoll("a3", sA1, "CUT");
  await makeRoll("a4", sA2, "RECEIVED");
  await makeRoll("a5", sA2, "RETAINED");
  await makeRoll("b1", sB1, "STORED");
  await makeRoll("b2", sB1, "DISPOSED");
  await makeCoupon("c1", "a3", at("03-05"));
  await makeCoupon("c2", "a3", at("03-06"));
  await makeCoupon("c3", "b1", at("05-25"));
  await makeSpecimen("c1", at("03-07"));
  await makeSpecimen("c1", at("03-08"), "TESTED");
  await makeSpecimen("c3", at("05-26"));

  // Thirty rolls in one shipment, enough for two pages of 25.
  const sC1 = await makeShipment(prjC1, orgC, at("06-01"), false);
  for (let i = 0; i < 30; i++) await makeRoll(`c${String(i).padStart(2, "0")}`, sC1, "STORED");
}, 120_000);

describe("roll list", () => {
  it("narrows by client (through the project), project, state and received date", async () => {
    const byClient = await listRolls({ actor: tech, query: q("rolls", { clientOrganizationId: orgA }) });
    expect(byClient.total).toBe(5);
    expect(byClient.rows.map((r) => r.labNumber).sort()).toEqual(["a1", "a2", "a3", "a4", "a5"].map((k) => rolls[k]!.labNumber).sort());
    expect((await listRolls({ actor: tech, query: q("rolls", { projectId: prjA2 }) })).total).toBe(2);
    expect((await listRolls({ actor: tech, query: q("rolls", { clientOrganizationId: orgA, state: "STORED" }) })).total).toBe(2);
    const april = await listRolls({ actor: tech, query: q("rolls", { clientOrganizationId: orgA, from: "2071-04-01", to: "2071-04-15" }) });
    // "to" includes the whole of its day: the shipment received on 15 April at 09:00 is in.
    expect(april.rows.map((r) => r.labNumber).sort()).toEqual([rolls.a4!.labNumber, rolls.a5!.labNumber].sort());
    expect((await listRolls({ actor: tech, query: q("rolls", { clientOrganizationId: orgA, from: "2071-04-16" }) })).total).toBe(0);
  });

  it("shows what the page needs on each row", async () => {
    const { rows } = await listRolls({ actor: tech, query: q("rolls", { projectId: prjA1, sort: "labNumber" }) });
    const a3 = rows.find((r) => r.labNumber === rolls.a3!.labNumber)!;
    expect(a3).toMatchObject({ rollNumber: rolls.a3!.rollNumber, state: "CUT", couponCount: 2, shipmentLabNumber: shipmentA1, product: "Test GCL", locationCode: null });
    expect(a3.receivedAt.toISOString()).toBe("2071-03-01T09:00:00.000Z");
    expect(a3.clientName).toMatch(/^Organisation /);
    expect(rows.find((r) => r.labNumber === rolls.a1!.labNumber)!.couponCount).toBe(0);
  });

  it("searches lab and roll number prefixes", async () => {
    const byLab = await listRolls({ actor: tech, query: q("rolls", { q: rolls.a4!.labNumber.toLowerCase() }) });
    expect(byLab.rows.map((r) => r.labNumber)).toEqual([rolls.a4!.labNumber]);
    const byRollNumber = await listRolls({ actor: tech, query: q("rolls", { q: rolls.b2!.rollNumber.slice(0, -2) }) });
    expect(byRollNumber.rows.map((r) => r.labNumber)).toContain(rolls.b2!.labNumber);
    const byShipment = await listRolls({ actor: tech, query: q("rolls", { q: shipmentA1 }) });
    expect(byShipment.total).toBe(3);
    const byCoupon = await listRolls({ actor: tech, query: q("rolls", { q: coupons.c3!.labNumber }) });
    expect(byCoupon.rows.map((r) => r.labNumber)).toEqual([rolls.b1!.labNumber]);
    // LIKE's own characters are plain text in a search.
    expect((await listRolls({ actor: tech, query: q("rolls", { q: "%", clientOrganizationId: orgA }) })).total).toBe(0);
  });

  it("sorts both ways, always with the same rows", async () => {
    const asc = await listRolls({ actor: tech, query: q("rolls", { clientOrganizationId: orgA, sort: "labNumber", dir: "asc" }) });
    const desc = await listRolls({ actor: tech, query: q("rolls", { clientOrganizationId: orgA, sort: "labNumber", dir: "desc" }) });
    const labs = asc.rows.map((r) => r.labNumber);
    expect(labs).toEqual([...labs].sort());
    expect(desc.rows.map((r) => r.labNumber)).toEqual([...labs].reverse());

    const newest = await listRolls({ actor: tech, query: q("rolls", { clientOrganizationId: orgA }) });
    expect(newest.rows.slice(0, 2).map((r) => r.labNumber).sort()).toEqual([rolls.a4!.labNumber, rolls.a5!.labNumber].sort());
    const oldest = await listRolls({ actor: tech, query: q("rolls", { clientOrganizationId: orgA, dir: "asc" }) });
    expect(oldest.rows.at(-1)!.receivedAt.toISOString()).toBe("2071-04-15T09:00:00.000Z");

    const byState = await listRolls({ actor: tech, query: q("rolls", { clientOrganizationId: orgA, sort: "state" }) });
    // States sort in the order of the chain of custody (the enum's order), not alphabetically.
    expect(byState.rows.map((r) => r.state)).toEqual(["RECEIVED", "STORED", "STORED", "CUT", "RETAINED"]);
    const byStateDesc = await listRolls({ actor: tech, query: q("rolls", { clientOrganizationId: orgA, sort: "state", dir: "desc" }) });
    expect(byStateDesc.rows.map((r) => r.state)).toEqual(["RETAINED", "CUT", "STORED", "STORED", "RECEIVED"]);
  });

  it("pages without overlap, and a page past the end is empty with the right total", async () => {
    const first = await listRolls({ actor: tech, query: q("rolls", { projectId: prjC1, pageSize: "25" }) });
    const second = await listRolls({ actor: tech, query: q("rolls", { projectId: prjC1, pageSize: "25", page: "2" }) });
    expect(first).toMatchObject({ total: 30, page: 1, pageSize: 25, pageCount: 2 });
    expect(first.rows).toHaveLength(25);
    expect(second.rows).toHaveLength(5);
    expect(new Set([...first.rows, ...second.rows].map((r) => r.id)).size).toBe(30);
    const past = await listRolls({ actor: tech, query: q("rolls", { projectId: prjC1, pageSize: "25", page: "9" }) });
    expect(past).toMatchObject({ rows: [], total: 30, page: 9, pageCount: 2 });
    const nothing = await listRolls({ actor: tech, query: q("rolls", { projectId: prjC1, state: "DISPOSED" }) });
    expect(nothing).toMatchObject({ rows: [], total: 0, pageCount: 1 });
  });

  it("falls back to the defaults for bad query values instead of failing", async () => {
    const parsed = parseListQuery("rolls", { projectId: prjC1, page: "zero", pageSize: "7", sort: "id; DROP TABLE", dir: "up", state: "LOST", from: "31/12/2070" });
    expect(parsed.ignored.length).toBe(6);
    const list = await listRolls({ actor: tech, query: parsed.query });
    expect(list).toMatchObject({ total: 30, page: 1, pageSize: 50 });
    expect(list.rows).toHaveLength(30);
  });
});

describe("coupon and specimen lists", () => {
  it("narrows coupons by the roll's client and project, state, cutting date and numbers", async () => {
    const byClient = await listCoupons({ actor: tech, query: q("coupons", { clientOrganizationId: orgA }) });
    expect(byClient.rows.map((c) => c.labNumber)).toEqual([coupons.c2!.labNumber, coupons.c1!.labNumber]);
    expect(byClient.rows[1]).toMatchObject({ rollLabNumber: rolls.a3!.labNumber, specimenCount: 2, cutByName: tech.name, lengthMm: 300, state: "CUT" });
    expect((await listCoupons({ actor: tech, query: q("coupons", { projectId: prjB1 }) })).total).toBe(1);
    expect((await listCoupons({ actor: tech, query: q("coupons", { clientOrganizationId: orgA, to: "2071-03-05" }) })).rows.map((c) => c.labNumber)).toEqual([coupons.c1!.labNumber]);
    expect((await listCoupons({ actor: tech, query: q("coupons", { clientOrganizationId: orgA, state: "RETAINED" }) })).total).toBe(0);
    expect((await listCoupons({ actor: tech, query: q("coupons", { q: rolls.a3!.labNumber }) })).total).toBe(2);
    expect((await listCoupons({ actor: tech, query: q("coupons", { q: rolls.b1!.rollNumber }) })).rows.map((c) => c.labNumber)).toEqual([coupons.c3!.labNumber]);
    const asc = await listCoupons({ actor: tech, query: q("coupons", { clientOrganizationId: orgA, sort: "labNumber" }) });
    expect(asc.rows.map((c) => c.labNumber)).toEqual([coupons.c1!.labNumber, coupons.c2!.labNumber]);
  });

  it("narrows specimens the same way and names their coupon and roll", async () => {
    const byProject = await listSpecimens({ actor: tech, query: q("specimens", { projectId: prjA1 }) });
    expect(byProject.total).toBe(2);
    expect(byProject.rows[0]).toMatchObject({ couponLabNumber: coupons.c1!.labNumber, rollLabNumber: rolls.a3!.labNumber, state: "TESTED", preparedByName: tech.name, intendedMethodCode: "D5887" });
    expect((await listSpecimens({ actor: tech, query: q("specimens", { clientOrganizationId: orgA, state: "PREPARED" }) })).total).toBe(1);
    expect((await listSpecimens({ actor: tech, query: q("specimens", { q: coupons.c3!.labNumber }) })).total).toBe(1);
    expect((await listSpecimens({ actor: tech, query: q("specimens", { clientOrganizationId: orgB, from: "2071-05-26", to: "2071-05-26" }) })).total).toBe(1);
    const oldest = await listSpecimens({ actor: tech, query: q("specimens", { projectId: prjA1, dir: "asc" }) });
    expect(oldest.rows.map((s) => s.state)).toEqual(["PREPARED", "TESTED"]);
  });
});

describe("shipment list", () => {
  it("narrows by client, project, date and acknowledgement, with roll counts", async () => {
    const byClient = await listShipments({ actor: clerk, query: q("shipments", { clientOrganizationId: orgA }) });
    expect(byClient.rows.map((s) => s.rollCount)).toEqual([2, 3]);
    expect(byClient.rows[1]).toMatchObject({ labNumber: shipmentA1, deliveredBy: "Test carrier", projectName: expect.stringMatching(/^Project /) });
    expect((await listShipments({ actor: clerk, query: q("shipments", { clientOrganizationId: orgA, acknowledged: "no" }) })).rows.map((s) => s.rollCount)).toEqual([2]);
    expect((await listShipments({ actor: clerk, query: q("shipments", { projectId: prjB1 }) })).total).toBe(1);
    expect((await listShipments({ actor: clerk, query: q("shipments", { clientOrganizationId: orgA, from: "2071-04-01" }) })).total).toBe(1);
    expect((await listShipments({ actor: clerk, query: q("shipments", { q: rolls.b2!.labNumber }) })).rows.map((s) => s.projectName)).toHaveLength(1);
    expect((await listShipments({ actor: clerk, query: q("shipments", { q: shipmentA1 }) })).total).toBe(1);
  });
});

describe("who may see the lists", () => {
  it("refuses a client user every staff list, and lets the intake clerk read samples as the policy says", async () => {
    for (const call of [
      () => listRolls({ actor: clientUser, query: q("rolls", {}) }),
      () => listCoupons({ actor: clientUser, query: q("coupons", {}) }),
      () => listSpecimens({ actor: clientUser, query: q("specimens", {}) }),
      () => listShipments({ actor: clientUser, query: q("shipments", {}) }),
      () => listFilterOptions({ actor: clientUser }),
    ])
      await expect(call()).rejects.toMatchObject({ code: "FORBIDDEN" });
    // lib/policy/permissions.ts: every staff role reads samples and shipments (STAFF_READ).
    expect((await listRolls({ actor: clerk, query: q("rolls", { clientOrganizationId: orgA }) })).total).toBe(5);
    expect((await listShipments({ actor: tech, query: q("shipments", { clientOrganizationId: orgA }) })).total).toBe(2);
  });

  it("offers the clients and projects for the filter bar", async () => {
    const options = await listFilterOptions({ actor: tech });
    expect(options.clients.map((c) => c.id)).toEqual(expect.arrayContaining([orgA, orgB, orgC]));
    expect(options.projects.filter((p) => p.clientOrganizationId === orgA).map((p) => p.id).sort()).toEqual([prjA1, prjA2].sort());
  });
});
