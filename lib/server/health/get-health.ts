import "server-only";
import { readdir } from "node:fs/promises";
import path from "node:path";
import { getEnv } from "../env";
import { getDb } from "../db/client";

export type Health = {
  status: "ok" | "degraded" | "unavailable";
  database: { mode: "embedded" | "external"; reachable: boolean; error?: string };
  migrations: { upToDate: boolean; applied: number; expected: number; pending: string[] } | null;
  checkedAt: string;
};

async function expectedMigrations(): Promise<string[]> {
  const dir = path.join(process.cwd(), "prisma", "migrations");
  const entries = await readdir(dir, { withFileTypes: true });
  return entries.filter((e) => e.isDirectory()).map((e) => e.name).sort();
}

/** Whether the app can reach its database and whether every committed migration has been applied. */
export async function getHealth(): Promise<Health> {
  const mode = getEnv().SEEPLINE_DATABASE_MODE;
  const checkedAt = new Date().toISOString();
  try {
    const db = getDb();
    const rows = await db.$queryRaw<Array<{ migration_name: string }>>`
      SELECT migration_name FROM _prisma_migrations WHERE finished_at IS NOT NULL AND rolled_back_at IS NULL`;
    const applied = new Set(rows.map((r) => r.migration_name));
    const expected = await expectedMigrations();
    const pending = expected.filter((name) => !applied.has(name));
    return {
      status: pending.length === 0 ? "ok" : "degraded",
      database: { mode, reachable: true },
      migrations: { upToDate: pending.length === 0, applied: applied.size, expected: expected.length, pending },
      checkedAt,
    };
  } catch (error) {
    return { status: "unavailable", database: { mode, reachable: false, error: describeDbError(error) }, migrations: null, checkedAt };
  }
}

// Driver errors often carry their meaning in a `cause.kind` rather than the message.
function describeDbError(error: unknown): string {
  if (!(error instanceof Error)) return String(error);
  const cause = (error as { cause?: { kind?: string; message?: string } }).cause;
  const text = error.message.split("\n")[0] || cause?.message || cause?.kind || error.name;
  return text || "the database did not answer";
}
