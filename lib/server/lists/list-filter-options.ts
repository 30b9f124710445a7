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

export type FilterChoice = { id: string; label: string };
export const FILTER_CHOICES_SHOWN = 20;

/**
 * Clients or projects whose name (anywhere) or code (at the start) matches `q`, by name, at most
 * FILTER_CHOICES_SHOWN: what a list's searchable client or project field offers as the person types, so a
 * page never carries the lab's whole list of projects. Projects may be kept to one client.
 */
export async function findFilterChoices(options: { actor: CurrentUser; kind: "clients" | "projects"; q: string; clientOrganizationId?: string }): Promise<FilterChoice[]> {
  requirePermission(options.actor, "workspace.view");
  const db = getDb();
  const q = options.q.trim();
  if (options.kind === "clients") {
    const rows = await db.clientOrganization.findMany({
      where: q ? { OR: [{ name: { contains: q, mode: "insensitive" } }, { code: { startsWith: q, mode: "insensitive" } }] } : {},
      orderBy: { name: "asc" }, take: FILTER_CHOICES_SHOWN, select: { id: true, name: true },
    });
    return rows.map((r) => ({ id: r.id, label: r.name }));
  }
  const rows = await db.project.findMany({
    where: {
      ...(options.clientOrganizationId && { clientOrganizationId: options.clientOrganizationId }),
      ...(q && { OR: [{ name: { contains: q, mode: "insensitive" } }, { code: { startsWith: q, mode: "insensitive" } }] }),
    },
    orderBy: { name: "asc" }, take: FILTER_CHOICES_SHOWN, select: { id: true, name: true, code: true },
  });
  return rows.map((r) => ({ id: r.id, label: `${r.code} · ${r.name}` }));
}

/** The names of the client and project a list is filtered by now, for its searchable fields. */
export async function readFilterSelection(options: { actor: CurrentUser; clientOrganizationId?: string; projectId?: string }): Promise<{ client: FilterChoice | null; project: FilterChoice | null }> {
  requirePermission(options.actor, "workspace.view");
  const db = getDb();
  const [client, project] = await Promise.all([
    options.clientOrganizationId ? db.clientOrganization.findUnique({ where: { id: options.clientOrganizationId }, select: { id: true, name: true } }) : null,
    options.projectId ? db.project.findUnique({ where: { id: options.projectId }, select: { id: true, name: true, code: true } }) : null,
  ]);
  return { client: client ? { id: client.id, label: client.name } : null, project: project ? { id: project.id, label: `${project.code} · ${project.name}` } : null };
}
