import "server-only";
import { PrismaPg } from "@prisma/adapter-pg";
import { PrismaClient } from "@/lib/generated/prisma/client";
import { getEnv } from "../env";
import { UTC_SESSION_OPTIONS } from "./utc-session";

function createClient(connectionString: string) {
  // Every session in UTC: timestamp columns hold UTC (lib/server/db/utc-session.ts). Twenty connections: a
  // page asks two or three queries at once, so ten made twenty people's pages queue for a connection.
  const adapter = new PrismaPg({ connectionString, max: 20, options: UTC_SESSION_OPTIONS });
  // Password and token hashes never leave the database unless an operation asks for them by name.
  return new PrismaClient({ adapter, omit: { user: { passwordHash: true }, apiToken: { tokenHash: true } } });
}
export type Db = ReturnType<typeof createClient>;

const globalForDb = globalThis as unknown as { seeplineDb?: Db };

/** The process's one database client (kept on globalThis so development reloads do not open new pools). */
export function getDb(): Db {
  if (!globalForDb.seeplineDb) globalForDb.seeplineDb = createClient(getEnv().DATABASE_URL);
  return globalForDb.seeplineDb;
}

/** For tests and scripts that manage their own database address. */
export function createDb(connectionString: string): Db {
  return createClient(connectionString);
}
