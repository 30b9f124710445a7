import "server-only";
import { updateClientOrganizationSchema } from "@/lib/validation/clients";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { refuseStaleUpdate } from "../db/refuse-stale-update";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * Changes a client's name or address, or deactivates it (nothing is deleted: its shipments and certificates
 * stay). A deactivated client is no longer offered at intake, and its portal accounts are deactivated with
 * their sessions ended; they are reactivated one by one on the people page.
 */
export async function updateClientOrganization(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "client.manage");
  const input = parseOrThrow(updateClientOrganizationSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const updated = await tx.clientOrganization.updateMany({
      where: { id: input.clientOrganizationId, version: input.version },
      data: { name: input.name, address: input.address ?? null, active: input.active, version: { increment: 1 } },
    });
    await refuseStaleUpdate(updated, () => tx.clientOrganization.findUnique({ where: { id: input.clientOrganizationId }, select: { id: true } }));
    if (!input.active)
      await tx.user.updateMany({ where: { clientOrganizationId: input.clientOrganizationId, active: true }, data: { active: false, sessionVersion: { increment: 1 }, version: { increment: 1 } } });
    return tx.clientOrganization.findUniqueOrThrow({ where: { id: input.clientOrganizationId }, select: { id: true, code: true, active: true } });
  });
}
