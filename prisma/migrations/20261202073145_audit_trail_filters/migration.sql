
-- CreateIndex
CREATE INDEX "AuditLog_tableName_id_idx" ON "AuditLog"("tableName", "id");

-- CreateIndex
CREATE INDEX "AuditLog_actorId_id_idx" ON "AuditLog"("actorId", "id");

