
-- CreateEnum
CREATE TYPE "ApiTokenScope" AS ENUM ('CLIENT_READ', 'LAB_READ', 'READINGS_POST');

-- AlterTable
ALTER TABLE "ApiToken" ADD COLUMN     "cellIds" TEXT[] DEFAULT ARRAY[]::TEXT[],
ADD COLUMN     "prefix" TEXT NOT NULL DEFAULT '',
ADD COLUMN     "revokedById" TEXT,
ADD COLUMN     "scope" "ApiTokenScope" NOT NULL DEFAULT 'LAB_READ';

-- CreateTable
CREATE TABLE "ApiRequest" (
    "id" TEXT NOT NULL,
    "tokenId" TEXT NOT NULL,
    "tokenName" TEXT NOT NULL,
    "userId" TEXT NOT NULL,
    "method" TEXT NOT NULL,
    "path" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "ApiRequest_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "ApiRateWindow" (
    "tokenId" TEXT NOT NULL,
    "windowStartedAt" TIMESTAMP(3) NOT NULL,
    "count" INTEGER NOT NULL DEFAULT 0,

    CONSTRAINT "ApiRateWindow_pkey" PRIMARY KEY ("tokenId")
);

-- CreateTable
CREATE TABLE "ApiReadingKey" (
    "runId" TEXT NOT NULL,
    "key" TEXT NOT NULL,
    "bodySha256" TEXT NOT NULL,
    "sequence" INTEGER NOT NULL,
    "tokenId" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "ApiReadingKey_pkey" PRIMARY KEY ("runId","key")
);

-- CreateIndex
CREATE INDEX "ApiRequest_tokenId_createdAt_idx" ON "ApiRequest"("tokenId", "createdAt");

-- CreateIndex
CREATE INDEX "ApiToken_userId_createdAt_idx" ON "ApiToken"("userId", "createdAt");

-- AddForeignKey
ALTER TABLE "ApiRequest" ADD CONSTRAINT "ApiRequest_tokenId_fkey" FOREIGN KEY ("tokenId") REFERENCES "ApiToken"("id") ON DELETE RESTRICT ON UPDATE CASCADE;


-- Written by hand ---------------------------------------------------------------------------------------

-- A key is kept for the run it was posted to and the token that posted it (not modelled as relations, so the
-- Run and ApiToken models stay as they are).
ALTER TABLE "ApiReadingKey" ADD CONSTRAINT "ApiReadingKey_runId_fkey" FOREIGN KEY ("runId") REFERENCES "Run"("id") ON DELETE RESTRICT ON UPDATE CASCADE;
ALTER TABLE "ApiReadingKey" ADD CONSTRAINT "ApiReadingKey_tokenId_fkey" FOREIGN KEY ("tokenId") REFERENCES "ApiToken"("id") ON DELETE RESTRICT ON UPDATE CASCADE;
ALTER TABLE "ApiToken" ADD CONSTRAINT api_token_instrument_names_cells
  CHECK ("scope" <> 'READINGS_POST' OR cardinality("cellIds") >= 1);

-- Times the database fills in are UTC (20261202090100_utc_timestamps).
ALTER TABLE "ApiRequest" ALTER COLUMN "createdAt" SET DEFAULT (CURRENT_TIMESTAMP AT TIME ZONE 'UTC');
ALTER TABLE "ApiReadingKey" ALTER COLUMN "createdAt" SET DEFAULT (CURRENT_TIMESTAMP AT TIME ZONE 'UTC');

-- Requests made with a token and the keys of posted readings are records: audited, never changed or removed.
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "ApiRequest" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('id');
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "ApiReadingKey" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('runId,key');
CREATE TRIGGER refuse_truncate BEFORE TRUNCATE ON "ApiRequest" FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER refuse_truncate BEFORE TRUNCATE ON "ApiReadingKey" FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER api_request_append_only BEFORE UPDATE OR DELETE ON "ApiRequest" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER api_reading_key_append_only BEFORE UPDATE OR DELETE ON "ApiReadingKey" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
REVOKE UPDATE, DELETE, TRUNCATE ON "ApiRequest" FROM seepline_runtime;
REVOKE UPDATE, DELETE, TRUNCATE ON "ApiReadingKey" FROM seepline_runtime;

-- The rate-limit counter is not a record (like SignInThrottle): one row per token, rewritten each minute.
