import "server-only";
import type { CustodyActionName, ItemKind, ItemStateName } from "@/lib/custody/state-machine";
import type { Actor, Tx } from "../db/transaction";

const ITEM_FIELD: Record<ItemKind, "rollId" | "couponId" | "specimenId"> = { roll: "rollId", coupon: "couponId", specimen: "specimenId" };

/** The first custody event of an item just created (received, cut or prepared): no from-state. */
export async function recordNewItemEvent(
  tx: Tx,
  options: { actor: Actor; kind: ItemKind; id: string; action: CustodyActionName; state: ItemStateName; locationId: string | null; at: Date; note?: string },
): Promise<void> {
  await tx.custodyEvent.create({
    data: {
      action: options.action,
      [ITEM_FIELD[options.kind]]: options.id,
      toState: options.state,
      toLocationId: options.locationId,
      actorId: options.actor.id,
      occurredAt: options.at,
      note: options.note ?? "",
    },
  });
}
