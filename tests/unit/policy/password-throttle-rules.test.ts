import { describe, expect, it } from "vitest";
import { blockSecondsAfter, THROTTLE_RULES, throttleKeys, throttleMessage } from "@/lib/policy/sign-in-throttle";

describe("password throttle rules", () => {
  it("caps the account-wide wait at the ceiling, however many failures", () => {
    expect(blockSecondsAfter(THROTTLE_RULES.account.freeFailures, THROTTLE_RULES.account)).toBe(0);
    expect(blockSecondsAfter(THROTTLE_RULES.account.freeFailures + 1, THROTTLE_RULES.account)).toBe(15);
    expect(blockSecondsAfter(1000, THROTTLE_RULES.account)).toBe(60);
    expect(blockSecondsAfter(1000, THROTTLE_RULES.address)).toBe(15 * 60);
  });

  it("counts an attempt per account at its address, per address, and per account unless the address is known", () => {
    expect(throttleKeys("Person@Lab.Example", "203.0.113.5", false)).toEqual([
      { key: "pair:person@lab.example|203.0.113.5", kind: "accountAtAddress" },
      { key: "address:203.0.113.5", kind: "address" },
      { key: "account:person@lab.example", kind: "account" },
    ]);
    expect(throttleKeys("p@lab.example", "203.0.113.5", true).map((k) => k.kind)).toEqual(["accountAtAddress", "address"]);
    expect(throttleKeys("p@lab.example", null, false).map((k) => k.key)).toEqual(["pair:p@lab.example|unknown", "account:p@lab.example"]);
  });

  it("says how long to wait, in minutes when it is long", () => {
    expect(throttleMessage("account", 15)).toBe("Too many failed password attempts for this account; try again in 15 s.");
    expect(throttleMessage("address", 900)).toBe("Too many failed password attempts from this network address; try again in 15 minutes.");
  });
});
