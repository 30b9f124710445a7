"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { acknowledgeShipment } from "@/lib/server/intake/acknowledge-shipment";
import { correctReceipt } from "@/lib/server/intake/correct-receipt";
import { logShipment } from "@/lib/server/intake/log-shipment";

export async function logShipmentAction(input: unknown) {
  return toActionResult(async () => {
    const shipment = await logShipment({ actor: await requireUser("shipment.create"), input });
    revalidatePath("/intake");
    return { labNumber: shipment.labNumber, rollLabNumbers: shipment.rolls.map((r) => r.labNumber) };
  }, "Shipment logged.");
}

export async function acknowledgeShipmentAction(input: unknown) {
  return toActionResult(async () => {
    const result = await acknowledgeShipment({ actor: await requireUser("shipment.acknowledge"), input });
    revalidatePath(`/intake/shipments/${result.labNumber}`);
    return result;
  }, "Receipt acknowledged. Its details now change only by correction, with a reason.");
}

export async function correctReceiptAction(input: unknown) {
  return toActionResult(async () => {
    const result = await correctReceipt({ actor: await requireUser("shipment.correct"), input });
    revalidatePath("/intake");
    return result;
  }, "Correction recorded.");
}
