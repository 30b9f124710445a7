import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { moveItemSchema } from "@/lib/validation/samples";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { applyCustodyAction } from "../custody/apply-custody-action";
import { parseOrThrow } from "../validation/parse";

/** Moves a roll, coupon or specimen to another storage place: a custody event with from and to. */
export async function moveItem(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "sample.move");
  const input = parseOrThrow(moveItemSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const location = await tx.storageLocation.findUnique({ where: { id: input.toLocationId }, select: { active: true } });
    if (!location?.active) throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { toLocationId: "Choose a storage location in use." } });
    return applyCustodyAction(tx, { actor: options.actor, kind: input.kind, id: input.id, action: "MOVED", expectedVersion: input.version, toLocationId: input.toLocationId, note: input.note });
  });
}
