import "server-only";
import type { CustodyActionName, ItemKind, ItemStateName } from "@/lib/custody/state-machine";
import type { Actor, Tx } from "../db/transaction";
import { CUSTODY_ITEM_FIELD } from "./item-fields";

/** The first custody event of an item just created (received, cut or prepared): no from-state. */
export async function recordNewItemEvent(
  tx: Tx,
  options: { actor: Actor; kind: ItemKind; id: string; action: CustodyActionName; state: ItemStateName; locationId: string | null; at: Date; note?: string },
): Promise<void> {
  await tx.custodyEvent.create({
    data: {
      action: options.action,
      [CUSTODY_ITEM_FIELD[options.kind]]: options.id,
      toState: options.state,
      toLocationId: options.locationId,
      actorId: options.actor.id,
      occurredAt: options.at,
      note: options.note ?? "",
    },
  });
}
