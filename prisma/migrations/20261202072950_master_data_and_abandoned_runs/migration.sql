
-- AlterEnum
ALTER TYPE "CustodyAction" ADD VALUE 'WITHDRAWN';

-- AlterEnum
ALTER TYPE "RunState" ADD VALUE 'ABANDONED';

-- AlterTable
ALTER TABLE "Laboratory" ADD COLUMN     "timeZone" TEXT NOT NULL DEFAULT 'UTC';

-- AlterTable
ALTER TABLE "ClientOrganization" ADD COLUMN     "active" BOOLEAN NOT NULL DEFAULT true,
ADD COLUMN     "version" INTEGER NOT NULL DEFAULT 1;

-- AlterTable
ALTER TABLE "Project" ADD COLUMN     "active" BOOLEAN NOT NULL DEFAULT true,
ADD COLUMN     "version" INTEGER NOT NULL DEFAULT 1;

-- AlterTable
ALTER TABLE "Roll" ADD COLUMN     "conditionNotes" TEXT NOT NULL DEFAULT '';

-- AlterTable: the order custody events were recorded in, for events of the same moment.
ALTER TABLE "CustodyEvent" ADD COLUMN     "sequence" BIGSERIAL NOT NULL;

-- AlterTable
ALTER TABLE "Run" ADD COLUMN     "abandonedAt" TIMESTAMP(3),
ADD COLUMN     "abandonedById" TEXT,
ADD COLUMN     "abandonmentReason" TEXT;

-- CreateTable
CREATE TABLE "ClientContact" (
    "id" TEXT NOT NULL,
    "clientOrganizationId" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "email" TEXT NOT NULL,
    "phone" TEXT,
    "jobTitle" TEXT,
    "userId" TEXT,
    "active" BOOLEAN NOT NULL DEFAULT true,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMP(3) NOT NULL,
    "version" INTEGER NOT NULL DEFAULT 1,

    CONSTRAINT "ClientContact_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE UNIQUE INDEX "ClientContact_userId_key" ON "ClientContact"("userId");

-- CreateIndex
CREATE UNIQUE INDEX "ClientContact_clientOrganizationId_email_key" ON "ClientContact"("clientOrganizationId", "email");

-- AddForeignKey
ALTER TABLE "ClientContact" ADD CONSTRAINT "ClientContact_clientOrganizationId_fkey" FOREIGN KEY ("clientOrganizationId") REFERENCES "ClientOrganization"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "ClientContact" ADD CONSTRAINT "ClientContact_userId_fkey" FOREIGN KEY ("userId") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Run" ADD CONSTRAINT "Run_abandonedById_fkey" FOREIGN KEY ("abandonedById") REFERENCES "User"("id") ON DELETE SET NULL ON UPDATE CASCADE;


-- Contacts are record tables like the rest: every change is audited.
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "ClientContact" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('id');

-- A contact is someone the lab can write to, so an e-mail address is required.
ALTER TABLE "ClientContact" ADD CONSTRAINT client_contact_has_email CHECK ("email" ~ '^[^@[:space:]]+@[^@[:space:]]+$');

-- An abandoned run names when, by whom and why, all three or none. (The new RunState value cannot be used in
-- the transaction that adds it, so the state itself is kept in step by the application.)
ALTER TABLE "Run" ADD CONSTRAINT run_abandonment_complete
  CHECK (num_nulls("abandonedAt", "abandonedById", "abandonmentReason") IN (0, 3)
         AND ("abandonmentReason" IS NULL OR length(trim("abandonmentReason")) >= 5));

-- Abandoned runs never reach review: no review or result may be written for one.
CREATE OR REPLACE FUNCTION seepline_run_not_abandoned() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM "Run" WHERE id = NEW."runId" AND state::text = 'ABANDONED') THEN
    RAISE EXCEPTION 'run % was abandoned; it cannot be reviewed or given results', NEW."runId" USING ERRCODE = 'check_violation';
  END IF;
  RETURN NEW;
END;
$$;
CREATE TRIGGER review_run_not_abandoned BEFORE INSERT ON "Review" FOR EACH ROW EXECUTE FUNCTION seepline_run_not_abandoned();
CREATE TRIGGER result_run_not_abandoned BEFORE INSERT ON "Result" FOR EACH ROW EXECUTE FUNCTION seepline_run_not_abandoned();

-- The lab always keeps an active administrator: a change that takes the role or the account away from the
-- last one is refused. (The app locks the administrators' rows and says so first; this is the backstop.)
CREATE OR REPLACE FUNCTION seepline_keep_an_admin() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF OLD.role::text = 'LAB_ADMIN' AND OLD.active AND NOT (NEW.role::text = 'LAB_ADMIN' AND NEW.active)
     AND NOT EXISTS (SELECT 1 FROM "User" WHERE role::text = 'LAB_ADMIN' AND active AND id <> OLD.id) THEN
    RAISE EXCEPTION 'the last active lab administrator cannot lose the role or be deactivated' USING ERRCODE = 'check_violation';
  END IF;
  RETURN NEW;
END;
$$;
CREATE TRIGGER user_keep_an_admin BEFORE UPDATE OF role, active ON "User" FOR EACH ROW EXECUTE FUNCTION seepline_keep_an_admin();
