import { describe, expect, it } from "vitest";
import { THROTTLE_RULES } from "@/lib/policy/sign-in-throttle";
import { verifyCredentials } from "@/lib/server/auth/verify-credentials";
import { changeOwnPassword } from "@/lib/server/users/change-own-password";
import { codeOf } from "../support/refusals";
import { db, makeUser, TEST_PASSWORD } from "../support/factories";

describe("the password throttle", () => {
  it("counts parallel attempts before the hash: of 40 at once, only the free few are compared", async () => {
    const person = await makeUser("TECHNICIAN");
    const outcomes = await Promise.all(Array.from({ length: 40 }, () => codeOf(verifyCredentials({ email: person.email, password: "a wrong guess" }, undefined, undefined, "203.0.113.1"))));
    const compared = outcomes.filter((o) => o === "no error").length;
    expect(compared).toBe(THROTTLE_RULES.accountAtAddress.freeFailures + 1);
    expect(outcomes.filter((o) => o === "TOO_MANY_ATTEMPTS")).toHaveLength(40 - compared);
    expect((await db().signInThrottle.findUnique({ where: { key: `pair:${person.email}|203.0.113.1` } }))?.failures).toBe(compared);
  });

  it("blocks one account guessed from many addresses for at most a minute, but never at the owner's usual address", async () => {
    const person = await makeUser("QA_MANAGER");
    expect(await verifyCredentials({ email: person.email, password: TEST_PASSWORD }, undefined, undefined, "198.51.100.7")).toMatchObject({ id: person.id });
    const now = new Date();
    for (let i = 0; i < THROTTLE_RULES.account.freeFailures + 5; i++) await codeOf(verifyCredentials({ email: person.email, password: "guess" }, undefined, now, `203.0.113.${50 + i}`));
    const blocked = await db().signInThrottle.findUniqueOrThrow({ where: { key: `account:${person.email}` } });
    expect(blocked.blockedUntil!.getTime() - now.getTime()).toBeLessThanOrEqual(THROTTLE_RULES.account.maxBlockS * 1000);
    expect(await codeOf(verifyCredentials({ email: person.email, password: TEST_PASSWORD }, undefined, now, "203.0.113.200"))).toBe("TOO_MANY_ATTEMPTS");
    expect(await verifyCredentials({ email: person.email, password: TEST_PASSWORD }, undefined, now, "198.51.100.7")).toMatchObject({ id: person.id });
    // The ceiling: a minute later the account is open again from anywhere.
    expect(await verifyCredentials({ email: person.email, password: TEST_PASSWORD }, undefined, new Date(now.getTime() + 61_000), "203.0.113.201")).toMatchObject({ id: person.id });
  });

  it("throttles the present password asked when changing it, and the change ends the person's other sessions", async () => {
    const person = await makeUser("CLIENT_USER");
    const wrong = (n: number) => ({ currentPassword: `not it ${n}`, newPassword: "my next password", confirmPassword: "my next password" });
    const codes = [];
    for (let n = 0; n < 8; n++) codes.push(await codeOf(changeOwnPassword({ actor: person, input: wrong(n), clientAddress: "203.0.113.90" })));
    expect(codes.slice(0, THROTTLE_RULES.accountAtAddress.freeFailures + 1).every((c) => c === "INVALID_INPUT")).toBe(true);
    expect(codes.at(-1)).toBe("TOO_MANY_ATTEMPTS");
    expect(await codeOf(changeOwnPassword({ actor: person, input: { ...wrong(0), currentPassword: TEST_PASSWORD }, clientAddress: "203.0.113.90" }))).toBe("TOO_MANY_ATTEMPTS");

    const before = await db().user.findUniqueOrThrow({ where: { id: person.id } });
    const changed = await changeOwnPassword({ actor: person, input: { ...wrong(0), currentPassword: TEST_PASSWORD }, clientAddress: "198.51.100.90" });
    expect(changed.sessionVersion).toBe(before.sessionVersion + 1);
    expect((await db().user.findUniqueOrThrow({ where: { id: person.id } })).sessionVersion).toBe(before.sessionVersion + 1);
  });
});
