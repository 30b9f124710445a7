import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { clientContactSchema } from "@/lib/validation/clients";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { hashPassword } from "../auth/password";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * Adds a contact person to a client. With portal access the contact becomes the client user who signs in
 * to the portal (same e-mail, the first password given, scoped to this organisation). A contact without an
 * e-mail address is refused by the schema and by the database.
 */
export async function addClientContact(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "client.manage");
  const input = parseOrThrow(clientContactSchema, options.input);
  const passwordHash = input.portalAccess ? await hashPassword(input.password!) : null;
  return withActor(options.actor, async (tx) => {
    const org = await tx.clientOrganization.findUnique({ where: { id: input.clientOrganizationId }, select: { id: true, active: true, name: true } });
    if (!org) throw new AppError("NOT_FOUND", "That client does not exist.");
    if (!org.active) throw new AppError("INVALID_INPUT", `${org.name} is deactivated; reactivate it before adding contacts.`);
    if (await tx.clientContact.findUnique({ where: { clientOrganizationId_email: { clientOrganizationId: org.id, email: input.email } }, select: { id: true } }))
      throw new AppError("CONFLICT", `${org.name} already has a contact with the e-mail ${input.email}.`, { fieldErrors: { email: "Already a contact of this client." } });
    let userId: string | null = null;
    if (passwordHash) {
      if (await tx.user.findUnique({ where: { email: input.email }, select: { id: true } }))
        throw new AppError("CONFLICT", `An account with the e-mail ${input.email} already exists; each portal account needs its own e-mail.`, { fieldErrors: { email: "An account with this e-mail already exists." } });
      userId = (await tx.user.create({ data: { name: input.name, email: input.email, role: "CLIENT_USER", clientOrganizationId: org.id, passwordHash }, select: { id: true } })).id;
    }
    return tx.clientContact.create({
      data: { clientOrganizationId: org.id, name: input.name, email: input.email, phone: input.phone ?? null, jobTitle: input.jobTitle ?? null, userId },
      select: { id: true, name: true, email: true, userId: true },
    });
  });
}
