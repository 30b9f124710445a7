import { UTC_SESSION_OPTIONS } from "../../lib/server/db/utc-session";

/**
 * The SQL statements `work` sends through Prisma, taken from a second client with query logging on (the
 * benchmarks replay them as the page's own SQL baseline). Transaction control statements are left out.
 */
export async function captureStatements(url: string, work: () => Promise<unknown>): Promise<{ text: string; values: unknown[] }[]> {
  const { PrismaPg } = await import("@prisma/adapter-pg");
  const { PrismaClient } = await import("../../lib/generated/prisma/client");
  const statements: { text: string; values: unknown[] }[] = [];
  const logging = new PrismaClient({ adapter: new PrismaPg({ connectionString: url, options: UTC_SESSION_OPTIONS }), log: [{ emit: "event", level: "query" }] });
  logging.$on("query", (e) => statements.push({ text: e.query, values: JSON.parse(e.params) as unknown[] }));
  const globalForDb = globalThis as unknown as { seeplineDb?: unknown };
  const previous = globalForDb.seeplineDb;
  globalForDb.seeplineDb = logging;
  try {
    await work();
  } finally {
    globalForDb.seeplineDb = previous;
    await logging.$disconnect();
  }
  return statements.filter((s) => !/^\s*(BEGIN|COMMIT|ROLLBACK)/i.test(s.text));
}
