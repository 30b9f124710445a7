import "server-only";
import type { ItemKind } from "@/lib/custody/state-machine";
import { AppError } from "@/lib/errors/app-error";
import { disposeRetainedSchema } from "@/lib/validation/samples";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor, type Tx } from "../db/transaction";
import { applyCustodyAction } from "../custody/apply-custody-action";
import { parseOrThrow } from "../validation/parse";

async function retainedUntil(tx: Tx, kind: ItemKind, id: string) {
  const select = { labNumber: true, state: true, retainUntil: true } as const;
  if (kind === "roll") return tx.roll.findUnique({ where: { id }, select });
  if (kind === "coupon") return tx.coupon.findUnique({ where: { id }, select });
  return tx.specimen.findUnique({ where: { id }, select });
}

/**
 * Disposes of a batch of retained items whose retention period has ended, one custody event each.
 * All or nothing: if any item is not due, nothing is disposed and each such item is named.
 */
export async function disposeRetained(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "sample.move");
  const input = parseOrThrow(disposeRetainedSchema, options.input);
  const now = options.now ?? new Date();
  return withActor(options.actor, async (tx) => {
    const problems: string[] = [];
    for (const item of input.items) {
      const row = await retainedUntil(tx, item.kind, item.id);
      if (!row) problems.push(`a ${item.kind} that does not exist`);
      else if (row.state !== "RETAINED") problems.push(`${row.labNumber} is not on retention`);
      else if (!row.retainUntil || row.retainUntil > now) problems.push(`${row.labNumber} is retained until ${row.retainUntil?.toISOString().slice(0, 10) ?? "an unknown date"}`);
    }
    if (problems.length > 0) throw new AppError("ILLEGAL_TRANSITION", `Nothing was disposed of: ${problems.join("; ")}.`);
    const disposed: string[] = [];
    for (const item of input.items) {
      const result = await applyCustodyAction(tx, { actor: options.actor, kind: item.kind, id: item.id, action: "DISPOSED", at: now, note: input.note });
      disposed.push(result.labNumber);
    }
    return { disposed };
  }, { timeoutMs: 60_000 });
}
