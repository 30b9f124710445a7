import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { organizationScope } from "../portal/organization-scope";
import { loadProjectConformance } from "./load-project-conformance";

/**
 * A project's conformance matrix and sampling coverage, for the lab's staff and for the client portal: a
 * client user sees only their organisation's projects (another's is NOT_FOUND).
 */
export async function getProjectConformance(options: { actor: CurrentUser; projectCode: string }) {
  const { actor } = options;
  requirePermission(actor, actor.role === "CLIENT_USER" ? "portal.view" : "sample.view");
  const project = await getDb().project.findFirst({
    where: { code: options.projectCode.trim(), ...organizationScope(actor) },
    select: { id: true, code: true, name: true, siteName: true, clientOrganization: { select: { name: true } } },
  });
  if (!project) throw new AppError("NOT_FOUND", "That project does not exist.");
  return { project, ...(await loadProjectConformance({ projectId: project.id })) };
}

/** One roll's row of its project's matrix, for the roll page. */
export async function getRollConformance(options: { actor: CurrentUser; rollId: string }) {
  requirePermission(options.actor, "sample.view");
  const roll = await getDb().roll.findUnique({ where: { id: options.rollId }, select: { projectId: true } });
  if (!roll) throw new AppError("NOT_FOUND");
  return loadProjectConformance({ projectId: roll.projectId, rollId: options.rollId });
}
