import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { setUserActiveSchema } from "@/lib/validation/account";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { refuseLosingLastAdmin } from "./refuse-losing-last-admin";

/**
 * Deactivates or reactivates a user. Deactivation also ends the user's sessions (sessionVersion); the last
 * active administrator cannot be deactivated. The version check refuses a change made on a stale screen.
 */
export async function setUserActive(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "user.manage");
  const input = parseOrThrow(setUserActiveSchema, options.input);
  if (input.userId === options.actor.id && !input.active)
    throw new AppError("INVALID_INPUT", "You cannot deactivate your own account; ask another administrator.");
  return withActor(options.actor, async (tx) => {
    const user = await tx.user.findUnique({ where: { id: input.userId }, select: { id: true, name: true, role: true, active: true } });
    if (!user) throw new AppError("NOT_FOUND");
    await refuseLosingLastAdmin(tx, user, { role: user.role, active: input.active }, "active");
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
