import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import pg from "pg";
import { ROOT } from "./paths";

export type LocalMigration = { name: string; checksum: string };
export type AppliedMigration = { name: string; checksum: string; finished: boolean; rolledBack: boolean };

const MIGRATIONS_DIR = path.join(ROOT, "prisma", "migrations");

/** The committed migrations, each with the SHA-256 of its script (what Prisma stores as `checksum`). */
export function readLocalMigrations(dir = MIGRATIONS_DIR): LocalMigration[] {
  return readdirSync(dir, { withFileTypes: true })
    .filter((entry) => entry.isDirectory() && existsSync(path.join(dir, entry.name, "migration.sql")))
    .map((entry) => ({
      name: entry.name,
      checksum: createHash("sha256").update(readFileSync(path.join(dir, entry.name, "migration.sql"))).digest("hex"),
    }))
    .sort((a, b) => a.name.localeCompare(b.name));
}

/**
 * True when every committed migration is applied, finished and unchanged, and the database knows no other
 * and holds no failed attempt. Anything else (new, edited, failed, unknown) is left to the migration tool,
 * which says what is wrong; this only spares the tool's start-up when there is nothing to do.
 */
export function nothingPending(local: LocalMigration[], applied: AppliedMigration[]): boolean {
  if (applied.some((row) => !row.finished && !row.rolledBack)) return false;
  const live = new Map<string, string>();
  for (const row of applied) if (row.finished && !row.rolledBack) live.set(row.name, row.checksum);
  if (live.size !== local.length) return false;
  return local.every((m) => live.get(m.name) === m.checksum);
}

/** Reads `_prisma_migrations`; a database without it has everything pending. */
export async function readAppliedMigrations(databaseUrl: string): Promise<AppliedMigration[] | null> {
  const client = new pg.Client({ connectionString: databaseUrl, connectionTimeoutMillis: 10_000 });
  await client.connect();
  try {
    const exists = await client.query<{ t: string | null }>(`SELECT to_regclass('_prisma_migrations')::text AS t`);
    if (!exists.rows[0]?.t) return null;
    const { rows } = await client.query<{ name: string; checksum: string; finished: boolean; rolled_back: boolean }>(
      `SELECT migration_name AS name, checksum, finished_at IS NOT NULL AS finished, rolled_back_at IS NOT NULL AS rolled_back FROM _prisma_migrations`,
    );
    return rows.map((r) => ({ name: r.name, checksum: r.checksum, finished: r.finished, rolledBack: r.rolled_back }));
  } finally {
    await client.end();
  }
}

/** Whether the database at `databaseUrl` already has every committed migration (one query, no migration tool). */
export async function migrationsUpToDate(databaseUrl: string): Promise<boolean> {
  const applied = await readAppliedMigrations(databaseUrl);
  return applied !== null && nothingPending(readLocalMigrations(), applied);
}
