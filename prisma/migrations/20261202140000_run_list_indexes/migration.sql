
-- CreateIndex
CREATE INDEX "Run_assignedAt_labNumber_idx" ON "Run"("assignedAt", "labNumber");

-- CreateIndex
CREATE INDEX "Run_cellId_assignedAt_idx" ON "Run"("cellId", "assignedAt");

-- CreateIndex
CREATE INDEX "Run_performedById_assignedAt_idx" ON "Run"("performedById", "assignedAt");

-- CreateIndex
CREATE INDEX "Run_methodCode_assignedAt_idx" ON "Run"("methodCode", "assignedAt");

