import { randomBytes } from "node:crypto";
import pg from "pg";
import { startEmbeddedDb } from "../../scripts/support/embedded-db";
import { applyMigrations } from "../../scripts/support/prisma-cli";

export type TestDatabase = { url: string; mode: "external" | "embedded"; drop(): Promise<void> };

const LOOPBACK = new Set(["localhost", "127.0.0.1", "::1", "[::1]"]);

/**
 * A new, empty, migrated database for one test run. With DATABASE_URL set, a throw-away database is
 * created beside the one named there (which is never written to) and dropped afterwards; without it,
 * an in-memory embedded PostgreSQL is started. Refuses a non-local server unless explicitly allowed.
 */
export async function createTestDatabase(label: string): Promise<TestDatabase> {
  const serverUrl = process.env.DATABASE_URL;
  if (!serverUrl) {
    const embedded = await startEmbeddedDb("memory://", { quiet: true });
    await applyMigrations(embedded.url);
    return { url: embedded.url, mode: "embedded", drop: embedded.stop };
  }

  const server = new URL(serverUrl);
  if (!LOOPBACK.has(server.hostname) && process.env.SEEPLINE_ALLOW_REMOTE_TEST_DB !== "1")
    throw new Error(`refusing to create test databases on ${server.hostname}: tests only use a local server (set SEEPLINE_ALLOW_REMOTE_TEST_DB=1 to override).`);
  const name = `seepline_${label}_${Date.now()}_${randomBytes(3).toString("hex")}`;
  const admin = new pg.Client({ connectionString: serverUrl });
  await admin.connect();
  await admin.query(`CREATE DATABASE "${name}"`);
  await admin.end();
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  await applyMigrations(url.toString());
  return {
    url: url.toString(),
    mode: "external",
    async drop() {
      const client = new pg.Client({ connectionString: serverUrl });
      await client.connect();
      await client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      await client.end();
    },
  };
}
