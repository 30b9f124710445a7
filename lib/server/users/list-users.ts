import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** All accounts for the administrator's list, staff first, with the client organisation named. */
export async function listUsers(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "user.manage");
  return getDb().user.findMany({
    orderBy: [{ role: "asc" }, { name: "asc" }],
    select: {
      id: true, name: true, email: true, role: true, active: true, version: true, createdAt: true, clientOrganizationId: true,
      clientOrganization: { select: { name: true } },
    },
  });
}

export async function listClientOrganizationsForSelect(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "user.manage");
  return getDb().clientOrganization.findMany({ where: { active: true }, orderBy: { name: "asc" }, select: { id: true, name: true } });
}
