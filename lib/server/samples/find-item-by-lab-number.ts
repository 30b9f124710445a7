import "server-only";
import { parseLabNumber } from "@/lib/numbering/lab-number";
import { can } from "@/lib/policy/permissions";
import type { CurrentUser } from "../auth/current-user";
import { getDb } from "../db/client";

/**
 * Where a typed or scanned lab number leads: the item's page address, or null when there is no such
 * item (or the person may not see that kind of item).
 */
export async function findItemAddress(options: { actor: CurrentUser; text: string }): Promise<string | null> {
  const parsed = parseLabNumber(options.text);
  if (!parsed) return null;
  const labNumber = options.text.trim().toUpperCase();
  const db = getDb();
  const where = { where: { labNumber }, select: { labNumber: true } } as const;
  const seeSamples = can(options.actor.role, "sample.view");
  switch (parsed.kind) {
    case "shipment":
      return can(options.actor.role, "shipment.view") && (await db.shipment.findUnique(where)) ? `/intake/shipments/${labNumber}` : null;
    case "roll":
      return seeSamples && (await db.roll.findUnique(where)) ? `/samples/rolls/${labNumber}` : null;
    case "coupon":
      return seeSamples && (await db.coupon.findUnique(where)) ? `/samples/coupons/${labNumber}` : null;
    case "specimen":
      return seeSamples && (await db.specimen.findUnique(where)) ? `/samples/specimens/${labNumber}` : null;
    case "run":
      return can(options.actor.role, "run.view") && (await db.run.findUnique(where)) ? `/runs/${labNumber}` : null;
    case "certificate":
      return can(options.actor.role, "certificate.view") && (await db.certificate.findUnique({ where: { number: labNumber }, select: { id: true } })) ? `/certificates/${labNumber}` : null;
  }
}
