/**
 * Benchmark of the audit trail filter (findAuditEntries) at millions of audit rows: a throw-away database on
 * the DATABASE_URL server, the log bulk-filled with SQL, then each typical filter timed a few times. Beside
 * each figure a baseline measured in the same run: the same page by OFFSET instead of the keyset, a date
 * range walked in id order instead of time order, and the person filters without the ("actorId", id) index
 * of migration 20261202073145_audit_trail_filters. Prints figures and ratios; asserts nothing.
 * Run: DATABASE_URL=postgresql://postgres@127.0.0.1:5432/postgres npm run bench:audit
 * SEEPLINE_BENCH_AUDIT_ROWS=500000 for a smaller log; SEEPLINE_BENCH_KEEP_DB=1 keeps the database.
 */
import type { CurrentUser } from "../lib/server/auth/current-user";
import { median } from "./support/median";
import { withBenchDatabase } from "./support/bench-database";

const ROWS = Number(process.env.SEEPLINE_BENCH_AUDIT_ROWS ?? 2_000_000);
const READINGS = 2_000; // of the one run the record filter looks for
const REPEAT = 7;
const PAGE = 50;

// One run with its readings (live rows, for the record filter's look-up), then the log: mostly readings and
// custody events of many runs, a rare table (signatures, 1 in 2000), a rare person (1 in 1000), one row in
// 1000 about a reading of the run, two years of history in id order. Deterministic (hash of the row number).
const SEED_SQL = `
SELECT set_config('seepline.actor_id', 'system:bench', false);
INSERT INTO "User" (id, email, name, "passwordHash", role, "updatedAt")
  SELECT 'bench-user-' || g, 'bench' || g || '@example.test', 'Bench person ' || g, 'x', 'TECHNICIAN', now() FROM generate_series(1, 30) g;
INSERT INTO "ClientOrganization" (id, code, name, "updatedAt") VALUES ('bench-org', 'BENCH', 'Bench client', now());
INSERT INTO "Project" (id, code, name, "siteName", "clientOrganizationId", "updatedAt") VALUES ('bench-prj', 'BENCH-1', 'Bench project', 'Site', 'bench-org', now());
INSERT INTO "Shipment" (id, "labNumber", "clientOrganizationId", "projectId", "deliveredBy", "receivedAt", "receivedById", "updatedAt")
  VALUES ('bench-shp', 'S25-00001', 'bench-org', 'bench-prj', 'Carrier', now(), 'bench-user-1', now());
INSERT INTO "Roll" (id, "labNumber", "shipmentId", "projectId", "rollNumber", "lotNumber", product, manufacturer, "updatedAt")
  VALUES ('bench-roll', 'R25-00001', 'bench-shp', 'bench-prj', 'RN-1', 'L-1', 'GCL', 'Maker', now());
INSERT INTO "Coupon" (id, "labNumber", "rollId", "positionInSample", "lengthMm", "widthMm", "cutById", "cutAt", "updatedAt")
  VALUES ('bench-cpn', 'C25-00001', 'bench-roll', 'Centre', 300, 300, 'bench-user-1', now(), now());
INSERT INTO "Specimen" (id, "labNumber", "couponId", "dieDiameterMm", "initialThicknessMm", "initialMassG", "intendedMethodCode", "preparedById", "preparedAt", "updatedAt")
  VALUES ('bench-spc', 'P25-00001', 'bench-cpn', 100, 6.5, 46, 'D5887', 'bench-user-1', now(), now());
INSERT INTO "Equipment" (id, "assetTag", kind, name, "updatedAt") VALUES ('bench-cell', 'CELL-B', 'PERMEAMETER_CELL', 'Bench cell', now());
INSERT INTO "TestMethod" (code, title, defaults, "updatedAt") VALUES ('D5887', 'Index flux', '{}', now()) ON CONFLICT DO NOTHING;
INSERT INTO "Run" (id, "labNumber", "specimenId", "cellId", "methodCode", "performedById", "updatedAt")
  VALUES ('bench-run', 'T25-00042', 'bench-spc', 'bench-cell', 'D5887', 'bench-user-1', now());
INSERT INTO "Reading" (id, "runId", sequence, "takenAt", "elapsedS", "inflowCumulativeMl", "outflowCumulativeMl", "headPa", "temperatureC", "recordedById")
  SELECT 'bench-rd-' || g, 'bench-run', g, now(), g * 600, g * 0.01, g * 0.01, 14000, 20.5, 'bench-user-1' FROM generate_series(1, ${READINGS}) g;
INSERT INTO "AuditLog" ("occurredAt", "actorId", "tableName", "rowId", operation, "before", "after", "txId")
  SELECT timestamp '2024-01-01' + g * (interval '730 days' / ${ROWS}),
         CASE WHEN g % 1000 = 7 THEN 'bench-user-30' ELSE 'bench-user-' || (1 + abs(hashint4(g)) % 29) END,
         t, CASE WHEN g % 1000 = 0 THEN 'bench-rd-' || (1 + (g / 1000) % ${READINGS}) ELSE 'row-' || g END,
         CASE WHEN g % 3 = 0 THEN 'UPDATE' ELSE 'INSERT' END,
         CASE WHEN g % 3 = 0 THEN jsonb_build_object('temperatureC', 20.1, 'sequence', g % 50) END,
         jsonb_build_object('temperatureC', 20.4, 'sequence', g % 50, 'runId', 'run-' || (g % 5000)),
         g
  FROM (SELECT g, CASE WHEN g % 1000 = 0 THEN 'Reading' WHEN g % 2000 = 1 THEN 'Signature'
                       ELSE (ARRAY['Reading', 'Reading', 'Reading', 'CustodyEvent', 'RunStage', 'Run', 'Roll', 'Coupon'])[1 + abs(hashint4(g + 1)) % 8] END AS t
        FROM generate_series(1, ${ROWS}) g) s;
ANALYZE;
`;

type Case = { name: string; input: Record<string, unknown>; baseline?: { name: string; sql?: string; withoutIndexes?: boolean } };

async function time(work: () => Promise<unknown>): Promise<number> {
  await work();
  const times: number[] = [];
  for (let i = 0; i < REPEAT; i++) {
    const t0 = performance.now();
    await work();
    times.push(performance.now() - t0);
  }
  return median(times);
}

async function main() {
  // The log is filled straight with SQL and an index dropped for a baseline, which only the owner may do;
  // the filter itself runs as the app's role.
  await withBenchDatabase("bench_audit", SEED_SQL, async ({ owner: sql, seedStart }) => {
    const { rows } = await sql.query(`SELECT count(*)::int AS n, min(id)::text AS lo, max(id)::text AS hi FROM "AuditLog"`);
    const { n, lo, hi } = rows[0] as { n: number; lo: string; hi: string };
    console.log(`seeded ${n.toLocaleString("en-GB")} audit rows in ${((performance.now() - seedStart) / 1000).toFixed(1)} s`);
    const { findAuditEntries } = await import("../lib/server/audit/find-audit-entries");
    const { getDb } = await import("../lib/server/db/client");
    const actor: CurrentUser = { id: "bench-user-1", name: "Bench person 1", email: "bench1@example.test", role: "LAB_ADMIN", clientOrganizationId: null, pressureUnit: "KPA" };
    const middle = String((BigInt(lo) + BigInt(hi)) / 2n);
    const deepOffset = Number(BigInt(hi) - BigInt(middle));
    const page = async (input: Record<string, unknown>) => findAuditEntries({ actor, input: { pageSize: PAGE, ...input } });

    // The run's middle page: follow the keyset down once to find its cursor.
    let cursor: string | null = null;
    for (let i = 0, p = await page({ record: "T25-00042" }); i < 20 && p.older; i++) {
      cursor = p.older;
      p = await page({ record: "T25-00042", before: cursor });
    }

    // The week's third page: follow its keyset twice.
    const week = { from: "2025-01-06", to: "2025-01-12" };
    const weekPage3 = (await page({ ...week, before: (await page(week)).older })).older;

    const cases: Case[] = [
      { name: "newest page, no filter", input: {} },
      { name: "a page half way down (keyset)", input: { before: middle }, baseline: { name: "same page by OFFSET", sql: `SELECT id FROM "AuditLog" WHERE id < ${hi} + 1 ORDER BY id DESC OFFSET ${deepOffset} LIMIT ${PAGE}` } },
      { name: "run T25-00042 with its readings", input: { record: "T25-00042" } },
      { name: "run T25-00042, 21st page", input: { record: "T25-00042", before: cursor } },
      { name: "rare table (signatures)", input: { table: "signature" } },
      { name: "rare table, half way down", input: { table: "signature", before: middle } },
      { name: "rare person", input: { person: "bench-user-30" }, baseline: { name: "without the person index", withoutIndexes: true } },
      { name: "person + table", input: { person: "bench-user-30", table: "reading" }, baseline: { name: "without the person index", withoutIndexes: true } },
      {
        name: "one week, a year back", input: week,
        baseline: { name: "same week in id order", sql: `SELECT id FROM "AuditLog" WHERE "occurredAt" >= '2025-01-06' AND "occurredAt" < '2025-01-13' ORDER BY id DESC LIMIT ${PAGE + 1}` },
      },
      { name: "one week, a year back, 3rd page", input: { ...week, before: weekPage3 } },
      { name: "common table (readings)", input: { table: "reading" } },
    ];

    const results: Array<{ c: Case; ms: number; rows: number; base?: number }> = [];
    for (const c of cases) results.push({ c, ms: await time(() => page(c.input)), rows: (await page(c.input)).entries.length });
    for (const r of results.filter((r) => r.c.baseline?.sql)) r.base = await time(() => sql.query(r.c.baseline!.sql!));
    await sql.query(`DROP INDEX "AuditLog_actorId_id_idx"; ANALYZE "AuditLog";`);
    for (const r of results.filter((r) => r.c.baseline?.withoutIndexes)) r.base = await time(() => page(r.c.input));

    console.log(`\n${"filter".padEnd(36)} ${"p50 ms".padStart(8)} rows  ${"baseline".padEnd(26)} ${"p50 ms".padStart(9)} ${"ratio".padStart(7)}`);
    for (const r of results) {
      const base = r.base === undefined ? "" : `${r.c.baseline!.name.padEnd(26)} ${r.base.toFixed(1).padStart(9)} ${(r.base / r.ms).toFixed(1).padStart(6)}×`;
      console.log(`${r.c.name.padEnd(36)} ${r.ms.toFixed(1).padStart(8)} ${String(r.rows).padStart(4)}  ${base}`);
    }
    console.log(`(median of ${REPEAT} runs after one warm-up; each run is a whole page: the rows, the look-ups of names and lab numbers, and the words)`);

    // The CSV export walks every page of a filter: the run's ${READINGS} reading rows and its own.
    const exportStart = performance.now();
    let exported = 0;
    for (let p = await page({ record: "T25-00042", pageSize: 1000 }); ; p = await page({ record: "T25-00042", pageSize: 1000, before: p.older })) {
      exported += p.entries.length;
      if (!p.older) break;
    }
    console.log(`export of run T25-00042: ${exported} rows in ${(performance.now() - exportStart).toFixed(0)} ms`);
    await getDb().$disconnect();
  });
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
