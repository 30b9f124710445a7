
-- CreateIndex
CREATE INDEX "Shipment_receivedAt_idx" ON "Shipment"("receivedAt");

-- CreateIndex
CREATE INDEX "Roll_shipmentId_idx" ON "Roll"("shipmentId");

-- CreateIndex
CREATE INDEX "Roll_rollNumber_idx" ON "Roll"("rollNumber");

-- CreateIndex
CREATE INDEX "Coupon_cutAt_idx" ON "Coupon"("cutAt");

-- CreateIndex
CREATE INDEX "Coupon_state_cutAt_idx" ON "Coupon"("state", "cutAt");

-- CreateIndex
CREATE INDEX "Specimen_preparedAt_idx" ON "Specimen"("preparedAt");

