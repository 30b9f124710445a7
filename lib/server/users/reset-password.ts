import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { resetPasswordSchema } from "@/lib/validation/account";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { hashPassword } from "../auth/password";
import { clearPasswordThrottle } from "../auth/password-throttle";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/** The administrator sets a new password for a user; the user's open sessions end. */
export async function resetPassword(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "user.manage");
  const input = parseOrThrow(resetPasswordSchema, options.input);
  const passwordHash = await hashPassword(input.password);
  await withActor(options.actor, async (tx) => {
    const user = await tx.user.findUnique({ where: { id: input.userId }, select: { email: true } });
    if (!user) throw new AppError("NOT_FOUND");
    await tx.user.update({
      where: { id: input.userId },
      data: { passwordHash, passwordChangedAt: new Date(), sessionVersion: { increment: 1 }, version: { increment: 1 } },
    });
    // A reset also lifts any sign-in block, so the person can use the new password at once.
    await clearPasswordThrottle(tx, user.email);
  });
}
