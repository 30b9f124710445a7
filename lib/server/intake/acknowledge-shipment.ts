import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { acknowledgeShipmentSchema } from "@/lib/validation/intake";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/** Marks the receipt acknowledged to the client; from then on its data changes only by correction. */
export async function acknowledgeShipment(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "shipment.acknowledge");
  const input = parseOrThrow(acknowledgeShipmentSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const shipment = await tx.shipment.findUnique({ where: { id: input.shipmentId }, select: { labNumber: true, acknowledgedAt: true, version: true } });
    if (!shipment) throw new AppError("NOT_FOUND");
    if (shipment.acknowledgedAt) throw new AppError("ILLEGAL_TRANSITION", `${shipment.labNumber} was already acknowledged.`);
    const updated = await tx.shipment.updateMany({
      where: { id: input.shipmentId, version: input.version },
      data: { acknowledgedAt: new Date(), acknowledgedById: options.actor.id, version: { increment: 1 } },
    });
    if (updated.count !== 1) throw new AppError("CONFLICT");
    return { labNumber: shipment.labNumber };
  });
}
