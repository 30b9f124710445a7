import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { changeOwnPasswordSchema } from "@/lib/validation/account";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { hashPassword, verifyPassword } from "../auth/password";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/** Anyone changes their own password, proving the present one first. Other sessions stay valid. */
export async function changeOwnPassword(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "account.self");
  const input = parseOrThrow(changeOwnPasswordSchema, options.input);
  await withActor(options.actor, async (tx) => {
    const user = await tx.user.findUniqueOrThrow({ where: { id: options.actor.id }, omit: { passwordHash: false } });
    if (!(await verifyPassword(input.currentPassword, user.passwordHash)))
      throw new AppError("INVALID_INPUT", "The present password is not right.", { fieldErrors: { currentPassword: "Not right." } });
    await tx.user.update({
      where: { id: user.id },
      data: { passwordHash: await hashPassword(input.newPassword), passwordChangedAt: new Date(), version: { increment: 1 } },
    });
  });
}
