import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { setUserActiveSchema } from "@/lib/validation/account";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * Deactivates or reactivates a user. Deactivation also ends the user's sessions (sessionVersion).
 * The version check refuses a change made on a stale screen.
 */
export async function setUserActive(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "user.manage");
  const input = parseOrThrow(setUserActiveSchema, options.input);
  if (input.userId === options.actor.id && !input.active)
    throw new AppError("INVALID_INPUT", "You cannot deactivate your own account; ask another administrator.");
  return withActor(options.actor, async (tx) => {
    const updated = await tx.user.updateMany({
      where: { id: input.userId, version: input.version },
      data: {
        active: input.active,
        version: { increment: 1 },
        ...(input.active ? {} : { sessionVersion: { increment: 1 } }),
      },
    });
    if (updated.count === 0) {
      const exists = await tx.user.findUnique({ where: { id: input.userId }, select: { id: true } });
      throw new AppError(exists ? "CONFLICT" : "NOT_FOUND");
    }
  });
}
