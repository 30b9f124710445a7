import "server-only";
import { ROLE_LABELS } from "@/lib/policy/permissions";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Everyone who can have made a change, former staff included, for the audit trail's person filter. */
export async function listAuditPeople(options: { actor: CurrentUser }): Promise<Array<{ id: string; label: string }>> {
  requirePermission(options.actor, "audit.view");
  const users = await getDb().user.findMany({ orderBy: [{ name: "asc" }, { email: "asc" }], select: { id: true, name: true, role: true, active: true } });
  return users.map((u) => ({ id: u.id, label: `${u.name} (${ROLE_LABELS[u.role]}${u.active ? "" : ", deactivated"})` }));
}
