import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { clientOrganizationSchema } from "@/lib/validation/clients";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/** The administrator takes on a new client: its code (on paperwork, never reused), name and address. */
export async function createClientOrganization(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "client.manage");
  const input = parseOrThrow(clientOrganizationSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const taken = await tx.clientOrganization.findUnique({ where: { code: input.code }, select: { name: true } });
    if (taken) throw new AppError("CONFLICT", `The code ${input.code} already belongs to ${taken.name}.`, { fieldErrors: { code: "Already in use; client codes are never reused." } });
    return tx.clientOrganization.create({ data: { code: input.code, name: input.name, address: input.address ?? null }, select: { id: true, code: true, name: true } });
  });
}
