import pg from "pg";
import { UTC_SESSION_OPTIONS } from "../../lib/server/db/utc-session";
import { createTestDatabase, type TestDatabase } from "../../tests/support/test-database";

export type BenchDatabase = { owner: pg.Client; database: TestDatabase; seedStart: number };

/**
 * A benchmark's throw-away database on the DATABASE_URL server, filled with `seedSql` as the tables' owner
 * (bulk loads, ANALYZE and dropping an index are the owner's; `owner` stays connected for the bench). Then
 * DATABASE_URL names it as the app's role: lib/server reads it on first use, so `bench` loads lib/server
 * itself. Dropped afterwards unless SEEPLINE_BENCH_KEEP_DB=1, which prints its address instead.
 */
export async function withBenchDatabase(label: string, seedSql: string, bench: (db: BenchDatabase) => Promise<void>): Promise<void> {
  if (!process.env.DATABASE_URL) throw new Error("set DATABASE_URL to a local PostgreSQL server, e.g. postgresql://postgres@127.0.0.1:5432/postgres");
  const database = await createTestDatabase(label);
  const owner = new pg.Client({ connectionString: database.ownerUrl, options: UTC_SESSION_OPTIONS });
  try {
    await owner.connect();
    const seedStart = performance.now();
    await owner.query(seedSql);
    process.env.DATABASE_URL = database.url;
    process.env.NEXTAUTH_SECRET ??= "bench-only-secret-0123456789abcdefghij";
    await bench({ owner, database, seedStart });
  } finally {
    await owner.end();
    if (process.env.SEEPLINE_BENCH_KEEP_DB === "1") console.log(`\nkept the bench database: ${database.url}`);
    else await database.drop();
  }
}
