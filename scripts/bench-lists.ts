/**
 * Benchmark of the four list queries (lib/server/lists) at 100,000 rolls: a throw-away database on the
 * DATABASE_URL server, bulk-filled with SQL, then each typical query timed a few times. Target on the
 * 2-core machines: every list under ~100 ms. Prints figures and the plan of the slowest query; asserts nothing.
 * Run: DATABASE_URL=postgresql://postgres@127.0.0.1:5432/postgres npx tsx --conditions=react-server scripts/bench-lists.ts
 * SEEPLINE_BENCH_KEEP_DB=1 keeps the database afterwards (its address is printed) to look at plans by hand.
 */
import type { CurrentUser } from "../lib/server/auth/current-user";
import { parseListQuery, type ListKind } from "../lib/validation/list-query";
import { median } from "./support/median";
import { withBenchDatabase } from "./support/bench-database";
import { captureStatements } from "./support/capture-statements";
import { bulkSeedSql } from "./support/bulk-seed";

const REPEAT = 7;
const SEED_SQL = bulkSeedSql();

type Case = { kind: Exclude<ListKind, "runs">; name: string; params: Record<string, string> };

async function main() {
  // The bulk load ends with ANALYZE, which only the tables' owner may run; the timed queries use the app's role.
  await withBenchDatabase("bench", SEED_SQL, async ({ owner: sql, database, seedStart }) => {
    const counts = await sql.query(`SELECT (SELECT count(*) FROM "Roll") AS rolls, (SELECT count(*) FROM "Coupon") AS coupons,
      (SELECT count(*) FROM "Specimen") AS specimens, (SELECT count(*) FROM "Shipment") AS shipments, (SELECT count(*) FROM "AuditLog") AS audit`);
    const c = counts.rows[0] as Record<string, string>;
    console.log(`seeded ${c.rolls} rolls, ${c.coupons} coupons, ${c.specimens} specimens, ${c.shipments} shipments (${c.audit} audit rows, triggers on) in ${((performance.now() - seedStart) / 1000).toFixed(1)} s`);

    const { listRolls } = await import("../lib/server/lists/list-rolls");
    const { listCoupons } = await import("../lib/server/lists/list-coupons");
    const { listSpecimens } = await import("../lib/server/lists/list-specimens");
    const { listShipments } = await import("../lib/server/lists/list-shipments");
    const { getDb } = await import("../lib/server/db/client");
    const actor: CurrentUser = { id: "bench-user-1", name: "Bench technician 1", email: "bench1@example.test", role: "TECHNICIAN", clientOrganizationId: null, pressureUnit: "KPA" };
    const run = { rolls: listRolls, coupons: listCoupons, specimens: listSpecimens, shipments: listShipments } as const;

    const client = "bench-org-7";
    const project = "bench-prj-42";
    const range = { from: "2025-03-01", to: "2025-03-31" };
    const cases: Case[] = [];
    const dated = { rolls: "received", shipments: "received", coupons: "cut", specimens: "prepared" } as const;
    const prefix = { rolls: "R25-012", shipments: "S25-01", coupons: "C25-012", specimens: "P25-012" } as const;
    for (const kind of ["rolls", "coupons", "specimens", "shipments"] as const) {
      cases.push(
        { kind, name: "first page, newest first", params: { sort: dated[kind], dir: "desc" } },
        { kind, name: "client", params: { clientOrganizationId: client } },
        { kind, name: "project", params: { projectId: project } },
        { kind, name: "date range (a month)", params: range },
        { kind, name: `lab number prefix ${prefix[kind]}`, params: { q: prefix[kind] } },
        { kind, name: "page 1000 (of 50)", params: { page: "1000" } },
        { kind, name: "sorted by lab number, page 200", params: { sort: "labNumber", dir: "asc", page: "200" } },
      );
      if (kind !== "shipments") cases.push({ kind, name: "state", params: { state: kind === "rolls" ? "RECEIVED" : kind === "coupons" ? "RETAINED" : "TESTED" } }, { kind, name: "state + client", params: { state: kind === "specimens" ? "TESTED" : "RETAINED", clientOrganizationId: client } }, { kind, name: "sorted by state", params: { sort: "state" } });
      if (kind === "rolls") cases.push({ kind, name: "roll number prefix RN-0420", params: { q: "RN-0420" } }, { kind, name: "client + date range", params: { clientOrganizationId: client, ...range } });
      if (kind === "shipments") cases.push({ kind, name: "to acknowledge", params: { acknowledged: "no" } });
    }

    // One pass over every case first: the query compiler and the connection pool warm up as in a running app.
    for (const c of cases) await run[c.kind]({ actor, query: parseListQuery(c.kind, c.params).query as never });
    const results: { c: Case; p50: number; max: number; total: number; rows: number }[] = [];
    for (const c of cases) {
      const { query } = parseListQuery(c.kind, c.params);
      const times: number[] = [];
      let last = { total: 0, rows: [] as unknown[] };
      for (let i = 0; i < REPEAT; i++) {
        const t0 = performance.now();
        last = await run[c.kind]({ actor, query: query as never });
        times.push(performance.now() - t0);
      }
      results.push({ c, p50: median(times), max: Math.max(...times), total: last.total, rows: last.rows.length });
    }

    console.log(`\n${"list".padEnd(10)} ${"query".padEnd(34)} ${"p50 ms".padStart(7)} ${"max ms".padStart(7)} ${"total".padStart(7)} rows`);
    for (const r of results)
      console.log(`${r.c.kind.padEnd(10)} ${r.c.name.padEnd(34)} ${r.p50.toFixed(1).padStart(7)} ${r.max.toFixed(1).padStart(7)} ${String(r.total).padStart(7)} ${r.rows}`);
    console.log(`(${REPEAT} runs each after one warm-up pass over all cases; a run is the count and the page, with its related rows)`);

    // The plan of the slowest case, as Prisma sends it: capture its statements and EXPLAIN ANALYZE them here.
    const slowest = results.reduce((a, b) => (b.p50 > a.p50 ? b : a));
    console.log(`\nslowest: ${slowest.c.kind} / ${slowest.c.name} (${slowest.p50.toFixed(1)} ms); its statements and plans:`);
    const statements = await captureStatements(database.url, async () => {
      const { query } = parseListQuery(slowest.c.kind, slowest.c.params);
      await run[slowest.c.kind]({ actor, query: query as never });
    });
    for (const s of statements.filter((s) => /^\s*SELECT/i.test(s.text) && !/set_config/.test(s.text))) {
      const plan = await sql.query(`EXPLAIN (ANALYZE, BUFFERS OFF, COSTS OFF) ${s.text}`, s.values);
      console.log(`\n${s.text.slice(0, 400)}${s.text.length > 400 ? " …" : ""}\n  params: ${JSON.stringify(s.values)}`);
      for (const row of plan.rows as { "QUERY PLAN": string }[]) console.log(`  ${row["QUERY PLAN"]}`);
    }
    await getDb().$disconnect();
  });
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
