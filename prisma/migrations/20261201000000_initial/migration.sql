-- CreateSchema
CREATE SCHEMA IF NOT EXISTS "public";

-- CreateEnum
CREATE TYPE "Role" AS ENUM ('INTAKE_CLERK', 'TECHNICIAN', 'QA_MANAGER', 'LAB_ADMIN', 'CLIENT_USER');

-- CreateEnum
CREATE TYPE "PressureUnit" AS ENUM ('KPA', 'PSI');

-- CreateEnum
CREATE TYPE "TestProperty" AS ENUM ('INDEX_FLUX', 'HYDRAULIC_CONDUCTIVITY', 'SWELL_INDEX', 'FLUID_LOSS', 'BENTONITE_MASS_PER_AREA', 'MOISTURE_CONTENT');

-- CreateEnum
CREATE TYPE "LimitDirection" AS ENUM ('MAXIMUM', 'MINIMUM');

-- CreateEnum
CREATE TYPE "ConformanceMethod" AS ENUM ('ABSOLUTE', 'ROUNDING');

-- CreateEnum
CREATE TYPE "ItemState" AS ENUM ('RECEIVED', 'STORED', 'CUT', 'PREPARED', 'ASSIGNED', 'UNDER_TEST', 'TESTED', 'RETAINED', 'DISPOSED');

-- CreateEnum
CREATE TYPE "CustodyAction" AS ENUM ('RECEIVED', 'STORED', 'MOVED', 'CUT', 'PREPARED', 'ASSIGNED', 'TESTED', 'RETAINED', 'DISPOSED', 'CORRECTED');

-- CreateEnum
CREATE TYPE "EquipmentKind" AS ENUM ('PERMEAMETER_CELL', 'BURETTE_PANEL', 'PRESSURE_TRANSDUCER', 'THERMOMETER');

-- CreateEnum
CREATE TYPE "EquipmentStatus" AS ENUM ('IN_SERVICE', 'OUT_OF_SERVICE', 'RETIRED');

-- CreateEnum
CREATE TYPE "RunState" AS ENUM ('SET_UP', 'SATURATING', 'EQUILIBRATING', 'PERMEATING', 'TERMINATED', 'POST_TEST_RECORDED', 'SUBMITTED', 'RETURNED', 'APPROVED');

-- CreateEnum
CREATE TYPE "TerminationKind" AS ENUM ('CRITERIA_MET', 'EARLY_END');

-- CreateEnum
CREATE TYPE "StageKind" AS ENUM ('SATURATION', 'BACK_PRESSURE', 'EQUILIBRATION', 'PERMEATION');

-- CreateEnum
CREATE TYPE "ReviewDecision" AS ENUM ('APPROVED', 'RETURNED');

-- CreateEnum
CREATE TYPE "RevisionStatus" AS ENUM ('DRAFT', 'ISSUED', 'SUPERSEDED', 'REVOKED');

-- CreateTable
CREATE TABLE "User" (
    "id" TEXT NOT NULL,
    "email" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "passwordHash" TEXT NOT NULL,
    "role" "Role" NOT NULL,
    "clientOrganizationId" TEXT,
    "active" BOOLEAN NOT NULL DEFAULT true,
    "pressureUnit" "PressureUnit" NOT NULL DEFAULT 'KPA',
    "sessionVersion" INTEGER NOT NULL DEFAULT 1,
    "passwordChangedAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "version" INTEGER NOT NULL DEFAULT 1,

    CONSTRAINT "User_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "ApiToken" (
    "id" TEXT NOT NULL,
    "userId" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "tokenHash" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "expiresAt" TIMESTAMP(3),
    "lastUsedAt" TIMESTAMP(3),
    "revokedAt" TIMESTAMP(3),

    CONSTRAINT "ApiToken_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "SignInThrottle" (
    "key" TEXT NOT NULL,
    "failures" INTEGER NOT NULL DEFAULT 0,
    "lastFailureAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "blockedUntil" TIMESTAMP(3),

    CONSTRAINT "SignInThrottle_pkey" PRIMARY KEY ("key")
);

-- CreateTable
CREATE TABLE "Laboratory" (
    "id" TEXT NOT NULL DEFAULT 'lab',
    "name" TEXT NOT NULL,
    "address" TEXT NOT NULL,
    "accreditation" TEXT,
    "retentionDays" INTEGER NOT NULL DEFAULT 90,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "Laboratory_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "NumberSequence" (
    "key" TEXT NOT NULL,
    "lastValue" INTEGER NOT NULL DEFAULT 0,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "NumberSequence_pkey" PRIMARY KEY ("key")
);

-- CreateTable
CREATE TABLE "ClientOrganization" (
    "id" TEXT NOT NULL,
    "code" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "address" TEXT,
    "contactEmail" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "ClientOrganization_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Project" (
    "id" TEXT NOT NULL,
    "code" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "siteName" TEXT NOT NULL,
    "siteLocation" TEXT,
    "clientOrganizationId" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "Project_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Specification" (
    "id" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "projectId" TEXT,
    "isTemplate" BOOLEAN NOT NULL DEFAULT false,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "Specification_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "SpecificationLimit" (
    "id" TEXT NOT NULL,
    "specificationId" TEXT NOT NULL,
    "property" "TestProperty" NOT NULL,
    "limitText" TEXT NOT NULL,
    "unit" TEXT NOT NULL,
    "direction" "LimitDirection" NOT NULL,
    "significantDigits" INTEGER NOT NULL,
    "conformanceMethod" "ConformanceMethod" NOT NULL DEFAULT 'ROUNDING',
    "testMethodCode" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "SpecificationLimit_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "TestMethod" (
    "code" TEXT NOT NULL,
    "title" TEXT NOT NULL,
    "defaults" JSONB NOT NULL,
    "updatedAt" TIMESTAMP(3) NOT NULL,

    CONSTRAINT "TestMethod_pkey" PRIMARY KEY ("code")
);

-- CreateTable
CREATE TABLE "StorageLocation" (
    "id" TEXT NOT NULL,
    "code" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "description" TEXT,
    "active" BOOLEAN NOT NULL DEFAULT true,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "StorageLocation_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Shipment" (
    "id" TEXT NOT NULL,
    "labNumber" TEXT NOT NULL,
    "clientOrganizationId" TEXT NOT NULL,
    "projectId" TEXT NOT NULL,
    "deliveredBy" TEXT NOT NULL,
    "receivedAt" TIMESTAMP(3) NOT NULL,
    "receivedById" TEXT NOT NULL,
    "conditionNotes" TEXT NOT NULL DEFAULT '',
    "acknowledgedAt" TIMESTAMP(3),
    "acknowledgedById" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "version" INTEGER NOT NULL DEFAULT 1,

    CONSTRAINT "Shipment_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "ShipmentPhoto" (
    "id" TEXT NOT NULL,
    "shipmentId" TEXT NOT NULL,
    "fileName" TEXT NOT NULL,
    "contentType" TEXT NOT NULL,
    "data" BYTEA NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "ShipmentPhoto_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Roll" (
    "id" TEXT NOT NULL,
    "labNumber" TEXT NOT NULL,
    "shipmentId" TEXT NOT NULL,
    "projectId" TEXT NOT NULL,
    "rollNumber" TEXT NOT NULL,
    "lotNumber" TEXT NOT NULL,
    "product" TEXT NOT NULL,
    "manufacturer" TEXT NOT NULL,
    "sampleLengthMm" DOUBLE PRECISION,
    "sampleWidthMm" DOUBLE PRECISION,
    "machineDirectionMarked" BOOLEAN NOT NULL DEFAULT false,
    "state" "ItemState" NOT NULL DEFAULT 'RECEIVED',
    "storageLocationId" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "version" INTEGER NOT NULL DEFAULT 1,

    CONSTRAINT "Roll_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Coupon" (
    "id" TEXT NOT NULL,
    "labNumber" TEXT NOT NULL,
    "rollId" TEXT NOT NULL,
    "positionInSample" TEXT NOT NULL,
    "lengthMm" DOUBLE PRECISION NOT NULL,
    "widthMm" DOUBLE PRECISION NOT NULL,
    "cutById" TEXT NOT NULL,
    "cutAt" TIMESTAMP(3) NOT NULL,
    "state" "ItemState" NOT NULL DEFAULT 'CUT',
    "storageLocationId" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "version" INTEGER NOT NULL DEFAULT 1,

    CONSTRAINT "Coupon_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Specimen" (
    "id" TEXT NOT NULL,
    "labNumber" TEXT NOT NULL,
    "couponId" TEXT NOT NULL,
    "dieDiameterMm" DOUBLE PRECISION NOT NULL,
    "initialThicknessMm" DOUBLE PRECISION NOT NULL,
    "initialMassG" DOUBLE PRECISION NOT NULL,
    "moistureContentPct" DOUBLE PRECISION,
    "intendedMethodCode" TEXT NOT NULL,
    "preparedById" TEXT NOT NULL,
    "preparedAt" TIMESTAMP(3) NOT NULL,
    "state" "ItemState" NOT NULL DEFAULT 'PREPARED',
    "storageLocationId" TEXT,
    "retainUntil" TIMESTAMP(3),
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "version" INTEGER NOT NULL DEFAULT 1,

    CONSTRAINT "Specimen_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "SpecimenChecklistItem" (
    "id" TEXT NOT NULL,
    "specimenId" TEXT NOT NULL,
    "itemKey" TEXT NOT NULL,
    "question" TEXT NOT NULL,
    "answer" BOOLEAN NOT NULL,
    "note" TEXT NOT NULL DEFAULT '',

    CONSTRAINT "SpecimenChecklistItem_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "CustodyEvent" (
    "id" TEXT NOT NULL,
    "action" "CustodyAction" NOT NULL,
    "rollId" TEXT,
    "couponId" TEXT,
    "specimenId" TEXT,
    "fromState" "ItemState",
    "toState" "ItemState",
    "fromLocationId" TEXT,
    "toLocationId" TEXT,
    "actorId" TEXT NOT NULL,
    "occurredAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "note" TEXT NOT NULL DEFAULT '',

    CONSTRAINT "CustodyEvent_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Correction" (
    "id" TEXT NOT NULL,
    "entity" TEXT NOT NULL,
    "entityId" TEXT NOT NULL,
    "field" TEXT NOT NULL,
    "oldValue" TEXT NOT NULL,
    "newValue" TEXT NOT NULL,
    "reason" TEXT NOT NULL,
    "actorId" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "Correction_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "IndexTest" (
    "id" TEXT NOT NULL,
    "rollId" TEXT NOT NULL,
    "property" "TestProperty" NOT NULL,
    "methodCode" TEXT NOT NULL,
    "value" DOUBLE PRECISION NOT NULL,
    "unit" TEXT NOT NULL,
    "testedAt" TIMESTAMP(3) NOT NULL,
    "performedById" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "IndexTest_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Equipment" (
    "id" TEXT NOT NULL,
    "assetTag" TEXT NOT NULL,
    "kind" "EquipmentKind" NOT NULL,
    "name" TEXT NOT NULL,
    "serialNumber" TEXT,
    "ratedMaxPressurePa" DOUBLE PRECISION,
    "status" "EquipmentStatus" NOT NULL DEFAULT 'IN_SERVICE',
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "version" INTEGER NOT NULL DEFAULT 1,

    CONSTRAINT "Equipment_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Calibration" (
    "id" TEXT NOT NULL,
    "equipmentId" TEXT NOT NULL,
    "calibratedAt" TIMESTAMP(3) NOT NULL,
    "dueAt" TIMESTAMP(3) NOT NULL,
    "reference" TEXT NOT NULL,
    "performedBy" TEXT NOT NULL,
    "values" JSONB NOT NULL DEFAULT '{}',
    "passed" BOOLEAN NOT NULL DEFAULT true,
    "recordedById" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "Calibration_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Run" (
    "id" TEXT NOT NULL,
    "labNumber" TEXT NOT NULL,
    "specimenId" TEXT NOT NULL,
    "cellId" TEXT NOT NULL,
    "methodCode" TEXT NOT NULL,
    "state" "RunState" NOT NULL DEFAULT 'SET_UP',
    "performedById" TEXT NOT NULL,
    "assignedAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "effectiveStressPa" DOUBLE PRECISION,
    "permeantName" TEXT,
    "permeantSalt" TEXT,
    "permeantMolarityMolPerL" DOUBLE PRECISION,
    "permeantEcMsPerM" DOUBLE PRECISION,
    "permeantPh" DOUBLE PRECISION,
    "calibrationOverrideReason" TEXT,
    "terminatedAt" TIMESTAMP(3),
    "terminationKind" "TerminationKind",
    "terminationReason" TEXT,
    "postTestThicknessMm" DOUBLE PRECISION,
    "postTestMassG" DOUBLE PRECISION,
    "postTestObservations" TEXT,
    "submittedAt" TIMESTAMP(3),
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "version" INTEGER NOT NULL DEFAULT 1,

    CONSTRAINT "Run_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "RunEquipment" (
    "runId" TEXT NOT NULL,
    "equipmentId" TEXT NOT NULL,
    "calibrationId" TEXT,
    "role" TEXT NOT NULL,

    CONSTRAINT "RunEquipment_pkey" PRIMARY KEY ("runId","equipmentId")
);

-- CreateTable
CREATE TABLE "RunStage" (
    "id" TEXT NOT NULL,
    "runId" TEXT NOT NULL,
    "sequence" INTEGER NOT NULL,
    "kind" "StageKind" NOT NULL,
    "cellPressurePa" DOUBLE PRECISION NOT NULL,
    "influentPressurePa" DOUBLE PRECISION NOT NULL,
    "effluentPressurePa" DOUBLE PRECISION NOT NULL,
    "startedAt" TIMESTAMP(3) NOT NULL,
    "endedAt" TIMESTAMP(3),
    "marginAcknowledged" BOOLEAN NOT NULL DEFAULT false,
    "recordedById" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "RunStage_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Reading" (
    "id" TEXT NOT NULL,
    "runId" TEXT NOT NULL,
    "sequence" INTEGER NOT NULL,
    "takenAt" TIMESTAMP(3) NOT NULL,
    "elapsedS" DOUBLE PRECISION NOT NULL,
    "inflowBuretteMl" DOUBLE PRECISION,
    "outflowBuretteMl" DOUBLE PRECISION,
    "inflowCumulativeMl" DOUBLE PRECISION NOT NULL,
    "outflowCumulativeMl" DOUBLE PRECISION NOT NULL,
    "headPa" DOUBLE PRECISION NOT NULL,
    "cellPressurePa" DOUBLE PRECISION,
    "temperatureC" DOUBLE PRECISION NOT NULL,
    "influentEcMsPerM" DOUBLE PRECISION,
    "effluentEcMsPerM" DOUBLE PRECISION,
    "influentPh" DOUBLE PRECISION,
    "effluentPh" DOUBLE PRECISION,
    "correctsId" TEXT,
    "correctionReason" TEXT,
    "recordedById" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "Reading_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Review" (
    "id" TEXT NOT NULL,
    "runId" TEXT NOT NULL,
    "reviewerId" TEXT NOT NULL,
    "decision" "ReviewDecision" NOT NULL,
    "comments" TEXT NOT NULL DEFAULT '',
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "Review_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Result" (
    "id" TEXT NOT NULL,
    "runId" TEXT NOT NULL,
    "property" "TestProperty" NOT NULL,
    "value" DOUBLE PRECISION NOT NULL,
    "unit" TEXT NOT NULL,
    "expandedUncertainty" DOUBLE PRECISION,
    "temperatureC" DOUBLE PRECISION,
    "unitWeightBasis" TEXT,
    "computedAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "approvedById" TEXT,
    "approvedAt" TIMESTAMP(3),

    CONSTRAINT "Result_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Certificate" (
    "id" TEXT NOT NULL,
    "number" TEXT NOT NULL,
    "projectId" TEXT NOT NULL,
    "clientOrganizationId" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "Certificate_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "CertificateRevision" (
    "id" TEXT NOT NULL,
    "certificateId" TEXT NOT NULL,
    "revision" INTEGER NOT NULL,
    "status" "RevisionStatus" NOT NULL DEFAULT 'DRAFT',
    "reason" TEXT NOT NULL DEFAULT '',
    "verificationCode" TEXT NOT NULL,
    "pdf" BYTEA,
    "pdfSha256" TEXT,
    "issuedAt" TIMESTAMP(3),
    "supersedesId" TEXT,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "CertificateRevision_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "CertificateResult" (
    "revisionId" TEXT NOT NULL,
    "resultId" TEXT NOT NULL,

    CONSTRAINT "CertificateResult_pkey" PRIMARY KEY ("revisionId","resultId")
);

-- CreateTable
CREATE TABLE "Signature" (
    "id" TEXT NOT NULL,
    "revisionId" TEXT NOT NULL,
    "signerId" TEXT NOT NULL,
    "signerRole" "Role" NOT NULL,
    "meaning" TEXT NOT NULL,
    "signedAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "Signature_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "AuditLog" (
    "id" BIGSERIAL NOT NULL,
    "occurredAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "actorId" TEXT,
    "tableName" TEXT NOT NULL,
    "rowId" TEXT,
    "operation" TEXT NOT NULL,
    "before" JSONB,
    "after" JSONB,
    "txId" BIGINT NOT NULL,

    CONSTRAINT "AuditLog_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE UNIQUE INDEX "User_email_key" ON "User"("email");

-- CreateIndex
CREATE INDEX "User_role_active_idx" ON "User"("role", "active");

-- CreateIndex
CREATE UNIQUE INDEX "ApiToken_tokenHash_key" ON "ApiToken"("tokenHash");

-- CreateIndex
CREATE UNIQUE INDEX "ClientOrganization_code_key" ON "ClientOrganization"("code");

-- CreateIndex
CREATE UNIQUE INDEX "Project_code_key" ON "Project"("code");

-- CreateIndex
CREATE INDEX "Project_clientOrganizationId_idx" ON "Project"("clientOrganizationId");

-- CreateIndex
CREATE INDEX "Specification_projectId_idx" ON "Specification"("projectId");

-- CreateIndex
CREATE UNIQUE INDEX "SpecificationLimit_specificationId_property_key" ON "SpecificationLimit"("specificationId", "property");

-- CreateIndex
CREATE UNIQUE INDEX "StorageLocation_code_key" ON "StorageLocation"("code");

-- CreateIndex
CREATE UNIQUE INDEX "Shipment_labNumber_key" ON "Shipment"("labNumber");

-- CreateIndex
CREATE INDEX "Shipment_projectId_receivedAt_idx" ON "Shipment"("projectId", "receivedAt");

-- CreateIndex
CREATE INDEX "Shipment_clientOrganizationId_receivedAt_idx" ON "Shipment"("clientOrganizationId", "receivedAt");

-- CreateIndex
CREATE UNIQUE INDEX "Roll_labNumber_key" ON "Roll"("labNumber");

-- CreateIndex
CREATE INDEX "Roll_state_createdAt_idx" ON "Roll"("state", "createdAt");

-- CreateIndex
CREATE INDEX "Roll_projectId_createdAt_idx" ON "Roll"("projectId", "createdAt");

-- CreateIndex
CREATE UNIQUE INDEX "Roll_projectId_rollNumber_key" ON "Roll"("projectId", "rollNumber");

-- CreateIndex
CREATE UNIQUE INDEX "Coupon_labNumber_key" ON "Coupon"("labNumber");

-- CreateIndex
CREATE INDEX "Coupon_rollId_idx" ON "Coupon"("rollId");

-- CreateIndex
CREATE UNIQUE INDEX "Specimen_labNumber_key" ON "Specimen"("labNumber");

-- CreateIndex
CREATE INDEX "Specimen_couponId_idx" ON "Specimen"("couponId");

-- CreateIndex
CREATE INDEX "Specimen_state_preparedAt_idx" ON "Specimen"("state", "preparedAt");

-- CreateIndex
CREATE UNIQUE INDEX "SpecimenChecklistItem_specimenId_itemKey_key" ON "SpecimenChecklistItem"("specimenId", "itemKey");

-- CreateIndex
CREATE INDEX "CustodyEvent_rollId_occurredAt_idx" ON "CustodyEvent"("rollId", "occurredAt");

-- CreateIndex
CREATE INDEX "CustodyEvent_couponId_occurredAt_idx" ON "CustodyEvent"("couponId", "occurredAt");

-- CreateIndex
CREATE INDEX "CustodyEvent_specimenId_occurredAt_idx" ON "CustodyEvent"("specimenId", "occurredAt");

-- CreateIndex
CREATE INDEX "Correction_entity_entityId_idx" ON "Correction"("entity", "entityId");

-- CreateIndex
CREATE INDEX "IndexTest_rollId_idx" ON "IndexTest"("rollId");

-- CreateIndex
CREATE UNIQUE INDEX "Equipment_assetTag_key" ON "Equipment"("assetTag");

-- CreateIndex
CREATE INDEX "Equipment_kind_status_idx" ON "Equipment"("kind", "status");

-- CreateIndex
CREATE INDEX "Calibration_equipmentId_calibratedAt_idx" ON "Calibration"("equipmentId", "calibratedAt");

-- CreateIndex
CREATE UNIQUE INDEX "Run_labNumber_key" ON "Run"("labNumber");

-- CreateIndex
CREATE INDEX "Run_state_assignedAt_idx" ON "Run"("state", "assignedAt");

-- CreateIndex
CREATE INDEX "Run_cellId_state_idx" ON "Run"("cellId", "state");

-- CreateIndex
CREATE INDEX "Run_performedById_state_idx" ON "Run"("performedById", "state");

-- CreateIndex
CREATE UNIQUE INDEX "RunStage_runId_sequence_key" ON "RunStage"("runId", "sequence");

-- CreateIndex
CREATE UNIQUE INDEX "Reading_correctsId_key" ON "Reading"("correctsId");

-- CreateIndex
CREATE INDEX "Reading_runId_sequence_idx" ON "Reading"("runId", "sequence");

-- CreateIndex
CREATE INDEX "Review_runId_idx" ON "Review"("runId");

-- CreateIndex
CREATE INDEX "Result_runId_idx" ON "Result"("runId");

-- CreateIndex
CREATE UNIQUE INDEX "Certificate_number_key" ON "Certificate"("number");

-- CreateIndex
CREATE INDEX "Certificate_clientOrganizationId_idx" ON "Certificate"("clientOrganizationId");

-- CreateIndex
CREATE UNIQUE INDEX "CertificateRevision_verificationCode_key" ON "CertificateRevision"("verificationCode");

-- CreateIndex
CREATE UNIQUE INDEX "CertificateRevision_supersedesId_key" ON "CertificateRevision"("supersedesId");

-- CreateIndex
CREATE UNIQUE INDEX "CertificateRevision_certificateId_revision_key" ON "CertificateRevision"("certificateId", "revision");

-- CreateIndex
CREATE INDEX "AuditLog_tableName_rowId_idx" ON "AuditLog"("tableName", "rowId");

-- CreateIndex
CREATE INDEX "AuditLog_occurredAt_idx" ON "AuditLog"("occurredAt");

-- AddForeignKey
ALTER TABLE "User" ADD CONSTRAINT "User_clientOrganizationId_fkey" FOREIGN KEY ("clientOrganizationId") REFERENCES "ClientOrganization"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "ApiToken" ADD CONSTRAINT "ApiToken_userId_fkey" FOREIGN KEY ("userId") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Project" ADD CONSTRAINT "Project_clientOrganizationId_fkey" FOREIGN KEY ("clientOrganizationId") REFERENCES "ClientOrganization"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Specification" ADD CONSTRAINT "Specification_projectId_fkey" FOREIGN KEY ("projectId") REFERENCES "Project"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "SpecificationLimit" ADD CONSTRAINT "SpecificationLimit_specificationId_fkey" FOREIGN KEY ("specificationId") REFERENCES "Specification"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Shipment" ADD CONSTRAINT "Shipment_clientOrganizationId_fkey" FOREIGN KEY ("clientOrganizationId") REFERENCES "ClientOrganization"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Shipment" ADD CONSTRAINT "Shipment_projectId_fkey" FOREIGN KEY ("projectId") REFERENCES "Project"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Shipment" ADD CONSTRAINT "Shipment_receivedById_fkey" FOREIGN KEY ("receivedById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Shipment" ADD CONSTRAINT "Shipment_acknowledgedById_fkey" FOREIGN KEY ("acknowledgedById") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "ShipmentPhoto" ADD CONSTRAINT "ShipmentPhoto_shipmentId_fkey" FOREIGN KEY ("shipmentId") REFERENCES "Shipment"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Roll" ADD CONSTRAINT "Roll_shipmentId_fkey" FOREIGN KEY ("shipmentId") REFERENCES "Shipment"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Roll" ADD CONSTRAINT "Roll_projectId_fkey" FOREIGN KEY ("projectId") REFERENCES "Project"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Roll" ADD CONSTRAINT "Roll_storageLocationId_fkey" FOREIGN KEY ("storageLocationId") REFERENCES "StorageLocation"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Coupon" ADD CONSTRAINT "Coupon_rollId_fkey" FOREIGN KEY ("rollId") REFERENCES "Roll"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Coupon" ADD CONSTRAINT "Coupon_cutById_fkey" FOREIGN KEY ("cutById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Coupon" ADD CONSTRAINT "Coupon_storageLocationId_fkey" FOREIGN KEY ("storageLocationId") REFERENCES "StorageLocation"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Specimen" ADD CONSTRAINT "Specimen_couponId_fkey" FOREIGN KEY ("couponId") REFERENCES "Coupon"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Specimen" ADD CONSTRAINT "Specimen_preparedById_fkey" FOREIGN KEY ("preparedById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Specimen" ADD CONSTRAINT "Specimen_storageLocationId_fkey" FOREIGN KEY ("storageLocationId") REFERENCES "StorageLocation"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "SpecimenChecklistItem" ADD CONSTRAINT "SpecimenChecklistItem_specimenId_fkey" FOREIGN KEY ("specimenId") REFERENCES "Specimen"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CustodyEvent" ADD CONSTRAINT "CustodyEvent_rollId_fkey" FOREIGN KEY ("rollId") REFERENCES "Roll"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CustodyEvent" ADD CONSTRAINT "CustodyEvent_couponId_fkey" FOREIGN KEY ("couponId") REFERENCES "Coupon"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CustodyEvent" ADD CONSTRAINT "CustodyEvent_specimenId_fkey" FOREIGN KEY ("specimenId") REFERENCES "Specimen"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CustodyEvent" ADD CONSTRAINT "CustodyEvent_fromLocationId_fkey" FOREIGN KEY ("fromLocationId") REFERENCES "StorageLocation"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CustodyEvent" ADD CONSTRAINT "CustodyEvent_toLocationId_fkey" FOREIGN KEY ("toLocationId") REFERENCES "StorageLocation"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CustodyEvent" ADD CONSTRAINT "CustodyEvent_actorId_fkey" FOREIGN KEY ("actorId") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Correction" ADD CONSTRAINT "Correction_actorId_fkey" FOREIGN KEY ("actorId") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTest" ADD CONSTRAINT "IndexTest_rollId_fkey" FOREIGN KEY ("rollId") REFERENCES "Roll"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "IndexTest" ADD CONSTRAINT "IndexTest_performedById_fkey" FOREIGN KEY ("performedById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Calibration" ADD CONSTRAINT "Calibration_equipmentId_fkey" FOREIGN KEY ("equipmentId") REFERENCES "Equipment"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Calibration" ADD CONSTRAINT "Calibration_recordedById_fkey" FOREIGN KEY ("recordedById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Run" ADD CONSTRAINT "Run_specimenId_fkey" FOREIGN KEY ("specimenId") REFERENCES "Specimen"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Run" ADD CONSTRAINT "Run_cellId_fkey" FOREIGN KEY ("cellId") REFERENCES "Equipment"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Run" ADD CONSTRAINT "Run_methodCode_fkey" FOREIGN KEY ("methodCode") REFERENCES "TestMethod"("code") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Run" ADD CONSTRAINT "Run_performedById_fkey" FOREIGN KEY ("performedById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "RunEquipment" ADD CONSTRAINT "RunEquipment_runId_fkey" FOREIGN KEY ("runId") REFERENCES "Run"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "RunEquipment" ADD CONSTRAINT "RunEquipment_equipmentId_fkey" FOREIGN KEY ("equipmentId") REFERENCES "Equipment"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "RunEquipment" ADD CONSTRAINT "RunEquipment_calibrationId_fkey" FOREIGN KEY ("calibrationId") REFERENCES "Calibration"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "RunStage" ADD CONSTRAINT "RunStage_runId_fkey" FOREIGN KEY ("runId") REFERENCES "Run"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "RunStage" ADD CONSTRAINT "RunStage_recordedById_fkey" FOREIGN KEY ("recordedById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Reading" ADD CONSTRAINT "Reading_runId_fkey" FOREIGN KEY ("runId") REFERENCES "Run"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Reading" ADD CONSTRAINT "Reading_correctsId_fkey" FOREIGN KEY ("correctsId") REFERENCES "Reading"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Reading" ADD CONSTRAINT "Reading_recordedById_fkey" FOREIGN KEY ("recordedById") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Review" ADD CONSTRAINT "Review_runId_fkey" FOREIGN KEY ("runId") REFERENCES "Run"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Review" ADD CONSTRAINT "Review_reviewerId_fkey" FOREIGN KEY ("reviewerId") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Result" ADD CONSTRAINT "Result_runId_fkey" FOREIGN KEY ("runId") REFERENCES "Run"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Result" ADD CONSTRAINT "Result_approvedById_fkey" FOREIGN KEY ("approvedById") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Certificate" ADD CONSTRAINT "Certificate_projectId_fkey" FOREIGN KEY ("projectId") REFERENCES "Project"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Certificate" ADD CONSTRAINT "Certificate_clientOrganizationId_fkey" FOREIGN KEY ("clientOrganizationId") REFERENCES "ClientOrganization"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CertificateRevision" ADD CONSTRAINT "CertificateRevision_certificateId_fkey" FOREIGN KEY ("certificateId") REFERENCES "Certificate"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CertificateRevision" ADD CONSTRAINT "CertificateRevision_supersedesId_fkey" FOREIGN KEY ("supersedesId") REFERENCES "CertificateRevision"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CertificateResult" ADD CONSTRAINT "CertificateResult_revisionId_fkey" FOREIGN KEY ("revisionId") REFERENCES "CertificateRevision"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CertificateResult" ADD CONSTRAINT "CertificateResult_resultId_fkey" FOREIGN KEY ("resultId") REFERENCES "Result"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Signature" ADD CONSTRAINT "Signature_revisionId_fkey" FOREIGN KEY ("revisionId") REFERENCES "CertificateRevision"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Signature" ADD CONSTRAINT "Signature_signerId_fkey" FOREIGN KEY ("signerId") REFERENCES "User"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

