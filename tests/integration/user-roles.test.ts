import { afterEach, describe, expect, it } from "vitest";
import { findSessionUser } from "@/lib/server/auth/find-session-user";
import { verifyCredentials } from "@/lib/server/auth/verify-credentials";
import { changeUserRole } from "@/lib/server/users/change-user-role";
import { setUserActive } from "@/lib/server/users/set-user-active";
import { failure } from "../support/refusals";
import { db, makeOrganization, makeUser, TEST_PASSWORD } from "../support/factories";

/** Other tests' administrators, parked while a test needs exactly one active administrator, then restored. */
let parked: string[] = [];
async function leaveOnlyAdmin(keep: string) {
  const others = await db().user.findMany({ where: { role: "LAB_ADMIN", active: true, id: { not: keep } }, select: { id: true } });
  parked = others.map((o) => o.id);
  await db().user.updateMany({ where: { id: { in: parked } }, data: { active: false } });
}
afterEach(async () => {
  if (parked.length) await db().user.updateMany({ where: { id: { in: parked } }, data: { active: true } });
  parked = [];
});

describe("role changes", () => {
  it("gives a person another role and ends their open sessions", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const person = await makeUser("TECHNICIAN");
    const before = await db().user.findUniqueOrThrow({ where: { id: person.id } });
    const session = { uid: person.id, sv: before.sessionVersion };
    expect(await findSessionUser(db(), session)).toMatchObject({ id: person.id, role: "TECHNICIAN" });

    await changeUserRole({ actor: admin, input: { userId: person.id, version: before.version, role: "QA_MANAGER" } });
    // The session signed before the change is no longer a signed-in user; a new sign-in carries the new role.
    expect(await findSessionUser(db(), session)).toBeNull();
    const signedIn = await verifyCredentials({ email: person.email, password: TEST_PASSWORD });
    expect(signedIn).toMatchObject({ role: "QA_MANAGER", sessionVersion: before.sessionVersion + 1 });
    expect(await findSessionUser(db(), { uid: person.id, sv: signedIn!.sessionVersion })).toMatchObject({ role: "QA_MANAGER" });
    const audit = await db().auditLog.findFirst({ where: { tableName: "User", rowId: person.id, operation: "UPDATE" }, orderBy: { id: "desc" } });
    expect(audit).toMatchObject({ actorId: admin.id, before: expect.objectContaining({ role: "TECHNICIAN" }), after: expect.objectContaining({ role: "QA_MANAGER" }) });
  });

  it("ties a new client user to an organisation and refuses a stale screen or no organisation, saving nothing", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const person = await makeUser("INTAKE_CLERK");
    const org = await makeOrganization();
    const noOrg = await failure(changeUserRole({ actor: admin, input: { userId: person.id, version: 1, role: "CLIENT_USER" } }));
    expect(noOrg.fieldErrors.clientOrganizationId).toBe("A client user needs their organisation.");
    expect((await failure(changeUserRole({ actor: admin, input: { userId: person.id, version: 9, role: "TECHNICIAN" } }))).code).toBe("CONFLICT");
    expect((await db().user.findUniqueOrThrow({ where: { id: person.id } })).role).toBe("INTAKE_CLERK");
    await changeUserRole({ actor: admin, input: { userId: person.id, version: 1, role: "CLIENT_USER", clientOrganizationId: org.id } });
    expect(await db().user.findUniqueOrThrow({ where: { id: person.id } })).toMatchObject({ role: "CLIENT_USER", clientOrganizationId: org.id });
  });

  it("refuses to take the role from, or deactivate, the last active administrator; the database refuses it too", async () => {
    const admin = await makeUser("LAB_ADMIN");
    await leaveOnlyAdmin(admin.id);
    const version = (await db().user.findUniqueOrThrow({ where: { id: admin.id } })).version;
    const demoted = await failure(changeUserRole({ actor: admin, input: { userId: admin.id, version, role: "TECHNICIAN" } }));
    expect(demoted.code).toBe("INVALID_INPUT");
    expect(demoted.message).toBe(`${admin.name} is the last active lab administrator, so they cannot lose that role; make another person a lab administrator first.`);
    expect(demoted.fieldErrors.role).toBe(demoted.message);
    expect(await db().user.findUniqueOrThrow({ where: { id: admin.id } })).toMatchObject({ role: "LAB_ADMIN", active: true, version });
    await expect(db().user.update({ where: { id: admin.id }, data: { active: false } })).rejects.toThrow(/last active lab administrator/);

    // With a second administrator, the first may give up the role.
    const second = await makeUser("LAB_ADMIN");
    await changeUserRole({ actor: second, input: { userId: admin.id, version, role: "QA_MANAGER" } });
    expect((await db().user.findUniqueOrThrow({ where: { id: admin.id } })).role).toBe("QA_MANAGER");
    // Deactivation by another administrator cannot leave none (the actor is one); the database refuses the rest.
    await expect(db().user.update({ where: { id: second.id }, data: { role: "TECHNICIAN" } })).rejects.toThrow(/last active lab administrator/);
    await setUserActive({ actor: second, input: { userId: admin.id, active: false, version: version + 1 } });
  });
});
