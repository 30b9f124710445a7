import pg from "pg";
import { describe, expect, inject, it } from "vitest";
import { createDb } from "@/lib/server/db/client";
import { withActor } from "@/lib/server/db/transaction";
import { db, makeUser, unique } from "../support/factories";
import { withOwner } from "../support/owner";

// UTC+14 all year (no daylight saving), so a local time stored by mistake is 14 hours off, never close by chance.
const FAR_ZONE = "Pacific/Kiritimati";
const MINUTE = 60_000;
const HOUR = 60 * MINUTE;

/** How far `stored` (a timestamp column read by Prisma as UTC) is from the true time of the test, in ms. */
const offFromNow = (stored: Date, now = Date.now()) => Math.abs(stored.getTime() - now);

describe("timestamps the database writes itself are UTC, whatever the session's time zone", () => {
  it("stores the audit row's time and a column default in UTC on a session whose TimeZone is UTC+14", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const code = unique("TZ").toUpperCase();
    const email = `${unique("tz")}@example.test`;
    const seen = await withActor(admin, async (tx) => {
      await tx.$executeRawUnsafe(`SET LOCAL TimeZone = '${FAR_ZONE}'`);
      const [session] = await tx.$queryRaw<{ zone: string; localHoursAhead: number }[]>`
        SELECT current_setting('TimeZone') AS zone,
               round(extract(epoch FROM (LOCALTIMESTAMP - (now() AT TIME ZONE 'UTC'))) / 3600)::int AS "localHoursAhead"`;
      const location = await tx.storageLocation.create({ data: { code, name: "Shelf written at UTC+14" } });
      // A raw insert leaves the time to the column's default, as SQL outside the app would.
      await tx.$executeRaw`INSERT INTO "SignInKnownAddress" ("accountEmail", "address") VALUES (${email}, '192.0.2.14')`;
      return { session, location };
    });
    // The session really was 14 hours ahead, so CURRENT_TIMESTAMP alone would have stored local time.
    expect(seen.session).toEqual({ zone: FAR_ZONE, localHoursAhead: 14 });

    const [audit] = await db().auditLog.findMany({ where: { tableName: "StorageLocation", rowId: seen.location.id } });
    expect(audit!.actorId).toBe(admin.id);
    expect(offFromNow(audit!.occurredAt)).toBeLessThan(5 * MINUTE);
    const known = await db().signInKnownAddress.findUniqueOrThrow({ where: { accountEmail_address: { accountEmail: email, address: "192.0.2.14" } } });
    expect(offFromNow(known.lastSuccessAt)).toBeLessThan(5 * MINUTE);
    expect(offFromNow(seen.location.createdAt)).toBeLessThan(5 * MINUTE);
  });

  it("gives every timestamp column the database fills by default the time in UTC (a later @default(now()) needs it too)", async () => {
    const defaults = await db().$queryRaw<{ column: string; fill: string }[]>`
      SELECT table_name || '.' || column_name AS column, column_default AS fill FROM information_schema.columns
      WHERE table_schema = 'public' AND data_type = 'timestamp without time zone' AND column_default IS NOT NULL ORDER BY 1`;
    expect(defaults.length).toBeGreaterThan(20);
    // PostgreSQL shows the default as it parsed it: "(CURRENT_TIMESTAMP AT TIME ZONE 'UTC'::text)".
    expect(defaults.filter((d) => !/AT TIME ZONE 'UTC'|timezone\('UTC'/.test(d.fill))).toEqual([]);
  });

  it("connects the app in UTC even where the database's own default time zone is another", async () => {
    const url = inject("databaseUrl");
    // The embedded database has one shared session, so a database default reaches no new session there.
    const embedded = url === inject("ownerDatabaseUrl");
    const setDatabaseZone = (zone: string | null) =>
      withOwner({ id: "system:test" }, (tx) =>
        tx.$executeRawUnsafe(`DO $$ BEGIN EXECUTE format('ALTER DATABASE %I ${zone ? `SET TimeZone = ''${zone}''` : "RESET TimeZone"}', current_database()); END; $$`),
      );
    await setDatabaseZone(FAR_ZONE);
    const app = createDb(url);
    const plain = new pg.Client({ connectionString: url });
    try {
      await plain.connect();
      const plainZone = (await plain.query<{ TimeZone: string }>("SHOW TimeZone")).rows[0]!.TimeZone;
      expect(plainZone).toBe(embedded ? "UTC" : FAR_ZONE);
      const [appSession] = await app.$queryRaw<{ zone: string; skewMs: number }[]>`
        SELECT current_setting('TimeZone') AS zone, extract(epoch FROM (LOCALTIMESTAMP - (now() AT TIME ZONE 'UTC'))) * 1000 AS "skewMs"`;
      expect(appSession!.zone).toBe("UTC");
      expect(Math.abs(Number(appSession!.skewMs))).toBeLessThan(HOUR);
    } finally {
      await plain.end();
      await app.$disconnect();
      await setDatabaseZone(null);
    }
  });
});
