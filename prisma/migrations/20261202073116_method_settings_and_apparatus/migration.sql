
-- Versioned method settings, burette refills, stage departures, the evaluation record of a result, what the
-- D6766 pore-volume count needs, and instruments that carry uncertainty (thickness gauge, timer).

-- AlterEnum (PostgreSQL 12 or later adds enum values inside a transaction)

ALTER TYPE "EquipmentKind" ADD VALUE 'THICKNESS_GAUGE';
ALTER TYPE "EquipmentKind" ADD VALUE 'TIMER';

-- AlterTable
ALTER TABLE "Specimen" ADD COLUMN     "bentoniteDryMassG" DOUBLE PRECISION,
ADD COLUMN     "bentoniteMassPerAreaKgPerM2" DOUBLE PRECISION,
ADD COLUMN     "specificGravity" DOUBLE PRECISION;

-- AlterTable
ALTER TABLE "Run" ADD COLUMN     "methodSettingsVersionId" TEXT,
ADD COLUMN     "settingsChoiceReason" TEXT,
ADD COLUMN     "settingsChosenById" TEXT;

-- AlterTable
ALTER TABLE "RunStage" ADD COLUMN     "departureNote" TEXT;

-- AlterTable
ALTER TABLE "Reading" ADD COLUMN     "afterRefill" BOOLEAN NOT NULL DEFAULT false;

-- AlterTable
ALTER TABLE "Result" ADD COLUMN     "evaluation" JSONB,
ADD COLUMN     "methodSettingsVersionId" TEXT;

-- CreateTable
CREATE TABLE "MethodSettingsVersion" (
    "id" TEXT NOT NULL,
    "methodCode" TEXT NOT NULL,
    "version" INTEGER NOT NULL,
    "settings" JSONB NOT NULL,
    "reason" TEXT NOT NULL,
    "createdById" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "MethodSettingsVersion_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE UNIQUE INDEX "MethodSettingsVersion_methodCode_version_key" ON "MethodSettingsVersion"("methodCode", "version");

-- AddForeignKey
ALTER TABLE "MethodSettingsVersion" ADD CONSTRAINT "MethodSettingsVersion_methodCode_fkey" FOREIGN KEY ("methodCode") REFERENCES "TestMethod"("code") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "MethodSettingsVersion" ADD CONSTRAINT "MethodSettingsVersion_createdById_fkey" FOREIGN KEY ("createdById") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Run" ADD CONSTRAINT "Run_methodSettingsVersionId_fkey" FOREIGN KEY ("methodSettingsVersionId") REFERENCES "MethodSettingsVersion"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Run" ADD CONSTRAINT "Run_settingsChosenById_fkey" FOREIGN KEY ("settingsChosenById") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Result" ADD CONSTRAINT "Result_methodSettingsVersionId_fkey" FOREIGN KEY ("methodSettingsVersionId") REFERENCES "MethodSettingsVersion"("id") ON DELETE SET NULL ON UPDATE CASCADE;


-- Audited like every record table, and append-only: a change of settings is a new version.
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "MethodSettingsVersion" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('id');
CREATE TRIGGER method_settings_version_append_only BEFORE UPDATE OR DELETE ON "MethodSettingsVersion" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
ALTER TABLE "MethodSettingsVersion" ADD CONSTRAINT method_settings_version_positive CHECK ("version" >= 1);
ALTER TABLE "MethodSettingsVersion" ADD CONSTRAINT method_settings_version_has_reason CHECK (length(trim("reason")) > 0);

-- A run's settings chosen by QA carry the reason and who chose them.
ALTER TABLE "Run" ADD CONSTRAINT run_settings_choice_has_reason CHECK (("settingsChosenById" IS NULL) = ("settingsChoiceReason" IS NULL));

-- Version 1 of each method: the defaults of lib/methods (tests/unit/methods/method-settings.test.ts checks
-- that these match), and the runs that exist so far are judged by it.
INSERT INTO "MethodSettingsVersion" ("id", "methodCode", "version", "settings", "reason", "createdAt") VALUES
  ('method-settings-D5887-v1', 'D5887', 1, '{"consecutiveIntervals":4,"ratioMin":0.75,"ratioMax":1.25,"trendQuantity":"flux","trendAlpha":0.05,"trendMinChangePct":10,"kBandPct":25,"kBandBelowThresholdPct":50,"kBandThresholdMPerS":1e-10,"ecTolerancePct":10,"phToleranceUnits":0.5,"minPoreVolumes":2,"confiningMarginKPa":35,"minEquilibrationHours":48,"permeationCellKPa":550,"permeationInfluentKPa":530,"permeationEffluentKPa":515,"permeationToleranceKPa":10,"minCellAboveInfluentKPa":10,"maxLeakagePct":10,"specificGravity":2.75,"uDieDiameterMm":null,"uThicknessMm":null,"uTimeS":null}', 'Defaults as installed (sources on the method settings screen)', now()),
  ('method-settings-D5084-v1', 'D5084', 1, '{"consecutiveIntervals":4,"ratioMin":0.75,"ratioMax":1.25,"trendQuantity":"k20","trendAlpha":0.05,"trendMinChangePct":10,"kBandPct":25,"kBandBelowThresholdPct":50,"kBandThresholdMPerS":1e-10,"ecTolerancePct":10,"phToleranceUnits":0.5,"minPoreVolumes":2,"confiningMarginKPa":35,"minEquilibrationHours":48,"permeationCellKPa":null,"permeationInfluentKPa":null,"permeationEffluentKPa":null,"permeationToleranceKPa":10,"minCellAboveInfluentKPa":10,"maxLeakagePct":10,"specificGravity":2.75,"uDieDiameterMm":null,"uThicknessMm":null,"uTimeS":null}', 'Defaults as installed (sources on the method settings screen)', now()),
  ('method-settings-D6766-v1', 'D6766', 1, '{"consecutiveIntervals":4,"ratioMin":0.75,"ratioMax":1.25,"trendQuantity":"flux","trendAlpha":0.05,"trendMinChangePct":10,"kBandPct":25,"kBandBelowThresholdPct":50,"kBandThresholdMPerS":1e-10,"ecTolerancePct":10,"phToleranceUnits":0.5,"minPoreVolumes":2,"confiningMarginKPa":35,"minEquilibrationHours":48,"permeationCellKPa":550,"permeationInfluentKPa":530,"permeationEffluentKPa":515,"permeationToleranceKPa":10,"minCellAboveInfluentKPa":10,"maxLeakagePct":10,"specificGravity":2.75,"uDieDiameterMm":null,"uThicknessMm":null,"uTimeS":null}', 'Defaults as installed (sources on the method settings screen)', now())
ON CONFLICT DO NOTHING;
UPDATE "Run" SET "methodSettingsVersionId" = 'method-settings-' || "methodCode" || '-v1' WHERE "methodSettingsVersionId" IS NULL
  AND "methodCode" IN ('D5887', 'D5084', 'D6766');
