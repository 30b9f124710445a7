import "server-only";
import type { ItemKind } from "@/lib/custody/state-machine";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { CUSTODY_ITEM_FIELD } from "../custody/item-fields";

const ENTITY: Record<ItemKind, string> = { roll: "Roll", coupon: "Coupon", specimen: "Specimen" };
/** An item's custody ledger (oldest first) and its corrections, each with the person's name. */
export async function getItemHistory(options: { actor: CurrentUser; kind: ItemKind; id: string }) {
  requirePermission(options.actor, "sample.view");
  const db = getDb();
  const [events, corrections] = await Promise.all([
    db.custodyEvent.findMany({
      where: { [CUSTODY_ITEM_FIELD[options.kind]]: options.id },
      orderBy: [{ occurredAt: "asc" }, { sequence: "asc" }],
      select: {
        id: true, action: true, fromState: true, toState: true, occurredAt: true, note: true,
        actor: { select: { name: true } }, fromLocation: { select: { code: true } }, toLocation: { select: { code: true } },
      },
    }),
    db.correction.findMany({
      where: { entity: ENTITY[options.kind], entityId: options.id },
      orderBy: { createdAt: "asc" },
      select: { id: true, field: true, oldValue: true, newValue: true, reason: true, createdAt: true, actor: { select: { name: true } } },
    }),
  ]);
  return { events, corrections };
}
