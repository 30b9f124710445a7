import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { createUserSchema } from "@/lib/validation/account";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { hashPassword } from "../auth/password";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/** The administrator creates a user; a client user is tied to one organisation. */
export async function createUser(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "user.manage");
  const input = parseOrThrow(createUserSchema, options.input);
  const passwordHash = await hashPassword(input.password);
  return withActor(options.actor, async (tx) => {
    if (await tx.user.findUnique({ where: { email: input.email }, select: { id: true } }))
      throw new AppError("CONFLICT", "A user with this e-mail already exists.", { fieldErrors: { email: "Already in use." } });
    if (input.clientOrganizationId) {
      const org = await tx.clientOrganization.findUnique({ where: { id: input.clientOrganizationId }, select: { id: true, active: true } });
      if (!org?.active) throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { clientOrganizationId: "Choose an active organisation." } });
    }
    return tx.user.create({
      data: {
        name: input.name,
        email: input.email,
        role: input.role,
        clientOrganizationId: input.clientOrganizationId ?? null,
        passwordHash,
      },
      select: { id: true, email: true, name: true, role: true },
    });
  });
}
