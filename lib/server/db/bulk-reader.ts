import "server-only";
import pg from "pg";
import { getEnv } from "../env";
import { UTC_SESSION_OPTIONS } from "./utc-session";

const globalForBulk = globalThis as unknown as { seeplineBulkReader?: pg.Pool };

/**
 * A small pg pool for reads of many narrow rows (a data-logger run's 100,000 readings): rows come back as
 * arrays of plain values, without the per-row work of the Prisma client, which costs seconds at that size.
 * Reads only, outside transactions; everything else goes through getDb().
 */
export function getBulkReader(): pg.Pool {
  if (!globalForBulk.seeplineBulkReader) {
    const pool = new pg.Pool({ connectionString: getEnv().DATABASE_URL, max: 4, idleTimeoutMillis: 30_000, options: UTC_SESSION_OPTIONS });
    // An idle connection the server closes (a restart) must not end the process; the next read opens a new one.
    pool.on("error", (error) => console.warn(`bulk reader: an idle database connection closed (${error.message})`));
    globalForBulk.seeplineBulkReader = pool;
  }
  return globalForBulk.seeplineBulkReader;
}
