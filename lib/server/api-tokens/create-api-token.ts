import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { API_TOKEN_SCOPE_LABELS, mayHoldScope } from "@/lib/policy/api-tokens";
import { createApiTokenSchema } from "@/lib/validation/api-tokens";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { generateApiToken } from "./token-secret";

const DAY_MS = 86_400_000;

/**
 * Creates an API token for the acting person. The token is returned once, here; the database keeps only its
 * SHA-256. A data-logger token names the permeameter cells (by asset tag) whose runs it may post readings to.
 */
export async function createApiToken(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "account.self");
  const input = parseOrThrow(createApiTokenSchema, options.input);
  if (!mayHoldScope(options.actor.role, input.scope))
    throw new AppError("FORBIDDEN", `Your role may not hold a token that may “${API_TOKEN_SCOPE_LABELS[input.scope]}”.`, { fieldErrors: { scope: "Choose a scope your role may hold." } });
  const now = options.now ?? new Date();
  return withActor(options.actor, async (tx) => {
    const tags = [...new Set(input.scope === "READINGS_POST" ? input.cells.map((c) => c.toUpperCase()) : [])];
    const cells = tags.length ? await tx.equipment.findMany({ where: { assetTag: { in: tags }, kind: "PERMEAMETER_CELL" }, select: { id: true, assetTag: true } }) : [];
    const unknown = tags.filter((tag) => !cells.some((c) => c.assetTag === tag));
    if (unknown.length)
      throw new AppError("INVALID_INPUT", `No permeameter cell has the asset tag ${unknown.join(", ")}.`, { fieldErrors: { cells: `No permeameter cell has the asset tag ${unknown.join(", ")}; check the equipment register.` } });
    const secret = generateApiToken();
    const saved = await tx.apiToken.create({
      data: { userId: options.actor.id, name: input.name, tokenHash: secret.hash, prefix: secret.prefix, scope: input.scope, cellIds: cells.map((c) => c.id), expiresAt: new Date(now.getTime() + input.expiresInDays * DAY_MS) },
      select: { id: true, name: true, scope: true, expiresAt: true, prefix: true },
    });
    return { ...saved, token: secret.token, cells: cells.map((c) => c.assetTag) };
  });
}
