import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { changeOwnPasswordSchema } from "@/lib/validation/account";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { hashPassword, verifyPassword } from "../auth/password";
import { checkPasswordThrottled } from "../auth/password-throttle";
import { getDb } from "../db/client";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * Anyone changes their own password, proving the present one first (throttled like a sign-in). Every
 * session of the user ends (the session version goes up); the adapter gives the browser used for the
 * change a fresh session with the returned version.
 */
export async function changeOwnPassword(options: { actor: CurrentUser; input: unknown; clientAddress?: string | null }): Promise<{ sessionVersion: number }> {
  requirePermission(options.actor, "account.self");
  const input = parseOrThrow(changeOwnPasswordSchema, options.input);
  const user = await getDb().user.findUniqueOrThrow({ where: { id: options.actor.id }, omit: { passwordHash: false } });
  const proven = await checkPasswordThrottled({ email: user.email, address: options.clientAddress ?? null }, () => verifyPassword(input.currentPassword, user.passwordHash));
  if (!proven) throw new AppError("INVALID_INPUT", "The present password is not right.", { fieldErrors: { currentPassword: "Not right." } });
  const passwordHash = await hashPassword(input.newPassword);
  return withActor(options.actor, async (tx) => {
    // The version check refuses a second change made at the same moment with the old password.
    const updated = await tx.user.updateMany({
      where: { id: user.id, version: user.version },
      data: { passwordHash, passwordChangedAt: new Date(), sessionVersion: { increment: 1 }, version: { increment: 1 } },
    });
    if (updated.count !== 1) throw new AppError("CONFLICT", "Your account was changed a moment ago (perhaps from another window); reload and try again.");
    return { sessionVersion: user.sessionVersion + 1 };
  });
}
