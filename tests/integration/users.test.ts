import { describe, expect, it } from "vitest";
import { changeOwnPassword } from "@/lib/server/users/change-own-password";
import { createUser } from "@/lib/server/users/create-user";
import { resetPassword } from "@/lib/server/users/reset-password";
import { setUserActive } from "@/lib/server/users/set-user-active";
import { verifyCredentials } from "@/lib/server/auth/verify-credentials";
import { codeOf } from "../support/refusals";
import { db, makeOrganization, makeUser, TEST_PASSWORD, unique } from "../support/factories";


describe("user administration", () => {
  it("lets only the administrator create users", async () => {
    const technician = await makeUser("TECHNICIAN");
    const input = { name: "Not Allowed", email: `${unique("x")}@example.test`, role: "TECHNICIAN", password: "a long enough password" };
    expect(await codeOf(createUser({ actor: technician, input }))).toBe("FORBIDDEN");
    expect(await db().user.findUnique({ where: { email: input.email } })).toBeNull();
  });

  it("ties a client user to exactly one organisation and refuses duplicates", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const org = await makeOrganization();
    const email = `${unique("client")}@example.test`;
    const input = { name: "Client Contact", email, role: "CLIENT_USER", password: "a long enough password" };
    expect(await codeOf(createUser({ actor: admin, input }))).toBe("INVALID_INPUT");
    await createUser({ actor: admin, input: { ...input, clientOrganizationId: org.id } });
    expect(await codeOf(createUser({ actor: admin, input: { ...input, clientOrganizationId: org.id } }))).toBe("CONFLICT");
    expect((await db().user.findUniqueOrThrow({ where: { email } })).clientOrganizationId).toBe(org.id);
  });

  it("is backed by a database rule: a client user without organisation cannot be stored", async () => {
    await expect(
      db().user.create({ data: { name: "Orphan", email: `${unique("orphan")}@example.test`, role: "CLIENT_USER", passwordHash: "x" } }),
    ).rejects.toThrow(/user_client_has_organization/);
  });

  it("deactivates with a version check, ends sessions, and then refuses sign-in", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const person = await makeUser("TECHNICIAN");
    const before = await db().user.findUniqueOrThrow({ where: { id: person.id } });
    expect(await verifyCredentials({ email: person.email, password: TEST_PASSWORD })).toMatchObject({ id: person.id });

    expect(await codeOf(setUserActive({ actor: admin, input: { userId: person.id, active: false, version: before.version + 5 } }))).toBe("CONFLICT");
    await setUserActive({ actor: admin, input: { userId: person.id, active: false, version: before.version } });
    const after = await db().user.findUniqueOrThrow({ where: { id: person.id } });
    expect(after.active).toBe(false);
    expect(after.sessionVersion).toBe(before.sessionVersion + 1);
    expect(await verifyCredentials({ email: person.email, password: TEST_PASSWORD })).toBeNull();
    expect(await codeOf(setUserActive({ actor: admin, input: { userId: admin.id, active: false, version: 1 } }))).toBe("INVALID_INPUT");
  });

  it("resets a password: the old one stops working, the new one works, sessions end", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const person = await makeUser("QA_MANAGER");
    await resetPassword({ actor: admin, input: { userId: person.id, password: "the brand new password" } });
    expect(await verifyCredentials({ email: person.email, password: TEST_PASSWORD })).toBeNull();
    expect(await verifyCredentials({ email: person.email, password: "the brand new password" })).toMatchObject({ id: person.id, sessionVersion: 2 });
  });

  it("lets anyone change their own password after proving the present one", async () => {
    const client = await makeUser("CLIENT_USER");
    const wrong = { currentPassword: "not my password", newPassword: "my next password", confirmPassword: "my next password" };
    expect(await codeOf(changeOwnPassword({ actor: client, input: wrong }))).toBe("INVALID_INPUT");
    await changeOwnPassword({ actor: client, input: { ...wrong, currentPassword: TEST_PASSWORD } });
    expect(await verifyCredentials({ email: client.email, password: "my next password" })).toMatchObject({ id: client.id });
  });
});

describe("sign-in throttling", () => {
  it("refuses even the right password for a while after repeated failures, per address", async () => {
    const person = await makeUser("INTAKE_CLERK");
    const other = await makeUser("INTAKE_CLERK");
    const now = new Date();
    for (let n = 0; n < 5; n++) expect(await verifyCredentials({ email: person.email, password: "wrong guess" }, undefined, now)).toBeNull();
    expect(await codeOf(verifyCredentials({ email: person.email, password: TEST_PASSWORD }, undefined, now))).toBe("TOO_MANY_ATTEMPTS");
    // Another address is not affected, and the block lifts once its time has passed.
    expect(await verifyCredentials({ email: other.email, password: TEST_PASSWORD }, undefined, now)).toMatchObject({ id: other.id });
    const later = new Date(now.getTime() + 16_000);
    expect(await verifyCredentials({ email: person.email, password: TEST_PASSWORD }, undefined, later)).toMatchObject({ id: person.id });
  });

  it("counts unknown addresses too, so guessing accounts is slowed the same way", async () => {
    const email = `${unique("nobody")}@example.test`;
    for (let n = 0; n < 5; n++) await verifyCredentials({ email, password: "guess" });
    expect(await codeOf(verifyCredentials({ email, password: "guess" }))).toBe("TOO_MANY_ATTEMPTS");
  });
});
