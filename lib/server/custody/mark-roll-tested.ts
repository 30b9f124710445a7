import "server-only";
import type { Actor, Tx } from "../db/transaction";
import { applyCustodyAction } from "./apply-custody-action";

/**
 * A roll under test becomes tested once a run on one of its specimens is approved and none of its
 * specimens is still in a cell: the same moment the client's view of the roll reaches "Tested". Called in
 * the transaction that approves a run or abandons one; a later permeation puts the roll back under test.
 */
export async function markRollTestedIfDone(tx: Tx, options: { actor: Actor; rollId: string; at: Date; note: string }) {
  const roll = await tx.roll.findUniqueOrThrow({ where: { id: options.rollId }, select: { state: true } });
  if (roll.state !== "UNDER_TEST") return null;
  const ofRoll = { coupon: { rollId: options.rollId } };
  const inCell = await tx.specimen.count({ where: { ...ofRoll, state: { in: ["ASSIGNED", "UNDER_TEST"] } } });
  if (inCell > 0) return null;
  const approved = await tx.run.count({ where: { state: "APPROVED", specimen: ofRoll } });
  if (approved === 0) return null;
  return applyCustodyAction(tx, { actor: options.actor, kind: "roll", id: options.rollId, action: "TESTED", at: options.at, note: options.note });
}
