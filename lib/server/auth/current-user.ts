import "server-only";
import { cache } from "react";
import { getServerSession } from "next-auth";
import type { PressureUnit, ResultUnitSystem, Role } from "@/lib/generated/prisma/client";
import { getDb } from "../db/client";
import { getAuthOptions } from "./auth-options";
import { findSessionUser } from "./find-session-user";

export type CurrentUser = {
  id: string;
  name: string;
  email: string;
  role: Role;
  clientOrganizationId: string | null;
  pressureUnit: PressureUnit;
  /** The units results are shown in on this person's screens. */
  resultUnits?: ResultUnitSystem;
};

/**
 * The signed-in user, read fresh from the database once per request. A session whose user was
 * deactivated, or whose password was reset or role changed since (sessionVersion), counts as signed out.
 */
export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => {
  const session = await getServerSession(getAuthOptions());
  return session ? findSessionUser(getDb(), { uid: session.uid, sv: session.sv }) : null;
});
