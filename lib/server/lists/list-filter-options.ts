import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

export type FilterOptions = {
  clients: { id: string; name: string }[];
  projects: { id: string; name: string; code: string; clientOrganizationId: string }[];
};

/** The clients and projects a list's filter bar offers, by name. */
export async function listFilterOptions(options: { actor: CurrentUser }): Promise<FilterOptions> {
  requirePermission(options.actor, "workspace.view");
  const db = getDb();
  const [clients, projects] = await Promise.all([
    db.clientOrganization.findMany({ orderBy: { name: "asc" }, select: { id: true, name: true } }),
    db.project.findMany({ orderBy: { name: "asc" }, select: { id: true, name: true, code: true, clientOrganizationId: true } }),
  ]);
  return { clients, projects };
}
