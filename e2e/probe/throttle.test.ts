import { describe, expect, it } from "vitest";
import { THROTTLE_RULES } from "@/lib/policy/sign-in-throttle";
import { browserAvailable } from "../support/session";
import { discoverServerActions } from "./support/app-map";
import { recordFigure } from "./support/figures";
import { callAction, request, signIn, trySignIn } from "./support/probe-client";
import { makeProbeUser, query } from "./support/probe-database";
import { samplePath } from "./support/sample-paths";

const counter = async (key: string) => (await query<{ failures: number; blockedUntil: Date | null }>(`SELECT failures, "blockedUntil" FROM "SignInThrottle" WHERE key = $1`, [key]))[0];

describe.skipIf(!browserAvailable())("probe: the password throttle under parallel and distributed guessing", () => {
  it("40 parallel wrong passwords for one account from one address: only the free few reach the password hash", async () => {
    const person = await makeProbeUser("TECHNICIAN", "throttle-parallel");
    const attacker = "203.0.113.10";
    const answers = await Promise.all(Array.from({ length: 40 }, () => trySignIn(person.email, "not the password", attacker)));
    const refusedBeforeHash = answers.filter((a) => /Too many/.test(a.error ?? "")).length;
    const checked = answers.length - refusedBeforeHash;
    const pair = await counter(`pair:${person.email}|${attacker}`);
    recordFigure("10-throttle", { label: "throttle, 40 parallel wrong passwords", values: { attempts: 40, "compared with the hash": checked, "refused before it": refusedBeforeHash, "counter": pair?.failures ?? 0 } });
    expect(checked).toBe(THROTTLE_RULES.accountAtAddress.freeFailures + 1);
    expect(pair?.failures).toBe(checked);
    // The right password is refused there now; the person at their own address is not locked out.
    expect((await trySignIn(person.email, person.password, attacker)).error).toMatch(/Too many/);
    expect((await trySignIn(person.email, person.password, "203.0.113.11")).session).not.toBeNull();
  });

  it("guessing one account from many addresses: blocked for at most the ceiling, never at the owner's known address", async () => {
    const person = await makeProbeUser("QA_MANAGER", "throttle-spread");
    await signIn(person.email, person.password, "203.0.113.20"); // the owner's usual address
    const guesses = THROTTLE_RULES.account.freeFailures + 6;
    await Promise.all(Array.from({ length: guesses }, (_, i) => trySignIn(person.email, "not the password", `203.0.113.${100 + i}`)));
    const account = await counter(`account:${person.email}`);
    const waitS = (account!.blockedUntil!.getTime() - Date.now()) / 1000;
    expect(waitS).toBeGreaterThan(0);
    expect(waitS).toBeLessThanOrEqual(THROTTLE_RULES.account.maxBlockS);
    expect((await trySignIn(person.email, person.password, "203.0.113.99")).error).toMatch(/Too many failed password attempts for this account/);
    expect((await trySignIn(person.email, person.password, "203.0.113.20")).session).not.toBeNull();
  });

  it("the password asked inside a session (changing one's own, signing) is throttled the same way", async () => {
    const person = await makeProbeUser("QA_MANAGER", "throttle-session");
    const session = await signIn(person.email, person.password, "203.0.113.30");
    const change = discoverServerActions().find((a) => a.name === "changeOwnPasswordAction")!;
    const page = await samplePath(change.pages[0]!);
    const codes: string[] = [];
    for (let n = 0; n < 15; n++) {
      const answer = await callAction(change.id, page, [{ currentPassword: `wrong ${n}`, newPassword: "a brand new password", confirmPassword: "a brand new password" }], session);
      codes.push(answer.result?.code ?? String(answer.status));
    }
    const right = await callAction(change.id, page, [{ currentPassword: person.password, newPassword: "a brand new password", confirmPassword: "a brand new password" }], session);
    expect(codes.filter((c) => c === "INVALID_INPUT")).toHaveLength(THROTTLE_RULES.accountAtAddress.freeFailures + 1);
    expect(codes.slice(-5)).toEqual(Array(5).fill("TOO_MANY_ATTEMPTS"));
    expect(right.result?.code).toBe("TOO_MANY_ATTEMPTS");
  });

  it("changing one's own password ends the person's other sessions and keeps the one used", async () => {
    const person = await makeProbeUser("TECHNICIAN", "password-change");
    const here = await signIn(person.email, person.password, "203.0.113.40");
    const elsewhere = await signIn(person.email, person.password, "203.0.113.41");
    const change = discoverServerActions().find((a) => a.name === "changeOwnPasswordAction")!;
    const answer = await callAction(change.id, await samplePath(change.pages[0]!), [{ currentPassword: person.password, newPassword: "a brand new password", confirmPassword: "a brand new password" }], here);
    expect(answer.result?.ok).toBe(true);
    const renewed = { ...here, cookie: mergeCookies(here.cookie, answer) };
    expect((await request("/account", { session: renewed })).status).toBe(200);
    const other = await request("/account", { session: elsewhere });
    expect(other.status).toBe(307);
    expect(other.location).toMatch(/\/sign-in/);
  });
});

/** The session cookie the answer set (the renewed session), over the ones the client had. */
function mergeCookies(cookie: string, answer: { setCookies: string[] }): string {
  const jar = new Map(cookie.split("; ").map((pair) => [pair.slice(0, pair.indexOf("=")), pair.slice(pair.indexOf("=") + 1)] as const));
  for (const line of answer.setCookies) {
    const [pair] = line.split(";");
    jar.set(pair!.slice(0, pair!.indexOf("=")), pair!.slice(pair!.indexOf("=") + 1));
  }
  return [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
}
