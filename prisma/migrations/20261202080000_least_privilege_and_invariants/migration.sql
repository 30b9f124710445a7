-- Least privilege, protected records and invariants kept by the database (README "Production", DEVELOPERS
-- "Records the database protects"). This migration runs as the migration owner, which owns every table;
-- the app connects as a login role that is a member of seepline_runtime and owns nothing.

-- Addresses an account signed in from (lib/policy/sign-in-throttle.ts).
CREATE TABLE "SignInKnownAddress" (
    "accountEmail" TEXT NOT NULL,
    "address" TEXT NOT NULL,
    "lastSuccessAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "SignInKnownAddress_pkey" PRIMARY KEY ("accountEmail","address")
);

-- 1. The runtime group role. Creating it needs CREATEROLE; a server where the migration owner lacks that
--    right has it created beforehand (npm run db:create-roles, or by hand as the README shows).
DO $$
BEGIN
  IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'seepline_runtime') THEN
    BEGIN
      CREATE ROLE seepline_runtime NOLOGIN;
    EXCEPTION WHEN insufficient_privilege THEN
      RAISE EXCEPTION 'the role seepline_runtime does not exist and % may not create it: create it first (README, "Production")', current_user;
    END;
  END IF;
END;
$$;

-- 2. What the runtime role may do: read everything, write records, delete nothing but throttle counters,
--    never TRUNCATE, never own anything (so it cannot ALTER, disable triggers or drop). Tables added by later
--    migrations get the same default rights; a migration that needs a narrower rule revokes, as below.
REVOKE CREATE ON SCHEMA public FROM PUBLIC;
GRANT USAGE ON SCHEMA public TO seepline_runtime;
REVOKE ALL ON ALL TABLES IN SCHEMA public FROM seepline_runtime;
GRANT SELECT, INSERT, UPDATE ON ALL TABLES IN SCHEMA public TO seepline_runtime;
GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA public TO seepline_runtime;
ALTER DEFAULT PRIVILEGES IN SCHEMA public GRANT SELECT, INSERT, UPDATE ON TABLES TO seepline_runtime;
ALTER DEFAULT PRIVILEGES IN SCHEMA public GRANT USAGE, SELECT ON SEQUENCES TO seepline_runtime;

-- Written only by the audit triggers and by the migration step.
REVOKE INSERT, UPDATE ON "AuditLog", "_prisma_migrations" FROM seepline_runtime;
REVOKE USAGE, SELECT ON SEQUENCE "AuditLog_id_seq" FROM seepline_runtime;
-- Records that are only ever added to.
REVOKE UPDATE ON "CustodyEvent", "Reading", "Review", "CalibrationOverride", "Result", "Signature", "CertificateResult" FROM seepline_runtime;
-- Failed sign-in counters are the one thing the app removes (on success, or an administrator's reset).
GRANT DELETE ON "SignInThrottle" TO seepline_runtime;

-- 3. The audit trigger writes AuditLog with the owner's rights, so the runtime role needs none there. Its
--    search_path is pinned, it refuses to run for tables outside the app's schema (a temporary table of the
--    same name), and nobody but the owner may attach it to a table.
CREATE OR REPLACE FUNCTION seepline_audit_row() RETURNS trigger
LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $$
DECLARE
  old_row jsonb;
  new_row jsonb;
  key_row jsonb;
  row_key text;
  key_columns text[] := string_to_array(coalesce(TG_ARGV[0], 'id'), ',');
  secret_columns text[] := ARRAY['passwordHash', 'tokenHash', 'data', 'pdf'];
BEGIN
  IF TG_TABLE_SCHEMA <> 'public' THEN
    RAISE EXCEPTION 'the audit trigger only records the app''s own tables' USING ERRCODE = 'insufficient_privilege';
  END IF;
  IF TG_OP <> 'INSERT' THEN old_row := to_jsonb(OLD) - secret_columns; END IF;
  IF TG_OP <> 'DELETE' THEN new_row := to_jsonb(NEW) - secret_columns; END IF;
  key_row := coalesce(new_row, old_row);
  SELECT string_agg(key_row ->> k, ':') INTO row_key FROM unnest(key_columns) AS k;
  INSERT INTO "AuditLog" ("occurredAt", "actorId", "tableName", "rowId", "operation", "before", "after", "txId")
  VALUES (clock_timestamp(), nullif(current_setting('seepline.actor_id', true), ''), TG_TABLE_NAME, row_key,
          TG_OP, old_row, new_row, txid_current());
  RETURN NULL;
END;
$$;
REVOKE EXECUTE ON FUNCTION seepline_audit_row() FROM PUBLIC;

-- 4. Protected records refuse TRUNCATE, whoever asks (the owner included): every audited table, which is
--    every record table. The runtime role has no TRUNCATE right in the first place.
DO $$
DECLARE
  t record;
BEGIN
  FOR t IN
    SELECT c.relname FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
    WHERE n.nspname = 'public' AND c.relkind = 'r'
      AND EXISTS (SELECT 1 FROM pg_trigger g WHERE g.tgrelid = c.oid AND g.tgname = 'audit_row')
      AND NOT EXISTS (SELECT 1 FROM pg_trigger g WHERE g.tgrelid = c.oid AND (g.tgtype & 32) <> 0)
  LOOP
    EXECUTE format('CREATE TRIGGER refuse_truncate BEFORE TRUNCATE ON %I FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change()', t.relname);
  END LOOP;
END;
$$;

-- 5. Readings are original observations: no column of a saved reading changes, its timestamps included.
CREATE OR REPLACE FUNCTION seepline_reading_unchanged() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'a saved reading is an original observation and cannot be changed; record a correction instead'
    USING ERRCODE = 'insufficient_privilege';
END;
$$;

-- Results and signatures are kept like readings: added, never changed or removed.
CREATE TRIGGER result_append_only BEFORE UPDATE OR DELETE ON "Result" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
DROP TRIGGER signature_frozen ON "Signature";
CREATE TRIGGER signature_append_only BEFORE UPDATE OR DELETE ON "Signature" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();

-- A revision's results and signature are added while it is a draft; once issued nothing joins it.
CREATE OR REPLACE FUNCTION seepline_revision_parts_frozen() RETURNS trigger
LANGUAGE plpgsql AS $$
DECLARE
  revision_status text;
BEGIN
  SELECT "status" INTO revision_status FROM "CertificateRevision" WHERE id = COALESCE(NEW."revisionId", OLD."revisionId");
  IF revision_status IS DISTINCT FROM 'DRAFT' THEN
    RAISE EXCEPTION 'the parts of an issued certificate revision cannot be changed' USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN COALESCE(NEW, OLD);
END;
$$;
CREATE TRIGGER signature_on_draft_only BEFORE INSERT ON "Signature" FOR EACH ROW EXECUTE FUNCTION seepline_revision_parts_frozen();

-- 6. At most one run holds a cell, and a specimen is in at most one running test. The states are those in
--    which a run holds its cell (lib/runs/run-state-machine.ts, holdsCell); keep the two lists in step.
CREATE UNIQUE INDEX run_one_active_per_cell ON "Run" ("cellId")
  WHERE "state" IN ('SET_UP', 'SATURATING', 'EQUILIBRATING', 'PERMEATING');
CREATE UNIQUE INDEX run_one_active_per_specimen ON "Run" ("specimenId")
  WHERE "state" IN ('SET_UP', 'SATURATING', 'EQUILIBRATING', 'PERMEATING');

-- 7. A result is on at most one live certificate (one with a draft or issued revision); revisions of the
--    same certificate carry it on. The result's row is locked first, so two drafts taking the same result
--    at once are decided one after the other, and the second sees the first. Runs with the owner's rights
--    because taking a row lock needs an UPDATE right the runtime role does not have on results.
CREATE OR REPLACE FUNCTION seepline_result_on_one_live_certificate() RETURNS trigger
LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $$
DECLARE
  own_certificate text;
  holder text;
BEGIN
  PERFORM 1 FROM "Result" WHERE id = NEW."resultId" FOR NO KEY UPDATE;
  SELECT "certificateId" INTO own_certificate FROM "CertificateRevision" WHERE id = NEW."revisionId";
  SELECT c."number" INTO holder
  FROM "CertificateResult" cr
  JOIN "CertificateRevision" r ON r.id = cr."revisionId"
  JOIN "Certificate" c ON c.id = r."certificateId"
  WHERE cr."resultId" = NEW."resultId" AND r."certificateId" <> own_certificate AND r."status" IN ('DRAFT', 'ISSUED')
  LIMIT 1;
  IF holder IS NOT NULL THEN
    RAISE EXCEPTION 'result_on_live_certificate: result % is already on certificate %', NEW."resultId", holder
      USING ERRCODE = 'unique_violation', CONSTRAINT = 'result_on_one_live_certificate';
  END IF;
  RETURN NEW;
END;
$$;
REVOKE EXECUTE ON FUNCTION seepline_result_on_one_live_certificate() FROM PUBLIC;
CREATE TRIGGER result_on_one_live_certificate BEFORE INSERT ON "CertificateResult"
  FOR EACH ROW EXECUTE FUNCTION seepline_result_on_one_live_certificate();
