import { describe, expect, it } from "vitest";
import { eventOrderProblem } from "@/lib/custody/event-order";

const now = new Date("2026-12-02T12:00:00Z");
const received = { at: new Date("2026-12-02T08:00:00Z"), what: "roll R26-00004 was received with shipment S26-00002" };

describe("the order of events", () => {
  it("accepts a time at or after every earlier event and not in the future", () => {
    expect(eventOrderProblem({ label: "The cut time", at: received.at, after: [received], now, zone: "UTC" })).toBeNull();
    expect(eventOrderProblem({ label: "The cut time", at: new Date("2026-12-02T09:00:00Z"), after: [received, null], now, zone: "UTC" })).toBeNull();
    // A clock a few minutes ahead of the server's is not the future (5 minutes, as the forms allow).
    expect(eventOrderProblem({ label: "The cut time", at: new Date(now.getTime() + 4 * 60_000), now, zone: "UTC" })).toBeNull();
  });

  it("names the earlier event a time conflicts with, in the lab's zone", () => {
    expect(eventOrderProblem({ label: "The cut time", at: new Date("2026-11-25T10:00:00Z"), after: [received], now, zone: "Europe/Berlin" })).toBe(
      "The cut time (2026-11-25 11:00 CET) is before roll R26-00004 was received with shipment S26-00002 (2026-12-02 09:00 CET); it cannot be earlier than that.",
    );
  });

  it("compares with the latest of several earlier events and the earliest of later ones", () => {
    const mounted = { at: new Date("2026-12-01T08:00:00Z"), what: "the specimen was mounted" };
    const stage = { at: new Date("2026-12-01T10:00:00Z"), what: "stage 1 started" };
    expect(eventOrderProblem({ label: "The stage start", at: new Date("2026-12-01T09:00:00Z"), after: [mounted, stage], now, zone: "UTC" })).toBe(
      "The stage start (2026-12-01 09:00 UTC) is before stage 1 started (2026-12-01 10:00 UTC); it cannot be earlier than that.",
    );
    const cuts = [{ at: new Date("2026-12-01T10:00:00Z"), what: "coupon C2 was cut" }, { at: new Date("2026-11-30T10:00:00Z"), what: "coupon C1 was cut" }];
    expect(eventOrderProblem({ label: "The corrected receipt time", at: new Date("2026-12-01T00:00:00Z"), before: cuts, now, zone: "UTC" })).toBe(
      "The corrected receipt time (2026-12-01 00:00 UTC) is after coupon C1 was cut (2026-11-30 10:00 UTC); it cannot be later than that.",
    );
  });

  it("refuses the future before anything else", () => {
    expect(eventOrderProblem({ label: "The mount time", at: new Date("2026-12-03T12:00:00Z"), after: [received], now, zone: "UTC" })).toBe(
      "The mount time (2026-12-03 12:00 UTC) is in the future; enter when it happened.",
    );
  });
});
