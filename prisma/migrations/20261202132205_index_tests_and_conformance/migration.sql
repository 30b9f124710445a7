-- Index tests as first-class work (ASTM D5890, D5891, D5993, D2216, D6768, D6496): raw observations, results,
-- QA reviews and instruments; coupons cut for them; delivered roll sizes and testing frequencies for sampling
-- coverage.

-- CreateEnum
CREATE TYPE "IndexTestState" AS ENUM ('SUBMITTED', 'RETURNED', 'APPROVED');

-- AlterEnum
ALTER TYPE "TestProperty" ADD VALUE 'GCL_MASS_PER_AREA';
ALTER TYPE "TestProperty" ADD VALUE 'TENSILE_STRENGTH';
ALTER TYPE "TestProperty" ADD VALUE 'PEEL_STRENGTH';

-- AlterEnum
ALTER TYPE "EquipmentKind" ADD VALUE 'BALANCE';
ALTER TYPE "EquipmentKind" ADD VALUE 'OVEN';
ALTER TYPE "EquipmentKind" ADD VALUE 'GRADUATED_CYLINDER';
ALTER TYPE "EquipmentKind" ADD VALUE 'FILTER_PRESS';
ALTER TYPE "EquipmentKind" ADD VALUE 'TENSILE_FRAME';
ALTER TYPE "EquipmentKind" ADD VALUE 'LOAD_CELL';

-- AlterTable
ALTER TABLE "SpecificationLimit" ADD COLUMN     "testingFrequencyAreaM2" DOUBLE PRECISION,
ADD COLUMN     "testingFrequencyPerLot" BOOLEAN NOT NULL DEFAULT false;

-- AlterTable
ALTER TABLE "Roll" ADD COLUMN     "deliveredLengthM" DOUBLE PRECISION,
ADD COLUMN     "deliveredWidthM" DOUBLE PRECISION;

-- AlterTable
ALTER TABLE "Coupon" ADD COLUMN     "intendedMethodCode" TEXT;

-- AlterTable
ALTER TABLE "IndexTest" ADD COLUMN     "approvedAt" TIMESTAMP(3),
ADD COLUMN     "approvedById" TEXT,
ADD COLUMN     "correctsId" TEXT,
ADD COLUMN     "couponId" TEXT,
ADD COLUMN     "evaluation" JSONB,
ADD COLUMN     "methodSettingsVersionId" TEXT,
ADD COLUMN     "observations" JSONB,
ADD COLUMN     "state" "IndexTestState" NOT NULL DEFAULT 'SUBMITTED',
ADD COLUMN     "updatedAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
ADD COLUMN     "version" INTEGER NOT NULL DEFAULT 1;

-- CreateTable
CREATE TABLE "IndexTestResult" (
    "id" TEXT NOT NULL,
    "indexTestId" TEXT NOT NULL,
    "property" "TestProperty" NOT NULL,
    "value" DOUBLE PRECISION NOT NULL,
    "unit" TEXT NOT NULL,
    "standardDeviation" DOUBLE PRECISION,
    "specimenCount" INTEGER NOT NULL,
    "expandedUncertainty" DOUBLE PRECISION,
    "coverageFactor" DOUBLE PRECISION,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "IndexTestResult_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "IndexTestReview" (
    "id" TEXT NOT NULL,
    "indexTestId" TEXT NOT NULL,
    "reviewerId" TEXT NOT NULL,
    "decision" "ReviewDecision" NOT NULL,
    "comments" TEXT NOT NULL DEFAULT '',
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "IndexTestReview_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "IndexTestEquipment" (
    "indexTestId" TEXT NOT NULL,
    "equipmentId" TEXT NOT NULL,
    "calibrationId" TEXT,
    "role" TEXT NOT NULL,

    CONSTRAINT "IndexTestEquipment_pkey" PRIMARY KEY ("indexTestId","equipmentId")
);

-- CreateIndex
CREATE UNIQUE INDEX "IndexTestResult_indexTestId_property_key" ON "IndexTestResult"("indexTestId", "property");

-- CreateIndex
CREATE INDEX "IndexTestReview_indexTestId_idx" ON "IndexTestReview"("indexTestId");

-- CreateIndex
CREATE UNIQUE INDEX "IndexTest_correctsId_key" ON "IndexTest"("correctsId");

-- CreateIndex
CREATE INDEX "IndexTest_state_testedAt_idx" ON "IndexTest"("state", "testedAt");

-- AddForeignKey
ALTER TABLE "IndexTest" ADD CONSTRAINT "IndexTest_couponId_fkey" FOREIGN KEY ("couponId") REFERENCES "Coupon"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTest" ADD CONSTRAINT "IndexTest_methodSettingsVersionId_fkey" FOREIGN KEY ("methodSettingsVersionId") REFERENCES "MethodSettingsVersion"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTest" ADD CONSTRAINT "IndexTest_correctsId_fkey" FOREIGN KEY ("correctsId") REFERENCES "IndexTest"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTest" ADD CONSTRAINT "IndexTest_approvedById_fkey" FOREIGN KEY ("approvedById") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTestResult" ADD CONSTRAINT "IndexTestResult_indexTestId_fkey" FOREIGN KEY ("indexTestId") REFERENCES "IndexTest"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTestReview" ADD CONSTRAINT "IndexTestReview_indexTestId_fkey" FOREIGN KEY ("indexTestId") REFERENCES "IndexTest"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTestReview" ADD CONSTRAINT "IndexTestReview_reviewerId_fkey" FOREIGN KEY ("reviewerId") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTestEquipment" ADD CONSTRAINT "IndexTestEquipment_indexTestId_fkey" FOREIGN KEY ("indexTestId") REFERENCES "IndexTest"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTestEquipment" ADD CONSTRAINT "IndexTestEquipment_equipmentId_fkey" FOREIGN KEY ("equipmentId") REFERENCES "Equipment"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTestEquipment" ADD CONSTRAINT "IndexTestEquipment_calibrationId_fkey" FOREIGN KEY ("calibrationId") REFERENCES "Calibration"("id") ON DELETE SET NULL ON UPDATE CASCADE;



-- Audited like every record table; refuse TRUNCATE like them.
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "IndexTestResult" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('id');
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "IndexTestReview" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('id');
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "IndexTestEquipment" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('indexTestId,equipmentId');
CREATE TRIGGER refuse_truncate BEFORE TRUNCATE ON "IndexTestResult" FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER refuse_truncate BEFORE TRUNCATE ON "IndexTestReview" FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER refuse_truncate BEFORE TRUNCATE ON "IndexTestEquipment" FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change();

-- Results, reviews and the instruments used are only ever added to.
CREATE TRIGGER index_test_result_append_only BEFORE UPDATE OR DELETE ON "IndexTestResult" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER index_test_review_append_only BEFORE UPDATE OR DELETE ON "IndexTestReview" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER index_test_equipment_append_only BEFORE UPDATE OR DELETE ON "IndexTestEquipment" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
REVOKE UPDATE ON "IndexTestResult", "IndexTestReview", "IndexTestEquipment" FROM seepline_runtime;

-- A test's observations, results and who did it never change; only its review state and approval do.
CREATE OR REPLACE FUNCTION seepline_index_test_observations_kept() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF NEW."rollId" IS DISTINCT FROM OLD."rollId" OR NEW."couponId" IS DISTINCT FROM OLD."couponId"
     OR NEW."property" IS DISTINCT FROM OLD."property" OR NEW."methodCode" IS DISTINCT FROM OLD."methodCode"
     OR NEW."value" IS DISTINCT FROM OLD."value" OR NEW."unit" IS DISTINCT FROM OLD."unit"
     OR NEW."testedAt" IS DISTINCT FROM OLD."testedAt" OR NEW."performedById" IS DISTINCT FROM OLD."performedById"
     OR NEW."observations" IS DISTINCT FROM OLD."observations" OR NEW."evaluation" IS DISTINCT FROM OLD."evaluation"
     OR NEW."methodSettingsVersionId" IS DISTINCT FROM OLD."methodSettingsVersionId" OR NEW."correctsId" IS DISTINCT FROM OLD."correctsId" THEN
    RAISE EXCEPTION 'an index test''s observations are original records and cannot be changed; record the test again instead'
      USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN NEW;
END;
$$;
CREATE TRIGGER index_test_observations_kept BEFORE UPDATE ON "IndexTest" FOR EACH ROW EXECUTE FUNCTION seepline_index_test_observations_kept();
CREATE TRIGGER index_test_not_deleted BEFORE DELETE ON "IndexTest" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();

-- Nobody approves an index test they performed (ISO/IEC 17025 independence of review).
CREATE OR REPLACE FUNCTION seepline_index_review_not_by_performer() RETURNS trigger
LANGUAGE plpgsql AS $$
DECLARE
  performer text;
BEGIN
  SELECT "performedById" INTO performer FROM "IndexTest" WHERE id = NEW."indexTestId";
  IF NEW."decision" = 'APPROVED' AND performer = NEW."reviewerId" THEN
    RAISE EXCEPTION 'an index test cannot be approved by the person who performed it' USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN NEW;
END;
$$;
CREATE TRIGGER index_review_not_by_performer BEFORE INSERT ON "IndexTestReview" FOR EACH ROW EXECUTE FUNCTION seepline_index_review_not_by_performer();
CREATE OR REPLACE FUNCTION seepline_index_approval_not_by_performer() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF NEW."approvedById" IS NOT NULL AND NEW."approvedById" = NEW."performedById" THEN
    RAISE EXCEPTION 'an index test cannot be approved by the person who performed it' USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN NEW;
END;
$$;
CREATE TRIGGER index_approval_not_by_performer BEFORE INSERT OR UPDATE ON "IndexTest" FOR EACH ROW EXECUTE FUNCTION seepline_index_approval_not_by_performer();
ALTER TABLE "IndexTest" ADD CONSTRAINT index_test_approval_complete CHECK (("state" = 'APPROVED') = ("approvedById" IS NOT NULL AND "approvedAt" IS NOT NULL));

-- A testing frequency is a positive area; a delivered size is positive.
ALTER TABLE "SpecificationLimit" ADD CONSTRAINT specification_frequency_positive CHECK ("testingFrequencyAreaM2" IS NULL OR "testingFrequencyAreaM2" > 0);
ALTER TABLE "Roll" ADD CONSTRAINT roll_delivered_size_positive CHECK (("deliveredLengthM" IS NULL OR "deliveredLengthM" > 0) AND ("deliveredWidthM" IS NULL OR "deliveredWidthM" > 0));
ALTER TABLE "IndexTestResult" ADD CONSTRAINT index_test_result_specimens CHECK ("specimenCount" >= 1);

-- New timestamp columns default to UTC like the others (20261202090100_utc_timestamps).
ALTER TABLE "IndexTest" ALTER COLUMN "updatedAt" SET DEFAULT (CURRENT_TIMESTAMP AT TIME ZONE 'UTC');
ALTER TABLE "IndexTestResult" ALTER COLUMN "createdAt" SET DEFAULT (CURRENT_TIMESTAMP AT TIME ZONE 'UTC');
ALTER TABLE "IndexTestReview" ALTER COLUMN "createdAt" SET DEFAULT (CURRENT_TIMESTAMP AT TIME ZONE 'UTC');

-- The index methods and version 1 of their settings: the defaults of lib/methods (tests/unit/methods/
-- method-settings.test.ts checks that they match).
INSERT INTO "TestMethod" ("code", "title", "defaults", "updatedAt") VALUES
  ('D5890', 'Bentonite swell index (ASTM D5890)', '{"minSpecimens":1,"reportingUnit":"mL/2 g","reportingDecimals":1,"expandedUncertainty":null,"coverageFactor":2,"nominalClayMassG":2,"clayMassToleranceG":0.01,"minHydrationHours":16,"cylinderCapacityMl":100}', now()),
  ('D5891', 'Bentonite fluid loss (ASTM D5891)', '{"minSpecimens":1,"reportingUnit":"mL","reportingDecimals":1,"expandedUncertainty":null,"coverageFactor":2,"clayMassG":22.5,"waterVolumeMl":350,"pressureKPa":690,"pressureToleranceKPa":35,"filtrationMinutes":30}', now()),
  ('D5993', 'Mass per unit area of the GCL and of its clay at 0 % moisture (ASTM D5993)', '{"minSpecimens":3,"reportingUnit":"kg/m2","reportingDecimals":2,"expandedUncertainty":null,"coverageFactor":2,"minSpecimenAreaCm2":100}', now()),
  ('D2216', 'Moisture content by oven drying (ASTM D2216)', '{"minSpecimens":1,"reportingUnit":"%","reportingDecimals":1,"expandedUncertainty":null,"coverageFactor":2,"ovenTemperatureC":110,"minDryingHours":16}', now()),
  ('D6768', 'Tensile strength of a GCL (ASTM D6768)', '{"minSpecimens":5,"reportingUnit":"kN/m","reportingDecimals":1,"expandedUncertainty":null,"coverageFactor":2,"stripWidthMm":100}', now()),
  ('D6496', 'Peel strength of a needle-punched GCL (ASTM D6496)', '{"minSpecimens":5,"reportingUnit":"N/m","reportingDecimals":0,"expandedUncertainty":null,"coverageFactor":2,"specimenWidthMm":100}', now())
ON CONFLICT DO NOTHING;
INSERT INTO "MethodSettingsVersion" ("id", "methodCode", "version", "settings", "reason", "createdAt") VALUES
  ('method-settings-D5890-v1', 'D5890', 1, '{"minSpecimens":1,"reportingUnit":"mL/2 g","reportingDecimals":1,"expandedUncertainty":null,"coverageFactor":2,"nominalClayMassG":2,"clayMassToleranceG":0.01,"minHydrationHours":16,"cylinderCapacityMl":100}', 'Defaults as installed (sources on the method settings screen)', now()),
  ('method-settings-D5891-v1', 'D5891', 1, '{"minSpecimens":1,"reportingUnit":"mL","reportingDecimals":1,"expandedUncertainty":null,"coverageFactor":2,"clayMassG":22.5,"waterVolumeMl":350,"pressureKPa":690,"pressureToleranceKPa":35,"filtrationMinutes":30}', 'Defaults as installed (sources on the method settings screen)', now()),
  ('method-settings-D5993-v1', 'D5993', 1, '{"minSpecimens":3,"reportingUnit":"kg/m2","reportingDecimals":2,"expandedUncertainty":null,"coverageFactor":2,"minSpecimenAreaCm2":100}', 'Defaults as installed (sources on the method settings screen)', now()),
  ('method-settings-D2216-v1', 'D2216', 1, '{"minSpecimens":1,"reportingUnit":"%","reportingDecimals":1,"expandedUncertainty":null,"coverageFactor":2,"ovenTemperatureC":110,"minDryingHours":16}', 'Defaults as installed (sources on the method settings screen)', now()),
  ('method-settings-D6768-v1', 'D6768', 1, '{"minSpecimens":5,"reportingUnit":"kN/m","reportingDecimals":1,"expandedUncertainty":null,"coverageFactor":2,"stripWidthMm":100}', 'Defaults as installed (sources on the method settings screen)', now()),
  ('method-settings-D6496-v1', 'D6496', 1, '{"minSpecimens":5,"reportingUnit":"N/m","reportingDecimals":0,"expandedUncertainty":null,"coverageFactor":2,"specimenWidthMm":100}', 'Defaults as installed (sources on the method settings screen)', now())
ON CONFLICT DO NOTHING;
