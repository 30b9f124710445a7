import type { PGlite } from "@electric-sql/pglite";
import { APP_ROLE, OWNER_ROLE, RUNTIME_GROUP } from "./database-roles";

/*
 * The embedded database (PGlite 0.5 over pglite-socket 0.2) and roles, as found by trying it:
 * - PGlite runs one single-user backend whose session user is the bootstrap superuser `postgres`;
 *   pglite-socket feeds every client connection into that one session. The user name and password a
 *   client sends are ignored, and session settings such as SET ROLE are shared by all connections.
 * - So the roles can be created and used (SET ROLE makes the migration owner own what migrations create,
 *   and makes every query the app sends run with the runtime role's rights: TRUNCATE, ALTER TABLE ...
 *   DISABLE TRIGGER, session_replication_role and AuditLog writes are refused), but they are no security
 *   boundary there: SQL that says RESET ROLE is the superuser again. Real separation needs PostgreSQL,
 *   where each role signs in on its own (README, "Production").
 */

/** Creates the roles and hands the schema to the owner; ends with the session acting as the app role. */
export async function prepareEmbeddedRoles(db: PGlite): Promise<void> {
  await db.exec(`
    RESET ROLE;
    DO $$
    BEGIN
      IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '${OWNER_ROLE}') THEN CREATE ROLE ${OWNER_ROLE} NOLOGIN; END IF;
      IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '${RUNTIME_GROUP}') THEN CREATE ROLE ${RUNTIME_GROUP} NOLOGIN; END IF;
      IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '${APP_ROLE}') THEN CREATE ROLE ${APP_ROLE} LOGIN INHERIT; END IF;
    END;
    $$;
    GRANT ${RUNTIME_GROUP} TO ${APP_ROLE};
    DO $$ BEGIN EXECUTE format('ALTER DATABASE %I OWNER TO ${OWNER_ROLE}', current_database()); END; $$;
    ALTER SCHEMA public OWNER TO ${OWNER_ROLE};
  `);
  await adoptObjects(db);
  await db.exec(`SET ROLE ${APP_ROLE}`);
}

// A data folder made before the roles existed has its tables, types and functions owned by `postgres`.
async function adoptObjects(db: PGlite): Promise<void> {
  await db.exec(`
    DO $$
    DECLARE
      r record;
    BEGIN
      FOR r IN SELECT c.oid::regclass AS name FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
               WHERE n.nspname = 'public' AND c.relkind IN ('r', 'p', 'v') AND pg_get_userbyid(c.relowner) <> '${OWNER_ROLE}' LOOP
        EXECUTE format('ALTER TABLE %s OWNER TO ${OWNER_ROLE}', r.name);
      END LOOP;
      -- Sequences of serial columns moved with their tables; this catches any other.
      FOR r IN SELECT c.oid::regclass AS name FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
               WHERE n.nspname = 'public' AND c.relkind = 'S' AND pg_get_userbyid(c.relowner) <> '${OWNER_ROLE}' LOOP
        EXECUTE format('ALTER SEQUENCE %s OWNER TO ${OWNER_ROLE}', r.name);
      END LOOP;
      FOR r IN SELECT p.oid::regprocedure AS name FROM pg_proc p JOIN pg_namespace n ON n.oid = p.pronamespace
               WHERE n.nspname = 'public' AND pg_get_userbyid(p.proowner) <> '${OWNER_ROLE}' LOOP
        EXECUTE format('ALTER FUNCTION %s OWNER TO ${OWNER_ROLE}', r.name);
      END LOOP;
      FOR r IN SELECT t.oid::regtype AS name FROM pg_type t JOIN pg_namespace n ON n.oid = t.typnamespace
               WHERE n.nspname = 'public' AND t.typtype = 'e' AND pg_get_userbyid(t.typowner) <> '${OWNER_ROLE}' LOOP
        EXECUTE format('ALTER TYPE %s OWNER TO ${OWNER_ROLE}', r.name);
      END LOOP;
    END;
    $$;
  `);
}
