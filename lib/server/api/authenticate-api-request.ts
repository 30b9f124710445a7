import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { API_DEFAULT_RATE_PER_MINUTE, describeTokenRefusal, tokenMay, tokenUsable, type ApiNeed } from "@/lib/policy/api-tokens";
import type { CurrentUser } from "../auth/current-user";
import { hashApiToken } from "../api-tokens/token-secret";
import { getDb } from "../db/client";
import { withActor } from "../db/transaction";

/** Who is calling the API: the token (named in the audit trail) and its owner, who is the actor of every write. */
export type ApiCaller = {
  token: { id: string; name: string; scope: "CLIENT_READ" | "LAB_READ" | "READINGS_POST"; cellIds: string[] };
  user: CurrentUser;
};

const BEARER = /^Bearer\s+(\S{10,200})$/i;

function ratePerMinute(): number {
  const configured = Number(process.env.SEEPLINE_API_RATE_PER_MINUTE);
  return Number.isInteger(configured) && configured > 0 ? configured : API_DEFAULT_RATE_PER_MINUTE;
}

/**
 * The caller of an API request, or an AppError: 401 without a token, or with an unknown, revoked or expired one
 * (or one whose owner was deactivated); 403 when the token's scope does not cover `need`; 429 past the token's
 * requests per minute. The count lives in the database (one upsert), so every app instance shares it. An
 * admitted request is written to ApiRequest in the same transaction, under the owner as audit actor.
 */
export async function authenticateApiRequest(request: Request, need: ApiNeed, now = new Date()): Promise<ApiCaller> {
  const header = request.headers.get("authorization");
  if (!header) throw new AppError("UNAUTHENTICATED", "Send an API token in the Authorization header: “Bearer <token>”. Create one on My account.");
  const match = BEARER.exec(header.trim());
  if (!match) throw new AppError("UNAUTHENTICATED", "The Authorization header must be “Bearer <token>”.");
  const token = await getDb().apiToken.findUnique({
    where: { tokenHash: hashApiToken(match[1]!) },
    select: { id: true, name: true, scope: true, cellIds: true, revokedAt: true, expiresAt: true, user: { select: { id: true, name: true, email: true, role: true, clientOrganizationId: true, pressureUnit: true, active: true } } },
  });
  if (!token) throw new AppError("UNAUTHENTICATED", "This API token is not known; check it was copied whole, or create a new one on My account.");
  const usable = tokenUsable(token, now);
  if (!usable.ok) throw new AppError("UNAUTHENTICATED", usable.reason);
  const { active, ...user } = token.user;
  if (!active) throw new AppError("UNAUTHENTICATED", "The owner of this API token no longer has an active account.");

  const path = new URL(request.url).pathname.slice(0, 300);
  const windowStartedAt = new Date(Math.floor(now.getTime() / 60_000) * 60_000);
  const limit = ratePerMinute();
  await withActor(user, async (tx) => {
    const [counted] = await tx.$queryRaw<Array<{ count: number }>>`
      INSERT INTO "ApiRateWindow" ("tokenId", "windowStartedAt", "count") VALUES (${token.id}, ${windowStartedAt}, 1)
      ON CONFLICT ("tokenId") DO UPDATE SET
        "count" = CASE WHEN "ApiRateWindow"."windowStartedAt" = EXCLUDED."windowStartedAt" THEN "ApiRateWindow"."count" + 1 ELSE 1 END,
        "windowStartedAt" = EXCLUDED."windowStartedAt"
      RETURNING "count"`;
    if ((counted?.count ?? 0) > limit) {
      const retryAfterS = Math.max(1, Math.ceil((windowStartedAt.getTime() + 60_000 - now.getTime()) / 1000));
      throw new AppError("RATE_LIMITED", `This API token made more than ${limit} requests this minute; wait ${retryAfterS} s and try again.`, { details: { retryAfterS } });
    }
    await tx.apiRequest.create({ data: { tokenId: token.id, tokenName: token.name, userId: user.id, method: request.method, path } });
  });

  if (!tokenMay({ scope: token.scope, ownerRole: user.role }, need)) throw new AppError("FORBIDDEN", describeTokenRefusal(token.scope, need));
  return { token: { id: token.id, name: token.name, scope: token.scope, cellIds: token.cellIds }, user };
}
