-- Timestamp columns are `timestamp without time zone` holding UTC (Prisma reads and writes them as UTC).
-- What the database fills in itself must be UTC too, whatever the TimeZone of the session that caused it:
-- the app's connections ask for UTC (lib/server/db/utc-session.ts), but a session that does not (psql on a
-- server set to local time) would otherwise store local time in the audit trail and in column defaults.

-- 1. The audit trigger: the same function as 20261202080000, with the time taken in UTC.
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
  VALUES (clock_timestamp() AT TIME ZONE 'UTC', nullif(current_setting('seepline.actor_id', true), ''), TG_TABLE_NAME,
          row_key, TG_OP, old_row, new_row, txid_current());
  RETURN NULL;
END;
$$;
REVOKE EXECUTE ON FUNCTION seepline_audit_row() FROM PUBLIC;

-- 2. Column defaults (Prisma's @default(now()) is CURRENT_TIMESTAMP, turned into local time by the session):
--    every such column of the app's tables takes the current time in UTC instead.
DO $$
DECLARE
  c record;
BEGIN
  FOR c IN
    SELECT table_name, column_name FROM information_schema.columns
    WHERE table_schema = 'public' AND data_type = 'timestamp without time zone' AND column_default = 'CURRENT_TIMESTAMP'
  LOOP
    EXECUTE format('ALTER TABLE %I ALTER COLUMN %I SET DEFAULT (CURRENT_TIMESTAMP AT TIME ZONE ''UTC'')', c.table_name, c.column_name);
  END LOOP;
END;
$$;
