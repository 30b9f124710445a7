import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** The newest audit rows written by the database triggers, with the acting user's name where known. */
export async function listAuditEntries(options: { actor: CurrentUser; table?: string; take?: number }) {
  requirePermission(options.actor, "audit.view");
  const db = getDb();
  const rows = await db.auditLog.findMany({
    where: options.table ? { tableName: options.table } : {},
    orderBy: { id: "desc" },
    take: options.take ?? 100,
  });
  const actorIds = [...new Set(rows.map((r) => r.actorId).filter((id): id is string => !!id))];
  const users = await db.user.findMany({ where: { id: { in: actorIds } }, select: { id: true, name: true } });
  const names = new Map(users.map((u) => [u.id, u.name]));
  return rows.map((r) => ({ ...r, id: r.id.toString(), txId: r.txId.toString(), actorName: describeActor(r.actorId, names) }));
}

// Users are named; system actors ("system:demo-seed") are shown as what they are.
function describeActor(actorId: string | null, names: Map<string, string>): string {
  if (!actorId) return "database (no actor set)";
  if (actorId.startsWith("system:")) return `system (${actorId.slice("system:".length).replace(/-/g, " ")})`;
  return names.get(actorId) ?? actorId;
}
