import "server-only";
import { forbidden, redirect } from "next/navigation";
import { can, type Action } from "@/lib/policy/permissions";
import { getCurrentUser, type CurrentUser } from "./current-user";

// Kept apart from require-permission.ts so that operations (and scripts that load them outside Next.js)
// never import next/navigation.

/** For pages: the signed-in user allowed to take `action`; otherwise the sign-in page or the 403 page. */
export async function requirePageUser(action: Action): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in");
  if (!can(user.role, action)) forbidden();
  return user;
}
