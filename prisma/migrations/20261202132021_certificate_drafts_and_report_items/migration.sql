
-- CreateEnum
CREATE TYPE "ResultUnitSystem" AS ENUM ('SI', 'CENTIMETRE');

-- AlterTable
ALTER TABLE "User" ADD COLUMN     "resultUnits" "ResultUnitSystem" NOT NULL DEFAULT 'SI';

-- AlterTable
ALTER TABLE "Specification" ADD COLUMN     "revision" TEXT NOT NULL DEFAULT '';

-- AlterTable
ALTER TABLE "TestMethod" ADD COLUMN     "edition" TEXT NOT NULL DEFAULT '';

-- CreateTable
CREATE TABLE "CertificateDraftContent" (
    "id" TEXT NOT NULL,
    "revisionId" TEXT NOT NULL,
    "version" INTEGER NOT NULL,
    "resultIds" TEXT[],
    "specificationId" TEXT,
    "remarks" TEXT NOT NULL DEFAULT '',
    "signatoryId" TEXT,
    "unitSystem" "ResultUnitSystem" NOT NULL DEFAULT 'SI',
    "createdById" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "CertificateDraftContent_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE UNIQUE INDEX "CertificateDraftContent_revisionId_version_key" ON "CertificateDraftContent"("revisionId", "version");

-- AddForeignKey
ALTER TABLE "CertificateDraftContent" ADD CONSTRAINT "CertificateDraftContent_revisionId_fkey" FOREIGN KEY ("revisionId") REFERENCES "CertificateRevision"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CertificateDraftContent" ADD CONSTRAINT "CertificateDraftContent_specificationId_fkey" FOREIGN KEY ("specificationId") REFERENCES "Specification"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CertificateDraftContent" ADD CONSTRAINT "CertificateDraftContent_signatoryId_fkey" FOREIGN KEY ("signatoryId") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CertificateDraftContent" ADD CONSTRAINT "CertificateDraftContent_createdById_fkey" FOREIGN KEY ("createdById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- ---------------------------------------------------------------- hand-written: rules the app cannot get round

ALTER TABLE "CertificateDraftContent" ALTER COLUMN "createdAt" SET DEFAULT (CURRENT_TIMESTAMP AT TIME ZONE 'UTC');
ALTER TABLE "CertificateDraftContent" ADD CONSTRAINT "CertificateDraftContent_version_positive" CHECK ("version" >= 1);

-- A draft's content is a list of versions: added, never changed or removed, and only while the revision is a draft.
REVOKE UPDATE, DELETE, TRUNCATE ON "CertificateDraftContent" FROM seepline_runtime;
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "CertificateDraftContent" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('id');
CREATE TRIGGER refuse_truncate BEFORE TRUNCATE ON "CertificateDraftContent" FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER draft_content_append_only BEFORE UPDATE OR DELETE ON "CertificateDraftContent" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER draft_content_on_draft_only BEFORE INSERT ON "CertificateDraftContent" FOR EACH ROW EXECUTE FUNCTION seepline_revision_parts_frozen();

-- Whether a revision includes a result: the newest content version decides; a revision without content
-- versions (drafted before they existed) includes every result on it.
CREATE OR REPLACE FUNCTION seepline_revision_includes(revision_id text, result_id text) RETURNS boolean
LANGUAGE sql STABLE AS $$
  SELECT COALESCE(
    (SELECT result_id = ANY (d."resultIds") FROM "CertificateDraftContent" d WHERE d."revisionId" = revision_id ORDER BY d."version" DESC LIMIT 1),
    true)
$$;

-- The certificate other than `own_certificate` whose live revision includes the result, or null. Locks the
-- result's row first, so two drafts taking the same result at once are decided one after the other.
CREATE OR REPLACE FUNCTION seepline_live_holder(result_id text, own_certificate text) RETURNS text
LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $$
DECLARE
  holder text;
BEGIN
  PERFORM 1 FROM "Result" WHERE id = result_id FOR NO KEY UPDATE;
  SELECT c."number" INTO holder
  FROM "CertificateResult" cr
  JOIN "CertificateRevision" r ON r.id = cr."revisionId"
  JOIN "Certificate" c ON c.id = r."certificateId"
  WHERE cr."resultId" = result_id AND r."certificateId" <> own_certificate AND r."status" IN ('DRAFT', 'ISSUED')
    AND seepline_revision_includes(r.id, result_id)
  LIMIT 1;
  RETURN holder;
END;
$$;
REVOKE EXECUTE ON FUNCTION seepline_live_holder(text, text) FROM PUBLIC;

-- A result is on at most one live certificate, counting only the results a revision includes: a result left
-- out of a draft is free for another certificate, and taking it back in is checked again.
CREATE OR REPLACE FUNCTION seepline_result_on_one_live_certificate() RETURNS trigger
LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $$
DECLARE
  own_certificate text;
  holder text;
BEGIN
  SELECT "certificateId" INTO own_certificate FROM "CertificateRevision" WHERE id = NEW."revisionId";
  holder := seepline_live_holder(NEW."resultId", own_certificate);
  IF holder IS NOT NULL THEN
    RAISE EXCEPTION 'result_on_live_certificate: result % is already on certificate %', NEW."resultId", holder
      USING ERRCODE = 'unique_violation', CONSTRAINT = 'result_on_one_live_certificate';
  END IF;
  RETURN NEW;
END;
$$;

CREATE OR REPLACE FUNCTION seepline_draft_content_results_free() RETURNS trigger
LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $$
DECLARE
  own_certificate text;
  result_id text;
  holder text;
BEGIN
  SELECT "certificateId" INTO own_certificate FROM "CertificateRevision" WHERE id = NEW."revisionId";
  FOREACH result_id IN ARRAY COALESCE(NEW."resultIds", ARRAY[]::text[]) LOOP
    IF NOT EXISTS (SELECT 1 FROM "CertificateResult" WHERE "revisionId" = NEW."revisionId" AND "resultId" = result_id) THEN
      RAISE EXCEPTION 'a draft includes only results on its revision (%)', result_id USING ERRCODE = 'foreign_key_violation';
    END IF;
    holder := seepline_live_holder(result_id, own_certificate);
    IF holder IS NOT NULL THEN
      RAISE EXCEPTION 'result_on_live_certificate: result % is already on certificate %', result_id, holder
        USING ERRCODE = 'unique_violation', CONSTRAINT = 'result_on_one_live_certificate';
    END IF;
  END LOOP;
  RETURN NEW;
END;
$$;
REVOKE EXECUTE ON FUNCTION seepline_draft_content_results_free() FROM PUBLIC;
CREATE TRIGGER draft_content_results_free BEFORE INSERT ON "CertificateDraftContent" FOR EACH ROW EXECUTE FUNCTION seepline_draft_content_results_free();

-- Editions of the standards as the lab first installs them (from memory; the lab corrects them to the
-- editions it actually holds).
UPDATE "TestMethod" SET "edition" = 'D5887/D5887M-20' WHERE "code" = 'D5887' AND "edition" = '';
UPDATE "TestMethod" SET "edition" = 'D6766-20' WHERE "code" = 'D6766' AND "edition" = '';
UPDATE "TestMethod" SET "edition" = 'D5084-16a' WHERE "code" = 'D5084' AND "edition" = '';
