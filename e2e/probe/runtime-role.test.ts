import pg from "pg";
import { describe, expect, it } from "vitest";
import { inject } from "vitest";
import { OWNER_ROLE } from "../../scripts/support/database-roles";
import { browserAvailable } from "../support/session";
import { recordFigure } from "./support/figures";

/*
 * Direct SQL as the app's own database role, on every table: what someone who took over the app (or found
 * an injection) could try against the record. Every attempt runs inside a transaction that is rolled back,
 * so nothing changes even if one were allowed. Then the same TRUNCATE as the migration owner, which the
 * protected tables' triggers refuse too.
 */
const APPEND_ONLY = ["AuditLog", "CustodyEvent", "Reading", "Review", "CalibrationOverride", "Result", "Signature", "CertificateResult", "MethodSettingsVersion", "IndexTestResult", "IndexTestReview", "IndexTestEquipment", "ApiRequest", "ApiReadingKey", "CertificateDraftContent", "CertificateIndexResult"];

const RIGHT_REASONS = /permission denied|must be owner|must be superuser|append-only|cannot be changed|cannot be deleted|only increase|issued certificate revision|insufficient privilege|not allowed|no privileges were granted/i;

type Attempt = { sql: string; allowed: boolean; message: string };

/** `sql` as a statement, or with a query that tells whether it took effect (GRANT only warns when it cannot). */
type Statement = string | { sql: string; tookEffect: string };

async function attempt(client: pg.Client, statement: Statement, asOwner = false): Promise<Attempt> {
  const sql = typeof statement === "string" ? statement : statement.sql;
  await client.query("BEGIN");
  try {
    if (asOwner) await client.query(`SET LOCAL ROLE ${OWNER_ROLE}`);
    await client.query(sql);
    if (typeof statement !== "string") {
      const effect = await client.query<{ yes: boolean }>(statement.tookEffect);
      if (!effect.rows[0]?.yes) return { sql, allowed: false, message: "no privileges were granted (warning only)" };
    }
    return { sql, allowed: true, message: "" };
  } catch (error) {
    return { sql, allowed: false, message: (error as Error).message };
  } finally {
    await client.query("ROLLBACK");
  }
}

describe.skipIf(!browserAvailable())("probe: the app's database role cannot switch off or rewrite the record", () => {
  it("refuses every attempt, on every table, and the owner's TRUNCATE of a protected table as well", async () => {
    const embedded = inject("databaseMode") === "embedded";
    const app = new pg.Client({ connectionString: inject("appDatabaseUrl") });
    const owner = new pg.Client({ connectionString: inject("ownerDatabaseUrl") });
    await Promise.all([app.connect(), owner.connect()]);
    try {
      const tables = (await app.query<{ t: string }>(`SELECT tablename AS t FROM pg_tables WHERE schemaname = 'public' ORDER BY 1`)).rows.map((r) => r.t);
      const audited = (await app.query<{ t: string }>(`SELECT DISTINCT c.relname AS t FROM pg_trigger g JOIN pg_class c ON c.oid = g.tgrelid WHERE g.tgname = 'audit_row' ORDER BY 1`)).rows.map((r) => r.t);
      const issued = (await app.query<{ id: string }>(`SELECT id FROM "CertificateRevision" WHERE status = 'ISSUED' LIMIT 1`)).rows[0]?.id;
      const issuedResult = (await app.query<{ id: string }>(`SELECT cr."resultId" AS id FROM "CertificateResult" cr JOIN "CertificateRevision" r ON r.id = cr."revisionId" WHERE r.status = 'ISSUED' LIMIT 1`)).rows[0]?.id;
      const firstColumn = new Map((await app.query<{ t: string; c: string }>(`SELECT table_name AS t, column_name AS c FROM information_schema.columns WHERE table_schema = 'public' AND ordinal_position = 1`)).rows.map((r) => [r.t, r.c]));
      const anyUser = (await app.query<{ id: string }>(`SELECT id FROM "User" LIMIT 1`)).rows[0]!.id;
      expect(issued && issuedResult, "the demo has an issued certificate with a result").toBeTruthy();

      const statements = [
        ...tables.flatMap((t): Statement[] => [
          `TRUNCATE "${t}" CASCADE`, `ALTER TABLE "${t}" DISABLE TRIGGER ALL`, `DROP TABLE "${t}" CASCADE`, `ALTER TABLE "${t}" OWNER TO CURRENT_USER`,
          { sql: `GRANT ALL ON "${t}" TO PUBLIC`, tookEffect: `SELECT has_table_privilege('public', '"${t}"', 'TRUNCATE') AS yes` },
        ]),
        ...APPEND_ONLY.flatMap((t) => [`UPDATE "${t}" SET "${firstColumn.get(t)}" = "${firstColumn.get(t)}"`, `DELETE FROM "${t}"`]),
        `INSERT INTO "AuditLog" ("tableName", "operation", "txId") VALUES ('Reading', 'DELETE', 1)`,
        `SET session_replication_role = replica`,
        `SET LOCAL session_replication_role = replica`,
        `UPDATE "Result" SET value = value * 10 WHERE id = '${issuedResult}'`,
        `UPDATE "Reading" SET "createdAt" = now() - interval '1 year'`,
        `INSERT INTO "Signature" (id, "revisionId", "signerId", "signerRole", meaning) VALUES ('probe-signature', '${issued}', '${anyUser}', 'QA_MANAGER', 'added later')`,
        `UPDATE "CertificateRevision" SET reason = 'rewritten' WHERE id = '${issued}'`,
        `UPDATE "NumberSequence" SET "lastValue" = 0`,
        `CREATE TABLE public.probe_table (a int)`,
        `CREATE FUNCTION public.probe_fn() RETURNS int LANGUAGE sql AS 'SELECT 1'`,
        `CREATE TEMP TABLE "Reading" (id text); CREATE TRIGGER audit_row AFTER INSERT ON pg_temp."Reading" FOR EACH ROW EXECUTE FUNCTION public.seepline_audit_row('id')`,
        `ALTER ROLE CURRENT_USER SUPERUSER`,
        `COPY (SELECT 1) TO PROGRAM 'true'`,
        // On the embedded database every connection shares a superuser session, so switching role back is
        // possible there; on PostgreSQL the app's role is not a member of the owner (README, "Production").
        ...(embedded ? [] : [`SET ROLE ${OWNER_ROLE}`, `SET ROLE postgres`, `RESET ROLE; TRUNCATE "Reading"`]),
      ];
      const asApp: Attempt[] = [];
      // typed: a mix of plain statements and ones whose effect is checked
      for (const sql of statements) asApp.push(await attempt(app, sql));
      const asOwner: Attempt[] = [];
      for (const t of audited) asOwner.push(await attempt(owner, `TRUNCATE "${t}" CASCADE`, true));

      const allowed = [...asApp, ...asOwner].filter((a) => a.allowed).map((a) => a.sql);
      recordFigure("11-runtime-role", {
        label: "direct SQL as the app's role",
        values: { tables: tables.length, attempts: asApp.length, "owner TRUNCATEs": asOwner.length, allowed: allowed.length, ...(embedded ? { note: "embedded: SET ROLE not a boundary" } : {}) },
      });
      expect(allowed).toEqual([]);
      // Refused for the right reason (rights or the record's own rules), not by a slip in the statement.
      const otherReasons = [...asApp, ...asOwner].filter((a) => !a.allowed && !RIGHT_REASONS.test(a.message)).map((a) => `${a.sql}: ${a.message}`);
      expect(otherReasons).toEqual([]);
      expect(asOwner.every((a) => /append-only|refused/.test(a.message))).toBe(true);
    } finally {
      await Promise.all([app.end(), owner.end()]);
    }
  });
});
