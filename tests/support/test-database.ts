import { randomBytes } from "node:crypto";
import pg from "pg";
import { APP_ROLE, createOwnedDatabase, ensureRoles, OWNER_ROLE, urlAs, urlOfDatabase } from "../../scripts/support/database-roles";
import { migrateEmbeddedDb, startEmbeddedDb } from "../../scripts/support/embedded-db";
import { applyMigrations } from "../../scripts/support/prisma-cli";

/**
 * A migrated test database. `url` signs in as the app's runtime role (what the app and the operations
 * use, so the database's protections are exercised); `ownerUrl` as the migration owner. On the embedded
 * database both are the same address and the owner is reached with SET LOCAL ROLE (tests/support/owner.ts).
 */
export type TestDatabase = { url: string; ownerUrl: string; mode: "external" | "embedded"; drop(): Promise<void> };

const LOOPBACK = new Set(["localhost", "127.0.0.1", "::1", "[::1]"]);
// Test servers use trust authentication; a password is given anyway so a password-checking server works too.
const TEST_ROLE_PASSWORD = "seepline-tests-only";

/**
 * A new, empty, migrated database for one test run. With DATABASE_URL set, a throw-away database is
 * created beside the one named there (which is never written to), owned by the migration owner, and
 * dropped afterwards; without it, an in-memory embedded PostgreSQL is started. Refuses a non-local server
 * unless explicitly allowed.
 */
export async function createTestDatabase(label: string): Promise<TestDatabase> {
  const serverUrl = process.env.DATABASE_URL;
  if (!serverUrl) {
    const embedded = await startEmbeddedDb("memory://", { quiet: true });
    // A failed migration must not leave the embedded server running behind the test run.
    await migrateEmbeddedDb(embedded).catch(async (error: unknown) => {
      await embedded.stop();
      throw error;
    });
    return { url: embedded.url, ownerUrl: embedded.url, mode: "embedded", drop: embedded.stop };
  }

  const server = new URL(serverUrl);
  if (!LOOPBACK.has(server.hostname) && process.env.SEEPLINE_ALLOW_REMOTE_TEST_DB !== "1")
    throw new Error(`refusing to create test databases on ${server.hostname}: tests only use a local server (set SEEPLINE_ALLOW_REMOTE_TEST_DB=1 to override).`);
  const name = `seepline_${label}_${Date.now()}_${randomBytes(3).toString("hex")}`;
  await ensureRoles(serverUrl, { owner: TEST_ROLE_PASSWORD, app: TEST_ROLE_PASSWORD });
  await createOwnedDatabase(serverUrl, name);
  const database = urlOfDatabase(serverUrl, name);
  const ownerUrl = urlAs(database, OWNER_ROLE, TEST_ROLE_PASSWORD);
  await applyMigrations(ownerUrl);
  return {
    url: urlAs(database, APP_ROLE, TEST_ROLE_PASSWORD),
    ownerUrl,
    mode: "external",
    async drop() {
      const client = new pg.Client({ connectionString: serverUrl });
      await client.connect();
      await client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      await client.end();
    },
  };
}
