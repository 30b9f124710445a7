-- CreateTable
CREATE TABLE "CalibrationOverride" (
    "id" TEXT NOT NULL,
    "equipmentId" TEXT NOT NULL,
    "grantedById" TEXT NOT NULL,
    "reason" TEXT NOT NULL,
    "validUntil" TIMESTAMP(3) NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "CalibrationOverride_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE INDEX "CalibrationOverride_equipmentId_validUntil_idx" ON "CalibrationOverride"("equipmentId", "validUntil");

-- AddForeignKey
ALTER TABLE "CalibrationOverride" ADD CONSTRAINT "CalibrationOverride_equipmentId_fkey" FOREIGN KEY ("equipmentId") REFERENCES "Equipment"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CalibrationOverride" ADD CONSTRAINT "CalibrationOverride_grantedById_fkey" FOREIGN KEY ("grantedById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;


-- Overrides are records of a decision: audited and never changed or removed.
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "CalibrationOverride" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('id');
CREATE TRIGGER calibration_override_append_only BEFORE UPDATE OR DELETE ON "CalibrationOverride" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
ALTER TABLE "CalibrationOverride" ADD CONSTRAINT calibration_override_reason CHECK (length(trim("reason")) >= 5);
