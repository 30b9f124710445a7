import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { mayRevokeToken } from "@/lib/policy/api-tokens";
import { revokeApiTokenSchema } from "@/lib/validation/api-tokens";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/** Revokes a token at once: the owner's own, or anyone's by the administrator. Another person's token is not found. */
export async function revokeApiToken(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "account.self");
  const { tokenId } = parseOrThrow(revokeApiTokenSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const token = await tx.apiToken.findUnique({ where: { id: tokenId }, select: { id: true, name: true, userId: true, revokedAt: true } });
    if (!token || !mayRevokeToken(options.actor, token.userId)) throw new AppError("NOT_FOUND", "That API token does not exist or is not yours to revoke.");
    if (token.revokedAt) return { id: token.id, name: token.name, revokedAt: token.revokedAt };
    const revokedAt = options.now ?? new Date();
    await tx.apiToken.update({ where: { id: token.id }, data: { revokedAt, revokedById: options.actor.id } });
    return { id: token.id, name: token.name, revokedAt };
  });
}
