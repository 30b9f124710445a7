import { beforeAll, describe, expect, it } from "vitest";
import { createApiToken } from "@/lib/server/api-tokens/create-api-token";
import { revokeApiToken } from "@/lib/server/api-tokens/revoke-api-token";
import { allocateLabNumber } from "@/lib/server/db/allocate-lab-number";
import { withActor } from "@/lib/server/db/transaction";
import * as certificatePdf from "@/app/api/v1/certificates/[number]/pdf/route";
import * as certificate from "@/app/api/v1/certificates/[number]/route";
import * as certificates from "@/app/api/v1/certificates/route";
import * as openapi from "@/app/api/v1/openapi.json/route";
import * as results from "@/app/api/v1/results/route";
import * as roll from "@/app/api/v1/rolls/[labNumber]/route";
import * as rolls from "@/app/api/v1/rolls/route";
import * as readings from "@/app/api/v1/runs/[labNumber]/readings/route";
import * as run from "@/app/api/v1/runs/[labNumber]/route";
import * as runs from "@/app/api/v1/runs/route";
import * as specimen from "@/app/api/v1/specimens/[labNumber]/route";
import * as specimens from "@/app/api/v1/specimens/route";
import { db, makeUser, unique } from "../support/factories";
import { issueRevision } from "../support/issue-certificate-revision";
import { at, gridRow, makeRun } from "../support/make-permeating-run";

const SYSTEM = { id: "system:test" };
const BASE = "http://seepline.test/api/v1";

// Answers are read as loose JSON: the assertions say what shape they must have.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Json = Record<string, any>;
type Handler = (request: Request, context: { params: Promise<never> }) => Promise<Response>;
async function call(handler: unknown, path: string, options: { token?: string | null; params?: Record<string, string>; method?: string; body?: unknown; raw?: string } = {}) {
  const headers: Record<string, string> = {};
  if (options.token) headers.authorization = `Bearer ${options.token}`;
  const body = options.raw ?? (options.body === undefined ? undefined : JSON.stringify(options.body));
  if (body !== undefined) headers["content-type"] = "application/json";
  const response = await (handler as Handler)(new Request(`${BASE}${path}`, { method: options.method ?? "GET", headers, body }), { params: Promise.resolve((options.params ?? {}) as never) });
  const type = response.headers.get("content-type") ?? "";
  return { status: response.status, headers: response.headers, json: type.includes("json") ? ((await response.json()) as Json) : null, bytes: type.includes("pdf") ? new Uint8Array(await response.arrayBuffer()) : null };
}

let world: Awaited<ReturnType<typeof makeWorld>>;

async function makeWorld() {
  const made = await makeRun();
  await makeRun(); // a second run, so that lists have a second page
  const full = await db().run.findUniqueOrThrow({ where: { id: made.run.id }, select: { cell: { select: { assetTag: true } }, specimen: { select: { labNumber: true, coupon: { select: { roll: { select: { labNumber: true, project: true } } } } } } } });
  const project = full.specimen.coupon.roll.project;
  const [clientA, clientB, admin] = await Promise.all([makeUser("CLIENT_USER", { clientOrganizationId: project.clientOrganizationId }), makeUser("CLIENT_USER"), makeUser("LAB_ADMIN")]);
  const otherCell = await withActor(SYSTEM, (tx) => tx.equipment.create({ data: { assetTag: unique("CELL").toUpperCase(), kind: "PERMEAMETER_CELL", name: "Other cell" } }));
  // An issued certificate of organisation A, with one result of the run on it.
  const cert = await withActor(SYSTEM, async (tx) => {
    const result = await tx.result.create({ data: { runId: made.run.id, property: "INDEX_FLUX", value: 2.1e-9, unit: "m3/m2/s" } });
    const c = await tx.certificate.create({ data: { number: await allocateLabNumber(tx, "certificate"), projectId: project.id, clientOrganizationId: project.clientOrganizationId } });
    await issueRevision(tx, c.id, 1, { resultIds: [result.id], daysAgo: 1 });
    return c;
  });
  const token = async (actor: Awaited<ReturnType<typeof makeUser>>, input: Record<string, unknown>, now?: Date) => (await createApiToken({ actor, input: { name: unique("token"), ...input }, now })).token;
  const tokens = {
    none: null,
    clientA: await token(clientA, { scope: "CLIENT_READ" }),
    clientB: await token(clientB, { scope: "CLIENT_READ" }),
    lab: await token(made.qa, { scope: "LAB_READ" }),
    instrument: await token(made.technician, { scope: "READINGS_POST", cells: full.cell.assetTag }),
    otherCell: await token(admin, { scope: "READINGS_POST", cells: otherCell.assetTag }),
    expired: await token(made.qa, { scope: "LAB_READ", expiresInDays: 1 }, new Date(Date.now() - 2 * 86_400_000)),
    revoked: await token(made.qa, { scope: "LAB_READ" }),
  };
  const revokedRow = await db().apiToken.findFirstOrThrow({ where: { userId: made.qa.id }, orderBy: { createdAt: "desc" } });
  await revokeApiToken({ actor: admin, input: { tokenId: revokedRow.id } });
  return { ...made, clientA, clientB, admin, project, rollNumber: full.specimen.coupon.roll.labNumber, specimenNumber: full.specimen.labNumber, cell: full.cell.assetTag, certificate: cert.number, tokens };
}

beforeAll(async () => {
  world = await makeWorld();
});

/** Every GET route with the parameters of organisation A's records. */
const reads = (): Array<{ name: string; handler: unknown; path: string; params?: Record<string, string> }> => [
  { name: "rolls", handler: rolls.GET, path: "/rolls" },
  { name: "roll", handler: roll.GET, path: `/rolls/${world.rollNumber}`, params: { labNumber: world.rollNumber } },
  { name: "specimens", handler: specimens.GET, path: "/specimens" },
  { name: "specimen", handler: specimen.GET, path: `/specimens/${world.specimenNumber}`, params: { labNumber: world.specimenNumber } },
  { name: "runs", handler: runs.GET, path: "/runs" },
  { name: "run", handler: run.GET, path: `/runs/${world.run.labNumber}`, params: { labNumber: world.run.labNumber } },
  { name: "results", handler: results.GET, path: "/results" },
  { name: "certificates", handler: certificates.GET, path: "/certificates" },
  { name: "certificate", handler: certificate.GET, path: `/certificates/${world.certificate}`, params: { number: world.certificate } },
  { name: "certificate pdf", handler: certificatePdf.GET, path: `/certificates/${world.certificate}/pdf`, params: { number: world.certificate } },
];
const singles = new Set(["roll", "specimen", "run", "certificate", "certificate pdf"]);

describe("API v1: every route with every kind of token", () => {
  it("answers each read route: 401 without a usable token, 403 for a data-logger token, 200 for read tokens, 404 for another organisation's records", async () => {
    const statuses: Record<string, Record<string, number>> = {};
    for (const route of reads()) {
      statuses[route.name] = {};
      for (const [kind, token] of Object.entries(world.tokens)) statuses[route.name]![kind] = (await call(route.handler, route.path, { token, params: route.params })).status;
    }
    for (const route of reads()) {
      expect(statuses[route.name], route.name).toEqual({
        none: 401, expired: 401, revoked: 401, instrument: 403, otherCell: 403, lab: 200, clientA: 200,
        clientB: singles.has(route.name) ? 404 : 200,
      });
    }
  });

  it("scopes lists like the portal: a client token sees its own organisation's records only, and results only from issued certificates", async () => {
    const mine = await call(rolls.GET, "/rolls?limit=200", { token: world.tokens.clientA });
    expect(mine.json!.data.map((r: { labNumber: string }) => r.labNumber)).toEqual([world.rollNumber]);
    const theirs = await call(rolls.GET, "/rolls?limit=200", { token: world.tokens.clientB });
    expect(theirs.json!.data).toEqual([]);
    const resultList = await call(results.GET, "/results", { token: world.tokens.clientA });
    expect(resultList.json!.data).toMatchObject([{ run: world.run.labNumber, property: "INDEX_FLUX", value: 2.1e-9, unit: "m3/m2/s" }]);
    expect((await call(results.GET, "/results", { token: world.tokens.clientB })).json!.data).toEqual([]);
    const cert = await call(certificate.GET, `/certificates/${world.certificate}`, { token: world.tokens.clientA, params: { number: world.certificate } });
    expect(cert.json!.revisions).toMatchObject([{ revision: 1, status: "ISSUED", pdf: `/api/v1/certificates/${world.certificate}/pdf?revision=1` }]);
    const pdf = await call(certificatePdf.GET, `/certificates/${world.certificate}/pdf`, { token: world.tokens.clientA, params: { number: world.certificate } });
    expect(new TextDecoder().decode(pdf.bytes!)).toBe("%PDF-1.4 test");
    const err = await call(roll.GET, `/rolls/${world.rollNumber}`, { token: world.tokens.clientB, params: { labNumber: world.rollNumber } });
    expect(err.json).toEqual({ error: { code: "NOT_FOUND", message: `No roll ${world.rollNumber} that this token may read.`, fieldErrors: {} } });
  });

  it("gives lab tokens a run's state, criteria and reported values; client tokens its progress only", async () => {
    const lab = await call(run.GET, `/runs/${world.run.labNumber}`, { token: world.tokens.lab, params: { labNumber: world.run.labNumber } });
    expect(lab.json).toMatchObject({ labNumber: world.run.labNumber, cell: world.cell, state: "PERMEATING", method: "D5887" });
    expect("criteria" in lab.json!).toBe(true);
    const client = await call(run.GET, `/runs/${world.run.labNumber}`, { token: world.tokens.clientA, params: { labNumber: world.run.labNumber } });
    expect(client.json).toMatchObject({ criteria: null, reported: null, criteriaMet: null });
  });

  it("pages with signed cursors and refuses a cursor that was changed or taken from another list", async () => {
    const first = await call(runs.GET, "/runs?limit=1", { token: world.tokens.lab });
    expect(first.json!.data).toHaveLength(1);
    const cursor = first.json!.nextCursor as string;
    expect(cursor).toMatch(/\./);
    const second = await call(runs.GET, `/runs?limit=1&cursor=${encodeURIComponent(cursor)}`, { token: world.tokens.lab });
    expect(second.status).toBe(200);
    expect(second.json!.data[0]?.labNumber ?? "").not.toBe(first.json!.data[0].labNumber);
    const [payload, mac] = cursor.split(".");
    const forged = `${Buffer.from(JSON.stringify({ l: "runs", k: "A" }), "utf8").toString("base64url")}.${mac}`;
    for (const bad of [forged, `${payload}.${"x".repeat(mac!.length)}`, "garbage"]) {
      const refused = await call(runs.GET, `/runs?cursor=${encodeURIComponent(bad)}`, { token: world.tokens.lab });
      expect(refused.status).toBe(400);
      expect(refused.json!.error.code).toBe("INVALID_INPUT");
    }
    const otherList = await call(rolls.GET, `/rolls?cursor=${encodeURIComponent(cursor)}`, { token: world.tokens.lab });
    expect(otherList.status).toBe(400);
  });

  it("serves the OpenAPI 3.1 document without a token", async () => {
    const doc = await call(openapi.GET, "/openapi.json");
    expect(doc.status).toBe(200);
    expect(doc.json!.openapi).toBe("3.1.0");
    expect(Object.keys(doc.json!.paths)).toEqual(expect.arrayContaining(["/rolls", "/runs/{labNumber}/readings", "/certificates/{number}/pdf"]));
    expect(doc.json!.components.schemas.PostReadings.properties.readings.items.required).toContain("idempotencyKey");
  });
});

describe("API v1: posting readings", () => {
  const post = (token: string | null, labNumber: string, body: unknown) => call(readings.POST, `/runs/${labNumber}/readings`, { token, method: "POST", params: { labNumber }, body });
  const reading = (key: string, hours: number, inflow: string, outflow: string) => ({ idempotencyKey: key, ...gridRow(at(world.permeationStartedAt, hours), inflow, outflow) });

  it("saves a batch under the token's owner with the grid's volumes, and a retry with the same keys saves nothing again", async () => {
    const labNumber = world.run.labNumber;
    const body = { pressureUnit: "KPA", readings: [reading("logger-a-0001", 1, "452", "18"), reading("logger-a-0002", 7, "441.2", "28.9")] };
    const first = await post(world.tokens.instrument, labNumber, body);
    expect(first.status).toBe(201);
    expect(first.json).toMatchObject({ run: labNumber, saved: 2, replayed: 0, readings: [{ idempotencyKey: "logger-a-0001", sequence: 1, replayed: false }, { idempotencyKey: "logger-a-0002", sequence: 2, replayed: false }] });
    const retry = await post(world.tokens.instrument, labNumber, body);
    expect(retry.status).toBe(200);
    expect(retry.json).toMatchObject({ saved: 0, replayed: 2 });
    // A retry of the first reading plus a new one saves only the new one.
    const more = await post(world.tokens.instrument, labNumber, { pressureUnit: "KPA", readings: [reading("logger-a-0002", 7, "441.2", "28.9"), reading("logger-a-0003", 13, "430.4", "39.8")] });
    expect(more.json).toMatchObject({ saved: 1, replayed: 1, readings: [{ sequence: 2, replayed: true }, { sequence: 3, replayed: false }] });
    const rows = await db().reading.findMany({ where: { runId: world.run.id }, orderBy: { sequence: "asc" } });
    expect(rows.map((r) => r.sequence)).toEqual([1, 2, 3]);
    // (452 - 441.2) mm × 31.4 mm² = 0.33912 mL: the same conversion as the grid (tests/integration/readings.test.ts).
    expect(rows[1]!.inflowCumulativeMl).toBeCloseTo(0.33912, 9);
    expect(rows[0]).toMatchObject({ recordedById: world.technician.id });
    expect(rows[0]!.source).toMatch(/^API token “token-/);
  });

  it("refuses a replayed key with other values (409), a run in another cell (403), a read token (403), no token (401), a bad reading (400) and a 10 MB body (413), saving nothing", async () => {
    const labNumber = world.run.labNumber;
    const before = await db().reading.count({ where: { runId: world.run.id } });
    const changed = await post(world.tokens.instrument, labNumber, { pressureUnit: "KPA", readings: [reading("logger-a-0001", 1, "452", "19"), reading("logger-a-0099", 30, "420", "50")] });
    expect(changed.status).toBe(409);
    expect(changed.json!.error).toMatchObject({ code: "CONFLICT", fieldErrors: { "readings.0.idempotencyKey": "Already used for reading 1 with other values." } });
    const otherCell = await post(world.tokens.otherCell, labNumber, { pressureUnit: "KPA", readings: [reading("logger-b-0001", 30, "420", "50")] });
    expect(otherCell.status).toBe(403);
    expect(otherCell.json!.error.message).toMatch(new RegExp(`is in cell ${world.cell}, which this data-logger token does not name`));
    expect((await post(world.tokens.lab, labNumber, { pressureUnit: "KPA", readings: [reading("logger-c-0001", 30, "420", "50")] })).status).toBe(403);
    expect((await post(world.tokens.clientA, labNumber, { pressureUnit: "KPA", readings: [reading("logger-c-0001", 30, "420", "50")] })).status).toBe(403);
    for (const kind of ["none", "expired", "revoked"] as const) expect((await post(world.tokens[kind], labNumber, { pressureUnit: "KPA", readings: [] })).status).toBe(401);
    // Back in time against the saved readings: the grid's own check, all or nothing.
    const backwards = await post(world.tokens.instrument, labNumber, { pressureUnit: "KPA", readings: [reading("logger-a-0100", 40, "420", "50"), reading("logger-a-0101", 2, "410", "60")] });
    expect(backwards.status).toBe(400);
    expect(backwards.json!.error.message).toMatch(/^Nothing was saved\./);
    const huge = await call(readings.POST, `/runs/${labNumber}/readings`, { token: world.tokens.instrument, method: "POST", params: { labNumber }, raw: `{"pad":"${"x".repeat(10 * 1024 * 1024)}"}` });
    expect(huge.status).toBe(413);
    expect(huge.json!.error.code).toBe("TOO_LARGE");
    expect((await post(world.tokens.instrument, "T99-99999", { pressureUnit: "KPA", readings: [reading("logger-a-0200", 40, "420", "50")] })).status).toBe(404);
    expect(await db().reading.count({ where: { runId: world.run.id } })).toBe(before);
  });

  it("saves a batch once when the same request arrives twice at the same moment (a logger's retry racing its first try)", async () => {
    const fresh = await makeRun();
    const cell = await db().equipment.findUniqueOrThrow({ where: { id: fresh.run.cellId } });
    const { token } = await createApiToken({ actor: fresh.technician, input: { name: unique("racer"), scope: "READINGS_POST", cells: cell.assetTag } });
    const body = { pressureUnit: "KPA", readings: [1, 2, 3].map((h) => ({ idempotencyKey: `race-key-000${h}`, ...gridRow(at(fresh.permeationStartedAt, h), String(452 - h), String(18 + h)) })) };
    const answers = await Promise.all([post(token, fresh.run.labNumber, body), post(token, fresh.run.labNumber, body)]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 201]);
    expect(answers.map((a) => [a.json!.saved, a.json!.replayed]).sort()).toEqual([[0, 3], [3, 0]]);
    expect(await db().reading.count({ where: { runId: fresh.run.id } })).toBe(3);
  });

  it("writes every request with a token to the audit trail under the token's name and owner", async () => {
    const token = await db().apiToken.findFirstOrThrow({ where: { userId: world.technician.id, scope: "READINGS_POST" } });
    const requests = await db().apiRequest.findMany({ where: { tokenId: token.id } });
    expect(requests.length).toBeGreaterThanOrEqual(5);
    expect(requests.every((r) => r.tokenName === token.name && r.userId === world.technician.id)).toBe(true);
    expect(requests.filter((r) => r.method === "POST" && r.path === `/api/v1/runs/${world.run.labNumber}/readings`).length).toBeGreaterThanOrEqual(5);
    const audited = await db().auditLog.findMany({ where: { tableName: "ApiRequest", rowId: { in: requests.map((r) => r.id) } } });
    expect(audited).toHaveLength(requests.length);
    expect(audited.every((a) => a.actorId === world.technician.id)).toBe(true);
  });

  it("limits requests per token per minute, counted in the database", async () => {
    const { token } = await createApiToken({ actor: world.qa, input: { name: unique("busy"), scope: "LAB_READ" } });
    process.env.SEEPLINE_API_RATE_PER_MINUTE = "3";
    try {
      const answers = [];
      for (let i = 0; i < 5; i += 1) answers.push(await call(rolls.GET, "/rolls?limit=1", { token }));
      const statuses = answers.map((a) => a.status);
      // Three in one minute; a minute boundary between calls would reset the count, which this allows.
      expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(1);
      const limited = answers.find((a) => a.status === 429)!;
      expect(limited.json!.error.code).toBe("RATE_LIMITED");
      expect(Number(limited.headers.get("retry-after"))).toBeGreaterThan(0);
    } finally {
      delete process.env.SEEPLINE_API_RATE_PER_MINUTE;
    }
  });
});
