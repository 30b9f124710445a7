import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { ItemState } from "@/lib/generated/prisma/client";
import { correctReceiptSchema, rollEntrySchema, ROLL_CORRECTABLE_FIELDS, SHIPMENT_CORRECTABLE_FIELDS, shipmentDetailsSchema } from "@/lib/validation/intake";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { fromWallTime } from "@/lib/format/time-zone";
import { withActor, type Tx } from "../db/transaction";
import { requireEventOrder } from "../custody/require-event-order";
import { readLabTimeZone } from "../lab/read-lab-time-zone";
import { parseOrThrow } from "../validation/parse";

function asText(value: unknown): string {
  if (value instanceof Date) return value.toISOString();
  return value === null || value === undefined ? "" : String(value);
}

/** The earliest coupon cut from any roll of the shipment: a corrected receipt time may not be after it. */
async function firstCutOfShipment(tx: Tx, shipmentId: string) {
  const coupon = await tx.coupon.findFirst({ where: { roll: { shipmentId } }, orderBy: { cutAt: "asc" }, select: { labNumber: true, cutAt: true, roll: { select: { labNumber: true } } } });
  return coupon ? { at: coupon.cutAt, what: `coupon ${coupon.labNumber} was cut from roll ${coupon.roll.labNumber}` } : null;
}

/**
 * Changes one field of a receipt (the shipment or one of its rolls), keeping the old value, the new
 * value and the reason as a Correction row beside the audit trail, and as a custody event of every roll
 * concerned (the receipt then reads "amended"). Only the intake side may do this: technicians cannot
 * change receipts. The new value is checked by the same schema as at intake; a received time is typed as
 * the lab's wall-clock time and may not be after anything cut from the shipment's rolls.
 */
export async function correctReceipt(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "shipment.correct");
  const input = parseOrThrow(correctReceiptSchema, options.input);
  const fields: readonly string[] = input.target === "shipment" ? SHIPMENT_CORRECTABLE_FIELDS : ROLL_CORRECTABLE_FIELDS;
  if (!fields.includes(input.field)) throw new AppError("INVALID_INPUT", `${input.field} cannot be corrected here.`, { fieldErrors: { field: "Choose a field that can be corrected." } });

  return withActor(options.actor, async (tx) => {
    const zone = await readLabTimeZone(tx);
    const fieldSchema = input.target === "shipment" ? shipmentDetailsSchema.shape[input.field as (typeof SHIPMENT_CORRECTABLE_FIELDS)[number]] : rollEntrySchema.shape[input.field as (typeof ROLL_CORRECTABLE_FIELDS)[number]];
    const typed = input.field === "receivedAt" ? (fromWallTime(input.value, zone)?.toISOString() ?? input.value) : input.value;
    const checked = fieldSchema.safeParse(typed);
    if (!checked.success) throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { value: checked.error.issues[0]?.message ?? "Not a valid value." } });
    const newValue = checked.data as unknown;

    const current =
      input.target === "shipment"
        ? await tx.shipment.findUnique({ where: { id: input.id } })
        : await tx.roll.findUnique({ where: { id: input.id } });
    if (!current) throw new AppError("NOT_FOUND");
    if (current.version !== input.version) throw new AppError("CONFLICT", `${current.labNumber} was changed by someone else since you opened it; reload and try again.`);
    const oldValue = (current as Record<string, unknown>)[input.field];
    if (asText(oldValue) === asText(newValue)) throw new AppError("INVALID_INPUT", "The new value is the same as the present one.", { fieldErrors: { value: "Unchanged." } });
    if (input.field === "receivedAt")
      requireEventOrder("value", { label: "The corrected receipt time", at: newValue as Date, now: options.now ?? new Date(), zone, before: [await firstCutOfShipment(tx, current.id)] });

    const data = { [input.field]: newValue, version: { increment: 1 } };
    const updated =
      input.target === "shipment"
        ? await tx.shipment.updateMany({ where: { id: input.id, version: input.version }, data })
        : await tx.roll.updateMany({ where: { id: input.id, version: input.version }, data });
    if (updated.count !== 1) throw new AppError("CONFLICT");
    await tx.correction.create({
      data: { entity: input.target === "shipment" ? "Shipment" : "Roll", entityId: input.id, field: input.field, oldValue: asText(oldValue), newValue: asText(newValue), reason: input.reason, actorId: options.actor.id },
    });
    // The correction is a custody event of each roll it concerns: the roll itself, or every roll of the shipment.
    const rolls = input.target === "roll" ? [current as { id: string; state: ItemState }] : await tx.roll.findMany({ where: { shipmentId: current.id }, select: { id: true, state: true } });
    const what = input.target === "roll" ? input.field : `shipment ${current.labNumber} ${input.field}`;
    for (const roll of rolls)
      await tx.custodyEvent.create({ data: { action: "CORRECTED", rollId: roll.id, fromState: roll.state, toState: roll.state, actorId: options.actor.id, note: `${what}: ${asText(oldValue)} → ${asText(newValue)} (${input.reason})` } });
    return { labNumber: current.labNumber };
  });
}
