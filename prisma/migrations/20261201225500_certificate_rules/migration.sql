-- AlterTable
ALTER TABLE "CertificateRevision" ADD COLUMN     "revokedAt" TIMESTAMP(3),
ADD COLUMN     "snapshot" JSONB,
ADD COLUMN     "supersededAt" TIMESTAMP(3);


-- A QA manager never approves their own test work: the database refuses it whatever the app does.
CREATE OR REPLACE FUNCTION seepline_review_not_own_work() RETURNS trigger
LANGUAGE plpgsql AS $$
DECLARE
  performer text;
BEGIN
  SELECT "performedById" INTO performer FROM "Run" WHERE id = NEW."runId";
  IF NEW."decision" = 'APPROVED' AND NEW."reviewerId" = performer THEN
    RAISE EXCEPTION 'a run cannot be approved by the person who performed it' USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN NEW;
END;
$$;
CREATE TRIGGER review_not_own_work BEFORE INSERT OR UPDATE ON "Review" FOR EACH ROW EXECUTE FUNCTION seepline_review_not_own_work();
CREATE TRIGGER review_append_only BEFORE UPDATE OR DELETE ON "Review" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();

CREATE OR REPLACE FUNCTION seepline_result_not_own_work() RETURNS trigger
LANGUAGE plpgsql AS $$
DECLARE
  performer text;
BEGIN
  SELECT "performedById" INTO performer FROM "Run" WHERE id = NEW."runId";
  IF NEW."approvedById" IS NOT NULL AND NEW."approvedById" = performer THEN
    RAISE EXCEPTION 'a result cannot be approved by the person who performed its run' USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN NEW;
END;
$$;
CREATE TRIGGER result_not_own_work BEFORE INSERT OR UPDATE ON "Result" FOR EACH ROW EXECUTE FUNCTION seepline_result_not_own_work();

-- An issued certificate revision cannot be changed or removed: the only change allowed is its status
-- moving from issued to superseded or revoked (with the matching time). Corrections are new revisions.
CREATE OR REPLACE FUNCTION seepline_issued_certificate_frozen() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    IF OLD."status" <> 'DRAFT' THEN
      RAISE EXCEPTION 'certificate revision % is issued and cannot be deleted', OLD."id" USING ERRCODE = 'insufficient_privilege';
    END IF;
    RETURN OLD;
  END IF;
  IF OLD."status" = 'DRAFT' THEN
    RETURN NEW;
  END IF;
  IF OLD."status" = 'ISSUED' AND NEW."status" IN ('SUPERSEDED', 'REVOKED')
     AND (to_jsonb(NEW) - ARRAY['status', 'supersededAt', 'revokedAt']) = (to_jsonb(OLD) - ARRAY['status', 'supersededAt', 'revokedAt']) THEN
    RETURN NEW;
  END IF;
  RAISE EXCEPTION 'certificate revision % is issued and cannot be changed; issue a new revision instead', OLD."id" USING ERRCODE = 'insufficient_privilege';
END;
$$;
CREATE TRIGGER certificate_revision_frozen BEFORE UPDATE OR DELETE ON "CertificateRevision" FOR EACH ROW EXECUTE FUNCTION seepline_issued_certificate_frozen();

-- The results and signatures of a certificate revision are fixed with it.
CREATE OR REPLACE FUNCTION seepline_revision_parts_frozen() RETURNS trigger
LANGUAGE plpgsql AS $$
DECLARE
  revision_status text;
BEGIN
  SELECT "status" INTO revision_status FROM "CertificateRevision" WHERE id = COALESCE(NEW."revisionId", OLD."revisionId");
  IF revision_status IS DISTINCT FROM 'DRAFT' AND (TG_OP <> 'INSERT' OR revision_status <> 'ISSUED' OR TG_TABLE_NAME <> 'Signature') THEN
    RAISE EXCEPTION 'the parts of an issued certificate revision cannot be changed' USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN COALESCE(NEW, OLD);
END;
$$;
CREATE TRIGGER certificate_result_frozen BEFORE INSERT OR UPDATE OR DELETE ON "CertificateResult" FOR EACH ROW EXECUTE FUNCTION seepline_revision_parts_frozen();
CREATE TRIGGER signature_frozen BEFORE UPDATE OR DELETE ON "Signature" FOR EACH ROW EXECUTE FUNCTION seepline_revision_parts_frozen();
