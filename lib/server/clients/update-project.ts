import "server-only";
import { updateProjectSchema } from "@/lib/validation/clients";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { refuseStaleUpdate } from "../db/refuse-stale-update";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/** Changes a project's name or site, or deactivates it: no longer offered at intake; its records stay. */
export async function updateProject(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "client.manage");
  const input = parseOrThrow(updateProjectSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const updated = await tx.project.updateMany({
      where: { id: input.projectId, version: input.version },
      data: { name: input.name, siteName: input.siteName, siteLocation: input.siteLocation ?? null, active: input.active, version: { increment: 1 } },
    });
    await refuseStaleUpdate(updated, () => tx.project.findUnique({ where: { id: input.projectId }, select: { id: true } }));
    return { id: input.projectId };
  });
}
