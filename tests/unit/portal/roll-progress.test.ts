import { describe, expect, it } from "vitest";
import { computeRollProgress, describeRollProgress, type RollChainFacts } from "@/lib/portal/roll-progress";

// Check values follow from the chain in DOMAIN.md (roll -> coupon -> specimen -> run -> result -> certificate).
const day = (n: number) => new Date(Date.UTC(2026, 10, n));
const statuses = (facts: RollChainFacts) => computeRollProgress(facts).map((s) => `${s.key}:${s.status}`);

describe("a roll's progress through the chain", () => {
  it("is at 'received' with nothing cut yet", () => {
    const facts: RollChainFacts = { receivedAt: day(1), coupons: [], certificateIssuedAt: [] };
    expect(statuses(facts)).toEqual(["received:current", "cut:pending", "prepared:pending", "testing:pending", "tested:pending", "certified:pending"]);
    expect(computeRollProgress(facts)[0]!.at).toEqual(day(1));
    expect(describeRollProgress(computeRollProgress(facts))).toBe("Received");
  });

  it("is under test while any run of its specimens is still in a cell, even if another has ended", () => {
    const facts: RollChainFacts = {
      receivedAt: day(1),
      coupons: [{ cutAt: day(3), specimens: [
        { preparedAt: day(4), runs: [{ state: "SUBMITTED", assignedAt: day(5), terminatedAt: day(9) }] },
        { preparedAt: day(6), runs: [{ state: "PERMEATING", assignedAt: day(7), terminatedAt: null }] },
      ] }],
      certificateIssuedAt: [],
    };
    const steps = computeRollProgress(facts);
    expect(statuses(facts)).toEqual(["received:done", "cut:done", "prepared:done", "testing:current", "tested:pending", "certified:pending"]);
    expect(steps.find((s) => s.key === "prepared")!.at).toEqual(day(4)); // the earliest specimen
    expect(steps.find((s) => s.key === "testing")!.at).toEqual(day(5));
  });

  it("is tested once every run has ended, dated by the last to end", () => {
    const facts: RollChainFacts = {
      receivedAt: day(1),
      coupons: [{ cutAt: day(3), specimens: [
        { preparedAt: day(4), runs: [{ state: "APPROVED", assignedAt: day(5), terminatedAt: day(9) }] },
        { preparedAt: day(4), runs: [{ state: "TERMINATED", assignedAt: day(6), terminatedAt: day(11) }] },
      ] }],
      certificateIssuedAt: [],
    };
    const steps = computeRollProgress(facts);
    expect(describeRollProgress(steps)).toBe("Tested");
    expect(steps.find((s) => s.key === "tested")!.at).toEqual(day(11));
  });

  it("is all done once a result of the roll is on an issued certificate", () => {
    const facts: RollChainFacts = {
      receivedAt: day(1),
      coupons: [{ cutAt: day(3), specimens: [{ preparedAt: day(4), runs: [{ state: "APPROVED", assignedAt: day(5), terminatedAt: day(9) }] }] }],
      certificateIssuedAt: [day(14), day(12)],
    };
    const steps = computeRollProgress(facts);
    expect(steps.every((s) => s.status === "done")).toBe(true);
    expect(steps.at(-1)!.at).toEqual(day(12));
    expect(describeRollProgress(steps)).toBe("On a certificate");
  });
});
