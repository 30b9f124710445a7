import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { updateClientContactSchema } from "@/lib/validation/clients";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * Changes a contact's details or deactivates the contact. A contact with a portal account carries the change
 * of name or e-mail to it (the e-mail is how they sign in); deactivating the contact deactivates the
 * account and ends its sessions. Reactivating the account is done on the people page.
 */
export async function updateClientContact(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "client.manage");
  const input = parseOrThrow(updateClientContactSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const contact = await tx.clientContact.findUnique({ where: { id: input.contactId }, select: { id: true, clientOrganizationId: true, email: true, userId: true, version: true } });
    if (!contact) throw new AppError("NOT_FOUND");
    if (contact.version !== input.version) throw new AppError("CONFLICT");
    if (input.email !== contact.email) {
      const clash = await tx.clientContact.findUnique({ where: { clientOrganizationId_email: { clientOrganizationId: contact.clientOrganizationId, email: input.email } }, select: { id: true } });
      if (clash) throw new AppError("CONFLICT", undefined, { fieldErrors: { email: "Another contact of this client has this e-mail." } });
      if (contact.userId && (await tx.user.findFirst({ where: { email: input.email, id: { not: contact.userId } }, select: { id: true } })))
        throw new AppError("CONFLICT", undefined, { fieldErrors: { email: "An account with this e-mail already exists." } });
    }
    await tx.clientContact.update({
      where: { id: contact.id },
      data: { name: input.name, email: input.email, phone: input.phone ?? null, jobTitle: input.jobTitle ?? null, active: input.active, version: { increment: 1 } },
    });
    if (contact.userId)
      await tx.user.update({
        where: { id: contact.userId },
        data: { name: input.name, email: input.email, version: { increment: 1 }, ...(input.active ? {} : { active: false, sessionVersion: { increment: 1 } }) },
      });
    return { id: contact.id };
  });
}
