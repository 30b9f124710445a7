import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

export type ApiTokenRow = {
  id: string;
  name: string;
  prefix: string;
  scope: "CLIENT_READ" | "LAB_READ" | "READINGS_POST";
  cells: string[];
  owner: { name: string; email: string };
  createdAt: Date;
  expiresAt: Date | null;
  revokedAt: Date | null;
  lastUsedAt: Date | null;
  requests: number;
};

async function findTokens(where: { userId?: string }): Promise<ApiTokenRow[]> {
  const db = getDb();
  const tokens = await db.apiToken.findMany({
    where,
    orderBy: [{ createdAt: "desc" }, { id: "asc" }],
    take: 500,
    select: { id: true, name: true, prefix: true, scope: true, cellIds: true, createdAt: true, expiresAt: true, revokedAt: true, user: { select: { name: true, email: true } } },
  });
  const ids = tokens.map((t) => t.id);
  const [uses, cells] = await Promise.all([
    db.apiRequest.groupBy({ by: ["tokenId"], where: { tokenId: { in: ids } }, _max: { createdAt: true }, _count: { _all: true } }),
    db.equipment.findMany({ where: { id: { in: tokens.flatMap((t) => t.cellIds) } }, select: { id: true, assetTag: true } }),
  ]);
  const use = new Map(uses.map((u) => [u.tokenId, u]));
  const tag = new Map(cells.map((c) => [c.id, c.assetTag]));
  return tokens.map((t) => ({
    id: t.id, name: t.name, prefix: t.prefix, scope: t.scope, cells: t.cellIds.map((id) => tag.get(id) ?? id), owner: t.user,
    createdAt: t.createdAt, expiresAt: t.expiresAt, revokedAt: t.revokedAt,
    lastUsedAt: use.get(t.id)?._max.createdAt ?? null, requests: use.get(t.id)?._count._all ?? 0,
  }));
}

/** The acting person's own tokens, newest first, with when each was last used. */
export async function listOwnApiTokens(options: { actor: CurrentUser }): Promise<ApiTokenRow[]> {
  requirePermission(options.actor, "account.self");
  return findTokens({ userId: options.actor.id });
}

/** Every person's tokens, for the administrator. */
export async function listAllApiTokens(options: { actor: CurrentUser }): Promise<ApiTokenRow[]> {
  requirePermission(options.actor, "user.manage");
  return findTokens({});
}
