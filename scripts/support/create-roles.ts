import { randomBytes } from "node:crypto";
import pg from "pg";
import { APP_ROLE, ensureRoles, OWNER_ROLE, urlAs } from "./database-roles";

/**
 * `npm run db:create-roles -- postgresql://admin@db.internal:5432/seepline`: on a production server, as a
 * user allowed to create roles, creates the migration owner and the app's runtime role with new passwords,
 * hands the (empty or already Seepline's) database to the owner, and prints the two addresses to configure.
 */
export async function createRoles(adminUrl: string | undefined): Promise<void> {
  if (!adminUrl) throw new Error("give the address of the database as a user allowed to create roles, e.g. postgresql://postgres@db.internal:5432/seepline");
  const passwords = { owner: randomBytes(18).toString("base64url"), app: randomBytes(18).toString("base64url") };
  await ensureRoles(adminUrl, passwords);

  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  let others: string[];
  try {
    const database = (await client.query<{ name: string }>("SELECT current_database() AS name")).rows[0]!.name;
    await client.query(`ALTER DATABASE "${database.replace(/"/g, '""')}" OWNER TO ${OWNER_ROLE}`);
    await client.query(`ALTER SCHEMA public OWNER TO ${OWNER_ROLE}`);
    const { rows } = await client.query<{ owner: string }>(
      `SELECT DISTINCT pg_get_userbyid(c.relowner) AS owner FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
       WHERE n.nspname = 'public' AND c.relkind = 'r' AND pg_get_userbyid(c.relowner) <> $1`,
      [OWNER_ROLE],
    );
    others = rows.map((r) => r.owner);
  } finally {
    await client.end();
  }

  const lines = [
    `Roles ready: ${OWNER_ROLE} (migrations) and ${APP_ROLE} (the app, member of seepline_runtime). New passwords were set.`,
    "",
    `  MIGRATION_DATABASE_URL=${urlAs(adminUrl, OWNER_ROLE, passwords.owner)}`,
    `  DATABASE_URL=${urlAs(adminUrl, APP_ROLE, passwords.app)}`,
    "",
    "Keep both secret; give every app instance the same two values.",
  ];
  if (others.length > 0)
    lines.push("", `Some tables belong to ${others.join(", ")}. Hand them over once, as their owner or a superuser: ${others.map((o) => `REASSIGN OWNED BY "${o}" TO ${OWNER_ROLE};`).join(" ")}`);
  console.log(lines.join("\n"));
}
