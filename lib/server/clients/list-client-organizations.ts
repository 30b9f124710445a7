import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Every client organisation, active first, with how many projects, contacts and portal users it has. */
export async function listClientOrganizations(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "client.manage");
  return getDb().clientOrganization.findMany({
    orderBy: [{ active: "desc" }, { name: "asc" }],
    select: {
      id: true, code: true, name: true, address: true, active: true,
      _count: { select: { projects: true, contacts: { where: { active: true } }, users: { where: { active: true } } } },
    },
  });
}
