/**
 * Lab-scale benchmark (issue 14): a throw-away database on the DATABASE_URL server with the demo and, on top,
 * 100,000 rolls, 20,000 runs and 1,000,000 readings (one run of 100,000), then each goal beside its baseline
 * measured in the same run, as a ratio, one line each:
 *   - run page of 100,000 readings vs 100 readings (goal <= 3x, HTML < 300 KB), and its first view after a new
 *     reading (when the kept readings and verdict no longer match);
 *   - the run page's charts drawn in headless Chromium, from navigation to the first chart line (goal < 2 s);
 *   - each list page's p95 at 20 concurrent users vs the p95 of the list's own SQL at 20 concurrent clients (goal <= 3x);
 *   - import of 100,000 logger rows vs a plain SQL insert of the same rows (goal <= 3x, memory < 300 MB);
 *   - start-up's migration check vs the migration tool with nothing to apply (goal < 1 s).
 * Asserts nothing; prints figures. Run: DATABASE_URL=postgresql://postgres@127.0.0.1:5432/postgres npm run bench:scale
 * (builds the app first when the sources changed). SEEPLINE_BENCH_KEEP_DB=1 keeps the database.
 */
import type { ChildProcess } from "node:child_process";
import pg from "pg";
import type { CurrentUser } from "../lib/server/auth/current-user";
import { UTC_SESSION_OPTIONS } from "../lib/server/db/utc-session";
import { captureStatements } from "./support/capture-statements";
import { chartDrawTimes } from "./support/chart-draw-time";
import { parseListQuery } from "../lib/validation/list-query";
import { DEMO_PASSWORD } from "../prisma/seed/demo-people";
import { createTestDatabase } from "../tests/support/test-database";
import { findFreePort } from "./support/free-port";
import { generateClientIfNeeded } from "./support/generate-client";
import { signInCookie } from "./support/http-session";
import { median } from "./support/median";
import { migrationsUpToDate } from "./support/migration-status";
import { buildIfNeeded, startNext, waitForHealthy } from "./support/next-app";
import { applyMigrations } from "./support/prisma-cli";
import { SCALE, scaleSeedSql } from "./support/scale-seed";

const USERS = 20;
const REQUESTS_PER_USER = 5;
const PAGE_REPEAT = 5;
const IMPORT_ROWS = 100_000;

const lines: string[] = [];
const say = (line: string) => {
  console.log(line);
  lines.push(line);
};
const ratio = (a: number, b: number) => `${(a / b).toPrecision(2)}x`;
const ms = (v: number) => `${v.toFixed(0)} ms`;
const kb = (bytes: number) => `${(bytes / 1024).toFixed(0)} KB`;
const p95 = (values: number[]) => [...values].sort((a, b) => a - b)[Math.min(values.length - 1, Math.ceil(values.length * 0.95) - 1)]!;

async function timed<T>(work: () => Promise<T>): Promise<{ ms: number; value: T }> {
  const t0 = performance.now();
  const value = await work();
  return { ms: performance.now() - t0, value };
}

/** `users` workers each doing `each` requests one after another; every request's time. */
async function concurrently(users: number, each: number, work: () => Promise<unknown>): Promise<number[]> {
  const times: number[] = [];
  await Promise.all(Array.from({ length: users }, async () => {
    for (let i = 0; i < each; i++) times.push((await timed(work)).ms);
  }));
  return times;
}

/** An invented logger file: one reading every 3 minutes from the run's permeation start, burettes moving 0.001 mm a reading. */
function loggerCsv(rows: number): string {
  const out = ["Elapsed (min),Inflow (mm),Outflow (mm),Influent kPa,Effluent kPa,Cell kPa,Temp °C"];
  for (let i = 0; i < rows; i++) out.push(`${i * 3},${(452 - i * 0.001).toFixed(3)},${(18 + i * 0.001).toFixed(3)},530,516,550,20.0`);
  return `${out.join("\n")}\n`;
}

async function main() {
  if (!process.env.DATABASE_URL) throw new Error("set DATABASE_URL to a local PostgreSQL server, e.g. postgresql://postgres@127.0.0.1:5432/postgres");
  await generateClientIfNeeded();
  const database = await createTestDatabase("scale");
  const keep = process.env.SEEPLINE_BENCH_KEEP_DB === "1";
  const owner = new pg.Client({ connectionString: database.ownerUrl, options: UTC_SESSION_OPTIONS });
  let app: ChildProcess | null = null;
  try {
    await owner.connect();
    const { seedIfEmpty } = await import("../prisma/seed");
    await seedIfEmpty(database.url);
    const tech = (await owner.query<{ id: string }>(`SELECT id FROM "User" WHERE email = 'technician@quillfen.test'`)).rows[0]!.id;
    const seeded = await timed(() => owner.query(scaleSeedSql(tech)));
    const counts = (await owner.query(`SELECT (SELECT count(*) FROM "Roll") AS rolls, (SELECT count(*) FROM "Run") AS runs, (SELECT count(*) FROM "Reading") AS readings`)).rows[0] as Record<string, string>;
    console.log(`seeded ${counts.rolls} rolls, ${counts.runs} runs, ${counts.readings} readings in ${(seeded.ms / 1000).toFixed(0)} s (with the demo)`);

    // --- Start-up: the one-query check beside the migration tool, both with nothing to apply.
    const tool = await timed(() => applyMigrations(database.ownerUrl));
    const checks: number[] = [];
    for (let i = 0; i < 5; i++) {
      const c = await timed(() => migrationsUpToDate(database.ownerUrl));
      if (!c.value) throw new Error("the migration check says something is pending on a migrated database");
      checks.push(c.ms);
    }
    say(`startup migration check (nothing pending): ${ms(median(checks))} vs the migration tool ${ms(tool.ms)} = ${ratio(median(checks), tool.ms)} (goal < 1 s)`);

    // --- Import of 100,000 rows beside a plain SQL insert of the same rows (triggers on, the app's role, one transaction each).
    process.env.DATABASE_URL = database.url;
    process.env.NEXTAUTH_SECRET ??= "bench-only-secret-0123456789abcdefghij";
    const csv = loggerCsv(IMPORT_ROWS);
    const plain = new pg.Client({ connectionString: database.url, options: UTC_SESSION_OPTIONS });
    await plain.connect();
    const start = (await plain.query<{ startedAt: Date }>(`SELECT "startedAt" FROM "RunStage" WHERE id = $1`, [`${SCALE.plainRun.id}-perm`])).rows[0]!.startedAt;
    const n = Array.from({ length: IMPORT_ROWS }, (_, i) => i);
    const plainInsert = await timed(async () => {
      await plain.query("BEGIN");
      await plain.query(`SELECT set_config('seepline.actor_id', $1, true)`, [tech]);
      await plain.query(
        `INSERT INTO "Reading" (id, "runId", sequence, "takenAt", "elapsedS", "inflowLevelMm", "outflowLevelMm", "inflowCumulativeMl", "outflowCumulativeMl", "headPa",
           "influentPressurePa", "effluentPressurePa", "cellPressurePa", "temperatureC", source, "recordedById")
         SELECT gen_random_uuid()::text, $1, u.n + 1, $2::timestamp + u.n * interval '3 minutes', u.n * 180, u.il, u.ol, u.ic, u.oc, 14000, 530000, 516000, 550000, 20, 'plain.csv', $3
         FROM unnest($4::int[], $5::float8[], $6::float8[], $7::float8[], $8::float8[]) AS u(n, il, ol, ic, oc)`,
        [SCALE.plainRun.id, start, tech, n, n.map((i) => 452 - i * 0.001), n.map((i) => 18 + i * 0.001), n.map((i) => i * 0.001 * 0.0314), n.map((i) => i * 0.001 * 0.0312)],
      );
      await plain.query("COMMIT");
    });
    await plain.end();
    const { importReadingsFile } = await import("../lib/server/readings/import-readings-file");
    const technician: CurrentUser = { id: tech, name: "Bram Oyelaran", email: "technician@quillfen.test", role: "TECHNICIAN", clientOrganizationId: null, pressureUnit: "KPA" };
    const before = process.memoryUsage().rss;
    let peak = before;
    const sampler = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
    const bytes = new TextEncoder().encode(csv);
    function* upload() {
      for (let i = 0; i < bytes.length; i += 65_536) yield bytes.subarray(i, i + 65_536);
    }
    const imported = await timed(() => importReadingsFile({ actor: technician, input: { labNumber: SCALE.importRun.labNumber, fileName: "logger-100k.csv", mode: "save" }, body: upload() }));
    clearInterval(sampler);
    if (imported.value.saved !== IMPORT_ROWS) throw new Error(`the import saved ${imported.value.saved} rows: ${imported.value.errors[0]?.message ?? ""}`);
    say(`import of ${IMPORT_ROWS.toLocaleString("en-GB")} readings (${kb(bytes.length)} file): ${ms(imported.ms)} vs plain SQL insert ${ms(plainInsert.ms)} = ${ratio(imported.ms, plainInsert.ms)} (goal <= 3x); memory peak ${(peak / 1024 / 1024).toFixed(0)} MB RSS, +${((peak - before) / 1024 / 1024).toFixed(0)} MB during the import (goal < 300 MB)`);

    // --- The app, signed in as the QA manager.
    await buildIfNeeded((line) => console.log(line));
    const port = await findFreePort();
    const baseUrl = `http://localhost:${port}`;
    app = startNext({ port, databaseUrl: database.url, databaseMode: database.mode, authSecret: "bench-only-secret-0123456789abcdefghij", baseUrl }, { quiet: true });
    await waitForHealthy(baseUrl);
    const cookie = await signInCookie(baseUrl, "qa@quillfen.test", DEMO_PASSWORD);
    const get = async (path: string) => {
      const response = await fetch(`${baseUrl}${path}`, { headers: { cookie } });
      const body = await response.text();
      if (response.status !== 200) throw new Error(`GET ${path} answered ${response.status}`);
      return body.length;
    };

    // --- Run page: 100,000 readings beside 100, alternating, after one warm-up each.
    const long = `/runs/${SCALE.longRun.labNumber}`;
    const short = `/runs/${SCALE.shortRun.labNumber}`;
    await get(long);
    await get(short);
    const longTimes: number[] = [];
    const shortTimes: number[] = [];
    let longSize = 0;
    let shortSize = 0;
    for (let i = 0; i < PAGE_REPEAT; i++) {
      const a = await timed(() => get(long));
      const b = await timed(() => get(short));
      longTimes.push(a.ms);
      shortTimes.push(b.ms);
      longSize = a.value;
      shortSize = b.value;
    }
    // The first view after a new reading: the readings and the verdict kept between requests no longer
    // match, so the page reads and evaluates all 100,000 again. One reading appended before each view.
    const appendReading = async () => {
      await owner.query("BEGIN");
      await owner.query(`SELECT set_config('seepline.actor_id', $1, true)`, [tech]);
      await owner.query(
        `INSERT INTO "Reading" (id, "runId", sequence, "takenAt", "elapsedS", "inflowLevelMm", "outflowLevelMm", "inflowCumulativeMl", "outflowCumulativeMl", "headPa",
           "influentPressurePa", "effluentPressurePa", "cellPressurePa", "temperatureC", source, "recordedById")
         SELECT gen_random_uuid()::text, "runId", sequence + 1, "takenAt" + interval '3 minutes', "elapsedS" + 180, "inflowLevelMm", "outflowLevelMm", "inflowCumulativeMl", "outflowCumulativeMl", "headPa",
           "influentPressurePa", "effluentPressurePa", "cellPressurePa", "temperatureC", 'bench-append', "recordedById"
         FROM "Reading" WHERE "runId" = $1 ORDER BY sequence DESC LIMIT 1`,
        [SCALE.longRun.id],
      );
      await owner.query("COMMIT");
    };
    const coldTimes: number[] = [];
    for (let i = 0; i < 3; i++) {
      await appendReading();
      coldTimes.push((await timed(() => get(long))).ms);
    }
    say(`run page, 100,000 readings: ${ms(median(longTimes))} vs 100 readings ${ms(median(shortTimes))} = ${ratio(median(longTimes), median(shortTimes))} (goal <= 3x); HTML ${kb(longSize)} vs ${kb(shortSize)} (goal < 300 KB)`);
    say(`run page, 100,000 readings, first view after a new reading: ${ms(median(coldTimes))} vs 100 readings ${ms(median(shortTimes))} = ${ratio(median(coldTimes), median(shortTimes))} (no goal: shows what the kept verdict saves)`);

    // --- Charts drawn in headless Chromium: from the start of the navigation to the first chart line.
    const drawnWarm = await chartDrawTimes({ baseUrl, cookie, path: long, looks: 3 });
    const drawnCold = await chartDrawTimes({ baseUrl, cookie, path: long, looks: 3, beforeEach: appendReading });
    const drawnShort = await chartDrawTimes({ baseUrl, cookie, path: short, looks: 3 });
    say(`run page charts drawn in Chromium, 100,000 readings: ${ms(median(drawnWarm))}, first view after a new reading ${ms(median(drawnCold))}, vs 100 readings ${ms(median(drawnShort))} (goal < 2 s)`);

    // --- Lists: page p95 at 20 concurrent users beside the p95 of the list's own SQL at 20 concurrent clients.
    const qa = (await owner.query<{ id: string }>(`SELECT id FROM "User" WHERE email = 'qa@quillfen.test'`)).rows[0]!.id;
    const actor: CurrentUser = { id: qa, name: "QA", email: "qa@quillfen.test", role: "QA_MANAGER", clientOrganizationId: null, pressureUnit: "KPA" };
    const { listRolls } = await import("../lib/server/lists/list-rolls");
    const { listCoupons } = await import("../lib/server/lists/list-coupons");
    const { listSpecimens } = await import("../lib/server/lists/list-specimens");
    const { listShipments } = await import("../lib/server/lists/list-shipments");
    const { readFilterSelection } = await import("../lib/server/lists/list-filter-options");
    const { listRunPage, listRunFilterChoices } = await import("../lib/server/lists/list-runs");
    const lists = [
      { path: "/samples", work: () => Promise.all([listRolls({ actor, query: parseListQuery("rolls", {}).query }), readFilterSelection({ actor })]) },
      { path: "/samples/coupons", work: () => Promise.all([listCoupons({ actor, query: parseListQuery("coupons", {}).query }), readFilterSelection({ actor })]) },
      { path: "/samples/specimens", work: () => Promise.all([listSpecimens({ actor, query: parseListQuery("specimens", {}).query }), readFilterSelection({ actor })]) },
      { path: "/intake", work: () => Promise.all([listShipments({ actor, query: parseListQuery("shipments", {}).query }), readFilterSelection({ actor })]) },
      { path: "/runs", work: () => Promise.all([listRunPage({ actor, query: parseListQuery("runs", {}).query }), listRunFilterChoices({ actor }), readFilterSelection({ actor })]) },
      { path: "/runs?state=APPROVED&sort=state", work: () => Promise.all([listRunPage({ actor, query: parseListQuery("runs", { state: "APPROVED", sort: "state" }).query }), listRunFilterChoices({ actor }), readFilterSelection({ actor })]) },
    ];
    // What every signed-in page costs before its own SQL: the account page asks only for the signed-in user.
    await get("/account");
    const floor = await concurrently(USERS, REQUESTS_PER_USER, () => get("/account"));
    say(`signed-in page floor (/account, one query): p95 ${ms(p95(floor))} at ${USERS} users (no goal: the part of each list's p95 that is not its SQL)`);
    const pool = Array.from({ length: USERS }, () => new pg.Client({ connectionString: database.url, options: UTC_SESSION_OPTIONS }));
    await Promise.all(pool.map((c) => c.connect()));
    for (const list of lists) {
      const statements = await captureStatements(database.url, list.work);
      let next = 0;
      const sqlTimes = await concurrently(USERS, REQUESTS_PER_USER, async () => {
        const client = pool[next++ % USERS]!;
        for (const s of statements) await client.query(s.text, s.values);
      });
      const size = await get(list.path);
      const pageTimes = await concurrently(USERS, REQUESTS_PER_USER, () => get(list.path));
      say(`list ${list.path}: p95 ${ms(p95(pageTimes))} at ${USERS} users vs its SQL (${statements.length} statements) p95 ${ms(p95(sqlTimes))} at ${USERS} clients = ${ratio(p95(pageTimes), p95(sqlTimes))} (goal <= 3x); page ${kb(size)}`);
    }
    await Promise.all(pool.map((c) => c.end()));
    const { getDb } = await import("../lib/server/db/client");
    await getDb().$disconnect();

    console.log(`\n== bench:scale summary (${new Date().toISOString()}, ${counts.rolls} rolls, ${counts.runs} runs, ${counts.readings} readings before the imports)`);
    for (const line of lines) console.log(line);
  } finally {
    if (app && app.exitCode === null) {
      const exited = new Promise((resolve) => app!.once("exit", resolve));
      app.kill("SIGTERM");
      await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
    }
    await owner.end().catch(() => {});
    if (keep) console.log(`kept the bench database: ${database.url}`);
    else await database.drop();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
