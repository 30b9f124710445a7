-- Runs: who overrode a calibration block, when post-test data were recorded.
ALTER TABLE "Run" ADD COLUMN "calibrationOverrideById" TEXT;
ALTER TABLE "Run" ADD COLUMN "postTestRecordedAt" TIMESTAMP(3);
ALTER TABLE "Run" ADD CONSTRAINT "Run_calibrationOverrideById_fkey" FOREIGN KEY ("calibrationOverrideById") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- Readings: both line pressures as entered, and where the reading came from.
ALTER TABLE "Reading" ADD COLUMN "influentPressurePa" DOUBLE PRECISION;
ALTER TABLE "Reading" ADD COLUMN "effluentPressurePa" DOUBLE PRECISION;
ALTER TABLE "Reading" ADD COLUMN "source" TEXT NOT NULL DEFAULT 'manual';
-- Raw burette levels are read in millimetres on the scale; the volumes follow from the calibrated areas.
ALTER TABLE "Reading" RENAME COLUMN "inflowBuretteMl" TO "inflowLevelMm";
ALTER TABLE "Reading" RENAME COLUMN "outflowBuretteMl" TO "outflowLevelMm";

-- An override needs its reason, and a reason names who gave it.
ALTER TABLE "Run" ADD CONSTRAINT run_override_has_reason
  CHECK (("calibrationOverrideById" IS NULL) = ("calibrationOverrideReason" IS NULL));

-- Original observations are kept unchanged: a saved reading's measured values may not be updated;
-- a correction is a new reading that points at the one it replaces (Reading.correctsId).
CREATE OR REPLACE FUNCTION seepline_reading_unchanged() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF (to_jsonb(NEW) - 'createdAt') IS DISTINCT FROM (to_jsonb(OLD) - 'createdAt') THEN
    RAISE EXCEPTION 'a saved reading is an original observation and cannot be changed; record a correction instead'
      USING ERRCODE = 'insufficient_privilege';
  END IF;
  RETURN NEW;
END;
$$;
CREATE TRIGGER reading_unchanged BEFORE UPDATE ON "Reading" FOR EACH ROW EXECUTE FUNCTION seepline_reading_unchanged();
CREATE TRIGGER reading_no_delete BEFORE DELETE ON "Reading" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
