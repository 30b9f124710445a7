import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { cutCouponSchema } from "@/lib/validation/samples";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { allocateLabNumber } from "../db/allocate-lab-number";
import { withActor } from "../db/transaction";
import { applyCustodyAction } from "../custody/apply-custody-action";
import { recordNewItemEvent } from "../custody/record-new-item-event";
import { requireEventOrder } from "../custody/require-event-order";
import { readLabTimeZone } from "../lab/read-lab-time-zone";
import { parseOrThrow } from "../validation/parse";

/**
 * The technician cuts a coupon from a roll: the roll's custody records the cut, the coupon gets its number.
 * The cut cannot be before the roll was received, nor in the future.
 */
export async function cutCoupon(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "sample.cut");
  const input = parseOrThrow(cutCouponSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const source = await tx.roll.findUnique({ where: { id: input.rollId }, select: { labNumber: true, shipment: { select: { labNumber: true, receivedAt: true } } } });
    if (!source) throw new AppError("NOT_FOUND", "That roll does not exist.");
    requireEventOrder("cutAt", {
      label: "The cut time", at: input.cutAt, now: options.now ?? new Date(), zone: await readLabTimeZone(tx),
      after: [{ at: source.shipment.receivedAt, what: `roll ${source.labNumber} was received with shipment ${source.shipment.labNumber}` }],
    });
    const location = await tx.storageLocation.findUnique({ where: { id: input.storageLocationId }, select: { active: true } });
    if (!location?.active) throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { storageLocationId: "Choose a storage location in use." } });
    const labNumber = await allocateLabNumber(tx, "coupon", input.cutAt);
    const roll = await applyCustodyAction(tx, { actor: options.actor, kind: "roll", id: input.rollId, action: "CUT", expectedVersion: input.rollVersion, at: input.cutAt, note: input.intendedMethodCode ? `Coupon ${labNumber} for ASTM ${input.intendedMethodCode}` : `Coupon ${labNumber}` });
    const coupon = await tx.coupon.create({
      data: {
        labNumber, rollId: input.rollId, positionInSample: input.positionInSample, lengthMm: input.lengthMm, widthMm: input.widthMm,
        cutById: options.actor.id, cutAt: input.cutAt, storageLocationId: input.storageLocationId, intendedMethodCode: input.intendedMethodCode ?? null,
      },
      select: { id: true, labNumber: true },
    });
    await recordNewItemEvent(tx, { actor: options.actor, kind: "coupon", id: coupon.id, action: "CUT", state: "CUT", locationId: input.storageLocationId, at: input.cutAt, note: `From roll ${roll.labNumber}` });
    return coupon;
  });
}
