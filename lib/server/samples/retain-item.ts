import "server-only";
import { retainItemSchema } from "@/lib/validation/samples";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { applyCustodyAction } from "../custody/apply-custody-action";
import { parseOrThrow } from "../validation/parse";

const DAY_MS = 86_400_000;

/** Puts an item on retention until a date (the lab's retention period unless given), after which it may be disposed of. */
export async function retainItem(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "sample.move");
  const input = parseOrThrow(retainItemSchema, options.input);
  const now = options.now ?? new Date();
  return withActor(options.actor, async (tx) => {
    const lab = await tx.laboratory.findUnique({ where: { id: "lab" }, select: { retentionDays: true } });
    const days = input.retainDays ?? lab?.retentionDays ?? 90;
    const retainUntil = new Date(now.getTime() + days * DAY_MS);
    return applyCustodyAction(tx, { actor: options.actor, kind: input.kind, id: input.id, action: "RETAINED", expectedVersion: input.version, retainUntil, note: input.note || `Retained ${days} days` });
  });
}
