import "server-only";
import type { CurrentUser } from "../auth/current-user";

/**
 * The `where` fragment that keeps a client user to their own organisation, so another organisation's
 * record is simply not found; staff are not narrowed. Spread it into the `where` of every portal query.
 */
export function organizationScope(actor: CurrentUser): { clientOrganizationId?: string } {
  if (actor.role !== "CLIENT_USER") return {};
  // A client user without an organisation matches nothing (the database forbids such a user anyway).
  return { clientOrganizationId: actor.clientOrganizationId ?? "no organisation" };
}
