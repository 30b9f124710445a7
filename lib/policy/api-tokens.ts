/**
 * API tokens: which role may create which scope, what each scope lets a request do, and the rules a token
 * lives by (expiry, requests per minute). The API's route handlers ask `tokenMay` and nothing else. Pure.
 */
import { can, type RoleName } from "./permissions";

export const API_TOKEN_SCOPES = ["CLIENT_READ", "LAB_READ", "READINGS_POST"] as const;
export type ApiTokenScopeName = (typeof API_TOKEN_SCOPES)[number];

export const API_TOKEN_SCOPE_LABELS: Record<ApiTokenScopeName, string> = {
  CLIENT_READ: "Read my organisation's records",
  LAB_READ: "Read the lab's records",
  READINGS_POST: "Post readings to runs in named cells (data-logger)",
};

/** Who may hold each scope, and why. */
const SCOPE_ROLES: Record<ApiTokenScopeName, (role: RoleName) => boolean> = {
  // A client's register pulls what the portal shows them, nothing more.
  CLIENT_READ: (role) => can(role, "portal.view"),
  // Staff read what their pages show; a token is no wider than the person.
  LAB_READ: (role) => can(role, "run.view") && can(role, "certificate.view"),
  // The person who runs tests or keeps the equipment installs a cell's logger.
  READINGS_POST: (role) => role === "TECHNICIAN" || role === "LAB_ADMIN",
};

/** What a request through the API asks to do. */
export type ApiNeed = "read" | "post-readings";

/** The scopes a role may create tokens for (the form offers these). */
export function scopesForRole(role: RoleName): ApiTokenScopeName[] {
  return API_TOKEN_SCOPES.filter((scope) => SCOPE_ROLES[scope](role));
}

/** Whether a person of `role` may hold a token of `scope` (at creation and again at every use). */
export function mayHoldScope(role: RoleName, scope: ApiTokenScopeName): boolean {
  return SCOPE_ROLES[scope](role);
}

/**
 * Whether a token of `scope`, held by a person of `role`, may do `need`. Reads: a client token reads its own
 * organisation (the queries narrow it, as the portal's do); a lab token reads everything. An instrument token only posts readings
 * (and which runs is decided per run, by its cells).
 */
export function tokenMay(token: { scope: ApiTokenScopeName; ownerRole: RoleName }, need: ApiNeed): boolean {
  if (!mayHoldScope(token.ownerRole, token.scope)) return false;
  if (need === "post-readings") return token.scope === "READINGS_POST";
  return token.scope === "CLIENT_READ" || token.scope === "LAB_READ";
}

/** A sentence for a token that may not do `need`. */
export function describeTokenRefusal(scope: ApiTokenScopeName, need: ApiNeed): string {
  if (need === "post-readings") return `This token's scope is “${API_TOKEN_SCOPE_LABELS[scope]}”; posting readings needs a data-logger token.`;
  return `This token's scope is “${API_TOKEN_SCOPE_LABELS[scope]}”; reading records needs a read token.`;
}

/** Tokens expire: at most a year, 90 days unless the person chooses. */
export const API_TOKEN_MAX_DAYS = 366;
export const API_TOKEN_DEFAULT_DAYS = 90;

/** Requests per token per minute unless SEEPLINE_API_RATE_PER_MINUTE says otherwise. */
export const API_DEFAULT_RATE_PER_MINUTE = 600;

/** Whether a token can be used at `now`: not revoked, not expired. */
export function tokenUsable(token: { revokedAt: Date | null; expiresAt: Date | null }, now: Date): { ok: true } | { ok: false; reason: string } {
  if (token.revokedAt) return { ok: false, reason: "This API token was revoked; create a new one on My account." };
  if (!token.expiresAt || token.expiresAt.getTime() <= now.getTime()) return { ok: false, reason: "This API token has expired; create a new one on My account." };
  return { ok: true };
}

/** Whether `actor` may revoke a token owned by `ownerId`: their own, or any as the administrator. */
export function mayRevokeToken(actor: { id: string; role: RoleName }, ownerId: string): boolean {
  return actor.id === ownerId || can(actor.role, "user.manage");
}
