
-- CreateTable
CREATE TABLE "NoticeDelivery" (
    "id" TEXT NOT NULL,
    "key" TEXT NOT NULL,
    "kind" TEXT NOT NULL,
    "recipients" TEXT[],
    "subject" TEXT NOT NULL,
    "transport" TEXT NOT NULL,
    "createdAt" TIMESTAMP(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "deliveredAt" TIMESTAMP(3),
    "failure" TEXT,

    CONSTRAINT "NoticeDelivery_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE UNIQUE INDEX "NoticeDelivery_key_key" ON "NoticeDelivery"("key");


-- Written by hand ---------------------------------------------------------------------------------------
ALTER TABLE "NoticeDelivery" ALTER COLUMN "createdAt" SET DEFAULT (CURRENT_TIMESTAMP AT TIME ZONE 'UTC');
-- Who was told what, and when, is a record: audited, never removed (the app's role has no DELETE anyway).
CREATE TRIGGER audit_row AFTER INSERT OR UPDATE OR DELETE ON "NoticeDelivery" FOR EACH ROW EXECUTE FUNCTION seepline_audit_row('id');
CREATE TRIGGER refuse_truncate BEFORE TRUNCATE ON "NoticeDelivery" FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change();
CREATE TRIGGER notice_delivery_no_delete BEFORE DELETE ON "NoticeDelivery" FOR EACH ROW EXECUTE FUNCTION seepline_refuse_change();
