import "server-only";
import { resultUnitsSchema } from "@/lib/validation/account";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/** Anyone chooses the units their own screens show results in (SI or centimetre units). */
export async function setOwnResultUnits(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "account.self");
  const input = parseOrThrow(resultUnitsSchema, options.input);
  return withActor(options.actor, (tx) =>
    tx.user.update({ where: { id: options.actor.id }, data: { resultUnits: input.resultUnits, version: { increment: 1 } }, select: { resultUnits: true } }),
  );
}
