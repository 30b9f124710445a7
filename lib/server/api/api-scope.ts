import "server-only";
import { organizationScope } from "../portal/organization-scope";
import type { ApiCaller } from "./authenticate-api-request";

/**
 * The organisation a caller reads: a client token its owner's organisation only (the portal's scope, so
 * another organisation's record is simply not found: 404); a lab token everything.
 */
export function apiOrganizationScope(caller: ApiCaller): { clientOrganizationId?: string } {
  return caller.token.scope === "CLIENT_READ" ? organizationScope({ ...caller.user, role: "CLIENT_USER" }) : {};
}

export const isClientCaller = (caller: ApiCaller) => caller.token.scope === "CLIENT_READ";

/** One page of a keyset list: `take + 1` rows were read; the extra one says there is a next page. */
export function pageOf<T>(rows: T[], take: number, keyOf: (row: T) => string, encode: (key: string) => string): { rows: T[]; nextCursor: string | null } {
  const more = rows.length > take;
  const kept = more ? rows.slice(0, take) : rows;
  return { rows: kept, nextCursor: more && kept.length ? encode(keyOf(kept[kept.length - 1]!)) : null };
}
