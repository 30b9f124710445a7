-- Audit trail kept by the database itself, so that no code path can change a record without leaving a trace.
-- The app names the acting user per transaction with set_config('seepline.actor_id', <user id>, true).

CREATE OR REPLACE FUNCTION seepline_audit_row() RETURNS trigger
LANGUAGE plpgsql AS $$
DECLARE
  old_row jsonb;
  new_row jsonb;
  key_row jsonb;
  row_key text;
  key_columns text[] := string_to_array(coalesce(TG_ARGV[0], 'id'), ',');
  secret_columns text[] := ARRAY['passwordHash', 'tokenHash', 'data', 'pdf'];
BEGIN
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

CREATE OR REPLACE FUNCTION seepline_refuse_change() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION '% rows are append-only: % is refused', TG_TABLE_NAME, TG_OP
    USING ERRCODE = 'insufficient_privilege';
END;
$$;

-- Append-only tables: the audit log itself and the custody ledger.
CREATE TRIGGER audit_log_append_only BEFORE UPDATE OR DELETE ON "AuditLog"
  FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER audit_log_no_truncate BEFORE TRUNCATE ON "AuditLog"
  FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER custody_event_append_only BEFORE UPDATE OR DELETE ON "CustodyEvent"
  FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER custody_event_no_truncate BEFORE TRUNCATE ON "CustodyEvent"
  FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change();

-- Lab numbers are never reused: a counter may only go up and is never removed.
CREATE OR REPLACE FUNCTION seepline_number_only_up() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' OR NEW."lastValue" < OLD."lastValue" THEN
    RAISE EXCEPTION 'lab number counter % may only increase', OLD."key" USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN NEW;
END;
$$;
CREATE TRIGGER number_sequence_only_up BEFORE UPDATE OR DELETE ON "NumberSequence"
  FOR EACH ROW EXECUTE FUNCTION seepline_number_only_up();

-- Record tables whose every insert, update and delete is audited.
DO $$
DECLARE
  t record;
BEGIN
  FOR t IN SELECT * FROM (VALUES
    ('User', 'id'), ('ApiToken', 'id'), ('Laboratory', 'id'), ('NumberSequence', 'key'),
    ('ClientOrganization', 'id'), ('Project', 'id'), ('Specification', 'id'), ('SpecificationLimit', 'id'),
    ('TestMethod', 'code'), ('StorageLocation', 'id'), ('Shipment', 'id'), ('ShipmentPhoto', 'id'),
    ('Roll', 'id'), ('Coupon', 'id'), ('Specimen', 'id'), ('SpecimenChecklistItem', 'id'),
    ('CustodyEvent', 'id'), ('Correction', 'id'), ('IndexTest', 'id'), ('Equipment', 'id'),
    ('Calibration', 'id'), ('Run', 'id'), ('RunEquipment', 'runId,equipmentId'), ('RunStage', 'id'),
    ('Reading', 'id'), ('Review', 'id'), ('Result', 'id'), ('Certificate', 'id'),
    ('CertificateRevision', 'id'), ('CertificateResult', 'revisionId,resultId'), ('Signature', 'id')
  ) AS v(table_name, key_columns) LOOP
    EXECUTE format(
      'CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON %I FOR EACH ROW EXECUTE FUNCTION seepline_audit_row(%L)',
      t.table_name, t.key_columns);
  END LOOP;
END;
$$;

-- Integrity rules that the schema language cannot state.
ALTER TABLE "User" ADD CONSTRAINT user_client_has_organization
  CHECK (("role" = 'CLIENT_USER') = ("clientOrganizationId" IS NOT NULL));
ALTER TABLE "CustodyEvent" ADD CONSTRAINT custody_event_one_item
  CHECK (num_nonnulls("rollId", "couponId", "specimenId") = 1);
ALTER TABLE "Reading" ADD CONSTRAINT reading_elapsed_not_negative CHECK ("elapsedS" >= 0);
ALTER TABLE "Calibration" ADD CONSTRAINT calibration_due_after_done CHECK ("dueAt" >= "calibratedAt");
