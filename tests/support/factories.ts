import { randomBytes } from "node:crypto";
import type { Role } from "@/lib/generated/prisma/client";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { hashPassword } from "@/lib/server/auth/password";
import { getDb } from "@/lib/server/db/client";
import { withActor } from "@/lib/server/db/transaction";

export const TEST_PASSWORD = "test password 123";
const SYSTEM = { id: "system:test-factory" };

export function unique(prefix: string): string {
  return `${prefix}-${randomBytes(4).toString("hex")}`;
}

export async function makeOrganization() {
  const code = unique("ORG").toUpperCase();
  return withActor(SYSTEM, (tx) => tx.clientOrganization.create({ data: { code, name: `Organisation ${code}` } }));
}

export async function makeProject(clientOrganizationId?: string) {
  const orgId = clientOrganizationId ?? (await makeOrganization()).id;
  const code = unique("PRJ").toUpperCase();
  return withActor(SYSTEM, (tx) => tx.project.create({ data: { code, name: `Project ${code}`, siteName: "Test site", clientOrganizationId: orgId } }));
}

/** A user of the given role, returned as the app's CurrentUser (the actor type of every operation). */
export async function makeUser(role: Role, options: { password?: string; clientOrganizationId?: string } = {}): Promise<CurrentUser> {
  const orgId = role === "CLIENT_USER" ? (options.clientOrganizationId ?? (await makeOrganization()).id) : null;
  const passwordHash = await hashPassword(options.password ?? TEST_PASSWORD);
  const email = `${unique(role.toLowerCase())}@example.test`;
  return withActor(SYSTEM, (tx) =>
    tx.user.create({
      data: { name: `Test ${role}`, email, role, passwordHash, clientOrganizationId: orgId },
      select: { id: true, name: true, email: true, role: true, clientOrganizationId: true, pressureUnit: true, resultUnits: true },
    }),
  );
}

export function db() {
  return getDb();
}

export async function makeStorageLocation() {
  const code = unique("LOC").toUpperCase().slice(0, 20);
  return withActor(SYSTEM, (tx) => tx.storageLocation.create({ data: { code, name: `Shelf ${code}` } }));
}
