import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { changeUserRoleSchema } from "@/lib/validation/user-role";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { refuseLosingLastAdmin } from "./refuse-losing-last-admin";

/**
 * The administrator gives a user another role (a client user: with their organisation). The user's open
 * sessions end at once (sessionVersion), so the new role applies from their next sign-in. The last active
 * administrator keeps the role. A client contact whose account stops being that client's user is unlinked.
 */
export async function changeUserRole(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "user.manage");
  const input = parseOrThrow(changeUserRoleSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const user = await tx.user.findUnique({ where: { id: input.userId }, select: { id: true, name: true, role: true, active: true, clientOrganizationId: true, version: true } });
    if (!user) throw new AppError("NOT_FOUND");
    if (user.version !== input.version) throw new AppError("CONFLICT", `${user.name}'s account was changed since you opened it; reload and try again.`);
    const organizationId = input.clientOrganizationId ?? null;
    if (user.role === input.role && user.clientOrganizationId === organizationId)
      throw new AppError("INVALID_INPUT", `${user.name} already has that role.`, { fieldErrors: { role: "Unchanged." } });
    if (organizationId) {
      const org = await tx.clientOrganization.findUnique({ where: { id: organizationId }, select: { active: true } });
      if (!org?.active) throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { clientOrganizationId: "Choose an active client organisation." } });
    }
    await refuseLosingLastAdmin(tx, user, { role: input.role, active: user.active }, "role");

    const updated = await tx.user.updateMany({
      where: { id: user.id, version: input.version },
      data: { role: input.role, clientOrganizationId: organizationId, sessionVersion: { increment: 1 }, version: { increment: 1 } },
    });
    if (updated.count !== 1) throw new AppError("CONFLICT");
    await tx.clientContact.updateMany({ where: { userId: user.id, ...(organizationId ? { clientOrganizationId: { not: organizationId } } : {}) }, data: { userId: null, version: { increment: 1 } } });
    return { id: user.id, role: input.role };
  });
}
