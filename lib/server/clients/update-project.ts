import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { updateProjectSchema } from "@/lib/validation/clients";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
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
    if (updated.count !== 1) {
      const exists = await tx.project.findUnique({ where: { id: input.projectId }, select: { id: true } });
      throw new AppError(exists ? "CONFLICT" : "NOT_FOUND");
    }
    return { id: input.projectId };
  });
}
