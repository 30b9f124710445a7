import "server-only";
import type { Db } from "../db/client";
import type { CurrentUser } from "./current-user";

/**
 * The user a session names, read fresh: null when the account is gone or deactivated, or when its
 * sessionVersion moved on since the session was signed (password reset, deactivation, role change).
 */
export async function findSessionUser(db: Db, session: { uid?: string; sv?: number }): Promise<CurrentUser | null> {
  if (!session.uid) return null;
  const user = await db.user.findUnique({
    where: { id: session.uid },
    select: { id: true, name: true, email: true, role: true, clientOrganizationId: true, pressureUnit: true, resultUnits: true, active: true, sessionVersion: true },
  });
  if (!user || !user.active || user.sessionVersion !== session.sv) return null;
  const { active: _active, sessionVersion: _sv, ...current } = user;
  return current;
}
