-- AlterTable
ALTER TABLE "CertificateDraftContent" ADD COLUMN     "indexResultIds" TEXT[] DEFAULT ARRAY[]::TEXT[];

-- CreateTable
CREATE TABLE "CertificateIndexResult" (
    "revisionId" TEXT NOT NULL,
    "indexTestResultId" TEXT NOT NULL,

    CONSTRAINT "CertificateIndexResult_pkey" PRIMARY KEY ("revisionId","indexTestResultId")
);

-- AddForeignKey
ALTER TABLE "CertificateIndexResult" ADD CONSTRAINT "CertificateIndexResult_revisionId_fkey" FOREIGN KEY ("revisionId") REFERENCES "CertificateRevision"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CertificateIndexResult" ADD CONSTRAINT "CertificateIndexResult_indexTestResultId_fkey" FOREIGN KEY ("indexTestResultId") REFERENCES "IndexTestResult"("id") ON DELETE RESTRICT ON UPDATE CASCADE;


-- ---------------------------------------------------------------- hand-written: rules the app cannot get round

-- Index-test results on a certificate are kept like run results: offered to a revision once (never changed or
-- removed), only while it is a draft; the draft content's indexResultIds says which are included.
REVOKE UPDATE, DELETE, TRUNCATE ON "CertificateIndexResult" FROM seepline_runtime;
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "CertificateIndexResult" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('revisionId,indexTestResultId');
CREATE TRIGGER refuse_truncate BEFORE TRUNCATE ON "CertificateIndexResult" FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER certificate_index_result_frozen BEFORE INSERT OR UPDATE OR DELETE ON "CertificateIndexResult" FOR EACH ROW EXECUTE FUNCTION seepline_revision_parts_frozen();

-- Whether a revision includes an index-test result: the newest content version decides (none: all on it).
CREATE OR REPLACE FUNCTION seepline_revision_includes_index(revision_id text, index_result_id text) RETURNS boolean
LANGUAGE sql STABLE AS $$
  SELECT COALESCE(
    (SELECT index_result_id = ANY (d."indexResultIds") FROM "CertificateDraftContent" d WHERE d."revisionId" = revision_id ORDER BY d."version" DESC LIMIT 1),
    true)
$$;

-- The certificate other than `own_certificate` whose live revision includes the index-test result, or null.
-- Locks the result's row first (owner's rights: the runtime role may not update it), so two drafts taking
-- the same result at once are decided one after the other.
CREATE OR REPLACE FUNCTION seepline_live_index_holder(index_result_id text, own_certificate text) RETURNS text
LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $$
DECLARE
  holder text;
BEGIN
  PERFORM 1 FROM "IndexTestResult" WHERE id = index_result_id FOR NO KEY UPDATE;
  SELECT c."number" INTO holder
  FROM "CertificateIndexResult" cr
  JOIN "CertificateRevision" r ON r.id = cr."revisionId"
  JOIN "Certificate" c ON c.id = r."certificateId"
  WHERE cr."indexTestResultId" = index_result_id AND r."certificateId" <> own_certificate AND r."status" IN ('DRAFT', 'ISSUED')
    AND seepline_revision_includes_index(r.id, index_result_id)
  LIMIT 1;
  RETURN holder;
END;
$$;
REVOKE EXECUTE ON FUNCTION seepline_live_index_holder(text, text) FROM PUBLIC;

CREATE OR REPLACE FUNCTION seepline_index_result_on_one_live_certificate() RETURNS trigger
LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $$
DECLARE
  own_certificate text;
  holder text;
BEGIN
  SELECT "certificateId" INTO own_certificate FROM "CertificateRevision" WHERE id = NEW."revisionId";
  holder := seepline_live_index_holder(NEW."indexTestResultId", own_certificate);
  IF holder IS NOT NULL THEN
    RAISE EXCEPTION 'result_on_live_certificate: index-test result % is already on certificate %', NEW."indexTestResultId", holder
      USING ERRCODE = 'unique_violation', CONSTRAINT = 'result_on_one_live_certificate';
  END IF;
  RETURN NEW;
END;
$$;
REVOKE EXECUTE ON FUNCTION seepline_index_result_on_one_live_certificate() FROM PUBLIC;
CREATE TRIGGER index_result_on_one_live_certificate BEFORE INSERT ON "CertificateIndexResult"
  FOR EACH ROW EXECUTE FUNCTION seepline_index_result_on_one_live_certificate();

-- A draft content version includes only index-test results offered to its revision and free of other live certificates.
CREATE OR REPLACE FUNCTION seepline_draft_content_index_results_free() RETURNS trigger
LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $$
DECLARE
  own_certificate text;
  index_result_id text;
  holder text;
BEGIN
  SELECT "certificateId" INTO own_certificate FROM "CertificateRevision" WHERE id = NEW."revisionId";
  FOREACH index_result_id IN ARRAY COALESCE(NEW."indexResultIds", ARRAY[]::text[]) LOOP
    IF NOT EXISTS (SELECT 1 FROM "CertificateIndexResult" WHERE "revisionId" = NEW."revisionId" AND "indexTestResultId" = index_result_id) THEN
      RAISE EXCEPTION 'a draft includes only index-test results on its revision (%)', index_result_id USING ERRCODE = 'foreign_key_violation';
    END IF;
    holder := seepline_live_index_holder(index_result_id, own_certificate);
    IF holder IS NOT NULL THEN
      RAISE EXCEPTION 'result_on_live_certificate: index-test result % is already on certificate %', index_result_id, holder
        USING ERRCODE = 'unique_violation', CONSTRAINT = 'result_on_one_live_certificate';
    END IF;
  END LOOP;
  RETURN NEW;
END;
$$;
REVOKE EXECUTE ON FUNCTION seepline_draft_content_index_results_free() FROM PUBLIC;
CREATE TRIGGER draft_content_index_results_free BEFORE INSERT ON "CertificateDraftContent" FOR EACH ROW EXECUTE FUNCTION seepline_draft_content_index_results_free();

-- Editions of the index-test standards as the lab first installs them (from memory; the lab corrects them to
-- the editions it actually holds), so a certificate names the edition of every method it reports.
UPDATE "TestMethod" SET "edition" = 'D5890-19' WHERE "code" = 'D5890' AND "edition" = '';
UPDATE "TestMethod" SET "edition" = 'D5891/D5891M-19' WHERE "code" = 'D5891' AND "edition" = '';
UPDATE "TestMethod" SET "edition" = 'D5993-18' WHERE "code" = 'D5993' AND "edition" = '';
UPDATE "TestMethod" SET "edition" = 'D2216-19' WHERE "code" = 'D2216' AND "edition" = '';
UPDATE "TestMethod" SET "edition" = 'D6768/D6768M-20' WHERE "code" = 'D6768' AND "edition" = '';
UPDATE "TestMethod" SET "edition" = 'D6496/D6496M-20' WHERE "code" = 'D6496' AND "edition" = '';
