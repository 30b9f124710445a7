import { describe, expect, it } from "vitest";
import { allowedActions, CUSTODY_ACTIONS, INITIAL_STATE, ITEM_STATES, transition, type ItemKind } from "@/lib/custody/state-machine";

describe("custody state machine", () => {
  it("walks a specimen through its whole life", () => {
    let state = INITIAL_STATE.specimen;
    for (const [action, expected] of [["ASSIGNED", "ASSIGNED"], ["TEST_STARTED", "UNDER_TEST"], ["TESTED", "TESTED"], ["RETAINED", "RETAINED"], ["DISPOSED", "DISPOSED"]] as const) {
      const result = transition("specimen", state, action);
      expect(result).toEqual({ ok: true, toState: expected });
      if (result.ok) state = result.toState;
    }
  });

  it("walks a roll from the door to disposal, cutting coupons on the way", () => {
    const steps = [["STORED", "STORED"], ["CUT", "CUT"], ["CUT", "CUT"], ["TEST_STARTED", "UNDER_TEST"], ["TESTED", "TESTED"], ["RETAINED", "RETAINED"], ["DISPOSED", "DISPOSED"]] as const;
    let state = INITIAL_STATE.roll;
    for (const [action, expected] of steps) {
      const result = transition("roll", state, action);
      expect(result, `${state} --${action}-->`).toEqual({ ok: true, toState: expected });
      if (result.ok) state = result.toState;
    }
  });

  it("refuses an illegal step and says what is allowed instead", () => {
    const result = transition("specimen", "PREPARED", "TESTED");
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.allowed).toEqual(["MOVED", "ASSIGNED", "RETAINED"]);
      expect(result.message).toBe("A specimen that is prepared cannot finish testing; from here it can only move, assign to a cell, retain.");
    }
  });

  it("lets nothing at all happen to a disposed item", () => {
    for (const kind of ["roll", "coupon", "specimen"] as ItemKind[]) {
      expect(allowedActions(kind, "DISPOSED")).toEqual([]);
      const result = transition(kind, "DISPOSED", "MOVED");
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.message).toMatch(/nothing more can happen to it/);
    }
  });

  it("only disposes of retained items, never straight from the shelf or a cell", () => {
    for (const kind of ["roll", "coupon", "specimen"] as ItemKind[])
      for (const state of ITEM_STATES) {
        const result = transition(kind, state, "DISPOSED");
        if (result.ok) expect(state).toBe("RETAINED");
      }
  });

  it("keeps the state on a move, and never moves a specimen out of a cell under test", () => {
    for (const kind of ["roll", "coupon", "specimen"] as ItemKind[])
      for (const state of ITEM_STATES) {
        const result = transition(kind, state, "MOVED");
        if (result.ok) expect(result.toState).toBe(state);
      }
    expect(transition("specimen", "UNDER_TEST", "MOVED").ok).toBe(false);
    expect(transition("specimen", "ASSIGNED", "MOVED").ok).toBe(false);
  });

  it("takes a specimen out of its cell only when its run is given up, into retention, from where it may be disposed of", () => {
    expect(transition("specimen", "ASSIGNED", "WITHDRAWN")).toEqual({ ok: true, toState: "RETAINED" });
    expect(transition("specimen", "UNDER_TEST", "WITHDRAWN")).toEqual({ ok: true, toState: "RETAINED" });
    for (const state of ITEM_STATES.filter((s) => s !== "ASSIGNED" && s !== "UNDER_TEST")) expect(transition("specimen", state, "WITHDRAWN").ok, state).toBe(false);
    for (const state of ITEM_STATES) expect(transition("roll", state, "WITHDRAWN").ok).toBe(false);
    expect(transition("specimen", "RETAINED", "DISPOSED").ok).toBe(true);
  });

  it("has an answer for every kind, state and action without throwing", () => {
    for (const kind of ["roll", "coupon", "specimen"] as ItemKind[])
      for (const state of ITEM_STATES) for (const action of CUSTODY_ACTIONS) expect(typeof transition(kind, state, action).ok).toBe("boolean");
  });
});
