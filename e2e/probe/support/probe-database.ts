import { randomUUID } from "node:crypto";
import pg from "pg";
import { inject } from "vitest";

/** One query on the app's database as its runtime role (what the app itself may see). */
export async function query<T extends pg.QueryResultRow>(sql: string, values: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString: inject("appDatabaseUrl") });
  await client.connect();
  try {
    return (await client.query<T>(sql, values)).rows;
  } finally {
    await client.end();
  }
}

/** The first value of the first row, or `fallback`. */
export async function one(sql: string, fallback: string, values: unknown[] = []): Promise<string> {
  const rows = await query<{ v: string }>(sql, values);
  return rows[0]?.v ?? fallback;
}

/** A new user of the app's database with a known password, for probes that must not disturb the demo people. */
export async function makeProbeUser(role: string, label: string, options: { organizationCode?: string; password?: string } = {}): Promise<{ id: string; email: string; password: string }> {
  const { default: bcrypt } = await import("bcryptjs");
  const password = options.password ?? "probe password 123";
  const email = `${label}-${randomUUID().slice(0, 8)}@probe.test`;
  const id = randomUUID();
  const org = options.organizationCode ? await one(`SELECT id AS v FROM "ClientOrganization" WHERE code = $1`, "", [options.organizationCode]) : null;
  await query(
    `INSERT INTO "User" (id, email, name, "passwordHash", role, "clientOrganizationId", "updatedAt") VALUES ($1, $2, $3, $4, $5::"Role", $6, now())`,
    [id, email, `Probe ${label}`, await bcrypt.hash(password, 10), role, org || null],
  );
  return { id, email, password };
}
