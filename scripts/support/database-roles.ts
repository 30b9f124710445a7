import pg from "pg";

/**
 * The two database roles of Seepline (README, "Production"):
 * - the migration owner owns the schema and every table; only the migration step connects as it;
 * - the app connects as a login role that is a member of the group role `seepline_runtime`, owns nothing
 *   and holds only the rights the migrations grant that group (no TRUNCATE, no AuditLog writes, no DDL).
 * The group role's name is fixed because the migrations grant to it; the login names are free.
 */
export const OWNER_ROLE = "seepline_owner";
export const RUNTIME_GROUP = "seepline_runtime";
export const APP_ROLE = "seepline_app";

export type RoleUrls = { ownerUrl: string; appUrl: string };

/** The same server and database as `url`, signed in as `user` (with `password` when given). */
export function urlAs(url: string, user: string, password?: string): string {
  const next = new URL(url);
  next.username = user;
  next.password = password ?? "";
  return next.toString();
}

/** The same server as `url`, database `name`. */
export function urlOfDatabase(url: string, name: string): string {
  const next = new URL(url);
  next.pathname = `/${name}`;
  return next.toString();
}

async function withClient<T>(url: string, work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

const quoteLiteral = (text: string) => `'${text.replace(/'/g, "''")}'`;

/**
 * Creates the three roles on a PostgreSQL server when absent, as a user allowed to create roles; gives
 * the login roles the passwords given (when given). Safe to run from several processes at once.
 */
export async function ensureRoles(adminUrl: string, passwords: { owner?: string; app?: string } = {}): Promise<void> {
  await withClient(adminUrl, async (client) => {
    // Role names are global to the server; the lock keeps two test runs from creating them together.
    await client.query("SELECT pg_advisory_lock(hashtext('seepline:ensure-roles'))");
    try {
      const exists = async (name: string) => (await client.query("SELECT 1 FROM pg_roles WHERE rolname = $1", [name])).rowCount === 1;
      if (!(await exists(OWNER_ROLE))) await client.query(`CREATE ROLE ${OWNER_ROLE} LOGIN NOSUPERUSER NOCREATEDB NOCREATEROLE`);
      if (!(await exists(RUNTIME_GROUP))) await client.query(`CREATE ROLE ${RUNTIME_GROUP} NOLOGIN NOSUPERUSER NOCREATEDB NOCREATEROLE`);
      if (!(await exists(APP_ROLE))) await client.query(`CREATE ROLE ${APP_ROLE} LOGIN NOSUPERUSER NOCREATEDB NOCREATEROLE INHERIT`);
      await client.query(`GRANT ${RUNTIME_GROUP} TO ${APP_ROLE}`);
      if (passwords.owner) await client.query(`ALTER ROLE ${OWNER_ROLE} PASSWORD ${quoteLiteral(passwords.owner)}`);
      if (passwords.app) await client.query(`ALTER ROLE ${APP_ROLE} PASSWORD ${quoteLiteral(passwords.app)}`);
    } finally {
      await client.query("SELECT pg_advisory_unlock(hashtext('seepline:ensure-roles'))");
    }
  });
}

/** Creates an empty database owned by the migration owner (who may then create tables in its public schema). */
export async function createOwnedDatabase(adminUrl: string, name: string): Promise<void> {
  if (!/^[a-z0-9_]+$/.test(name)) throw new Error(`database name ${name} must be lower-case letters, digits and _`);
  await withClient(adminUrl, (client) => client.query(`CREATE DATABASE "${name}" OWNER ${OWNER_ROLE}`));
  // PostgreSQL 15 gives the public schema to the database owner; older servers need it said.
  await withClient(urlOfDatabase(adminUrl, name), (client) => client.query(`ALTER SCHEMA public OWNER TO ${OWNER_ROLE}`));
}

export type RoleReport = { role: string; superuser: boolean; ownsTables: boolean; canCreateRoles: boolean };

/** What the role behind `url` may do, to refuse serving the app as the owner or a superuser. */
export async function describeRole(url: string): Promise<RoleReport> {
  return withClient(url, async (client) => {
    const { rows } = await client.query<RoleReport>(`
      SELECT current_user AS role, r.rolsuper AS superuser, r.rolcreaterole AS "canCreateRoles",
             EXISTS (SELECT 1 FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
                     WHERE n.nspname = 'public' AND c.relkind = 'r' AND pg_has_role(current_user, c.relowner, 'USAGE')) AS "ownsTables"
      FROM pg_roles r WHERE r.rolname = current_user`);
    return rows[0]!;
  });
}
