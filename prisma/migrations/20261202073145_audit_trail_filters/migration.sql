-- The audit trail's person filter pages newest first by id; this index walks one person's rows in that order.
-- CreateIndex
CREATE INDEX "AuditLog_actorId_id_idx" ON "AuditLog"("actorId", "id");
