import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Retained items whose retention period has ended, ready to be disposed of. */
export async function listRetentionDue(options: { actor: CurrentUser; now?: Date }) {
  requirePermission(options.actor, "sample.view");
  const now = options.now ?? new Date();
  const where = { state: "RETAINED" as const, retainUntil: { lte: now } };
  const select = { id: true, labNumber: true, retainUntil: true, storageLocation: { select: { code: true } } } as const;
  const db = getDb();
  const [rolls, coupons, specimens] = await Promise.all([
    db.roll.findMany({ where, select, orderBy: { retainUntil: "asc" }, take: 500 }),
    db.coupon.findMany({ where, select, orderBy: { retainUntil: "asc" }, take: 500 }),
    db.specimen.findMany({ where, select, orderBy: { retainUntil: "asc" }, take: 500 }),
  ]);
  return [
    ...rolls.map((r) => ({ ...r, kind: "roll" as const })),
    ...coupons.map((c) => ({ ...c, kind: "coupon" as const })),
    ...specimens.map((s) => ({ ...s, kind: "specimen" as const })),
  ];
}
