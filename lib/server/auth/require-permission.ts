import "server-only";
import { can, describeRolesAllowedTo, type Action } from "@/lib/policy/permissions";
import { AppError } from "@/lib/errors/app-error";
import { getCurrentUser, type CurrentUser } from "./current-user";

/** Throws FORBIDDEN, naming the roles that may, unless `user` may take `action`. */
export function requirePermission(user: CurrentUser, action: Action): void {
  if (!can(user.role, action))
    throw new AppError("FORBIDDEN", `This needs the role ${describeRolesAllowedTo(action)}.`, { details: { action } });
}

/** For server actions and route handlers: the signed-in user allowed to take `action`, or an AppError. */
export async function requireUser(action: Action): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw new AppError("UNAUTHENTICATED");
  requirePermission(user, action);
  return user;
}
