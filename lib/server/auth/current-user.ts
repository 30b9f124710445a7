import "server-only";
import { cache } from "react";
import { getServerSession } from "next-auth";
import type { PressureUnit, Role } from "@/lib/generated/prisma/client";
import { getDb } from "../db/client";
import { getAuthOptions } from "./auth-options";

export type CurrentUser = {
  id: string;
  name: string;
  email: string;
  role: Role;
  clientOrganizationId: string | null;
  pressureUnit: PressureUnit;
};

/**
 * The signed-in user, read fresh from the database once per request. A session whose user was
 * deactivated, or whose password was reset since (sessionVersion), counts as signed out.
 */
export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => {
  const session = await getServerSession(getAuthOptions());
  if (!session?.uid) return null;
  const user = await getDb().user.findUnique({
    where: { id: session.uid },
    select: { id: true, name: true, email: true, role: true, clientOrganizationId: true, pressureUnit: true, active: true, sessionVersion: true },
  });
  if (!user || !user.active || user.sessionVersion !== session.sv) return null;
  const { active: _active, sessionVersion: _sv, ...current } = user;
  return current;
});
