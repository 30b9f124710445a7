import { describe, expect, it } from "vitest";
import { allowedRunSteps, holdsCell, RUN_STATES, RUN_STEPS, runTransition, type RunStateName, type RunStep } from "@/lib/runs/run-state-machine";
import { checkStagePressures } from "@/lib/runs/pressure-checks";
import { enteredPressureToPa } from "@/lib/units/pressure-entry";

describe("run state machine", () => {
  it("walks a run from set-up to approval", () => {
    const path: Array<[RunStep, RunStateName]> = [
      ["start-saturation", "SATURATING"], ["add-stage", "SATURATING"], ["start-equilibration", "EQUILIBRATING"], ["start-permeation", "PERMEATING"],
      ["record-reading", "PERMEATING"], ["terminate", "TERMINATED"], ["record-post-test", "POST_TEST_RECORDED"], ["submit", "SUBMITTED"], ["approve", "APPROVED"],
    ];
    let state: RunStateName = "SET_UP";
    for (const [step, expected] of path) {
      const result = runTransition(state, step);
      expect(result, `${state} --${step}-->`).toEqual({ ok: true, toState: expected });
      if (result.ok) state = result.toState;
    }
    expect(allowedRunSteps("APPROVED")).toEqual([]);
  });

  it("sends a returned run back to the technician, who submits it again", () => {
    expect(runTransition("SUBMITTED", "return")).toEqual({ ok: true, toState: "RETURNED" });
    expect(runTransition("RETURNED", "record-post-test")).toEqual({ ok: true, toState: "RETURNED" });
    expect(runTransition("RETURNED", "submit")).toEqual({ ok: true, toState: "SUBMITTED" });
  });

  it("refuses skipping steps and says what can be done instead", () => {
    const result = runTransition("SATURATING", "terminate");
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toBe("A run that is saturating cannot terminate the run; from here you can record a back-pressure stage, start the equilibration hold, abandon it.");
    expect(runTransition("PERMEATING", "submit").ok).toBe(false);
    expect(runTransition("TERMINATED", "record-reading").ok).toBe(false);
    expect(runTransition("SUBMITTED", "record-reading").ok).toBe(false);
  });

  it("lets a run be abandoned in every state before approval, and nothing after", () => {
    const before = RUN_STATES.filter((s) => s !== "APPROVED" && s !== "ABANDONED");
    for (const state of before) expect(runTransition(state, "abandon"), state).toEqual({ ok: true, toState: "ABANDONED" });
    expect(runTransition("APPROVED", "abandon").ok).toBe(false);
    expect(allowedRunSteps("ABANDONED")).toEqual([]);
    // An abandoned run can never be submitted, so it never reaches review.
    expect(RUN_STATES.filter((s) => runTransition(s, "submit").ok)).not.toContain("ABANDONED");
    expect(holdsCell("ABANDONED")).toBe(false);
  });

  it("frees the cell once permeation is terminated", () => {
    expect(RUN_STATES.filter(holdsCell)).toEqual(["SET_UP", "SATURATING", "EQUILIBRATING", "PERMEATING"]);
  });

  it("answers every state and step without throwing", () => {
    for (const state of RUN_STATES) for (const step of RUN_STEPS) expect(typeof runTransition(state, step).ok).toBe("boolean");
  });
});

describe("stage pressure checks (confining margin: about 35 kPa, common practice per shared/DOMAIN.md)", () => {
  const instruments = [{ assetTag: "CELL-01", ratedMaxPressurePa: 1_000_000 }, { assetTag: "PT-01", ratedMaxPressurePa: 700_000 }, { assetTag: "TH-01", ratedMaxPressurePa: null }];

  it("accepts a stage that keeps the margin over the higher line pressure", () => {
    const check = checkStagePressures({ cellPa: 552_000, influentPa: 517_000, effluentPa: 503_000 }, 35_000, instruments);
    expect(check).toMatchObject({ marginPa: 35_000, marginKept: true, overRated: [], warnings: [] });
  });

  it("warns when the cell is less than the margin above either line", () => {
    const check = checkStagePressures({ cellPa: 540_000, influentPa: 517_000, effluentPa: 400_000 }, 35_000, instruments);
    expect(check.marginKept).toBe(false);
    expect(check.marginPa).toBe(23_000);
    expect(check.warnings[0]).toMatch(/by 23\.0 kPa, less than the 35 kPa confining margin/);
  });

  it("names each instrument whose rated pressure would be exceeded", () => {
    const check = checkStagePressures({ cellPa: 800_000, influentPa: 600_000, effluentPa: 600_000 }, 35_000, instruments);
    expect(check.overRated.map((o) => o.assetTag)).toEqual(["PT-01"]);
    expect(check.warnings).toContain("PT-01 is rated to 700 kPa; 800 kPa would exceed it.");
  });

  it("turns psi into pascals with the exact NIST SP 811 factor (1 psi = 6894.757293168361 Pa)", () => {
    expect(enteredPressureToPa(5, "PSI")).toBeCloseTo(34_473.786465841805, 6);
    expect(enteredPressureToPa(35, "KPA")).toBe(35_000);
  });
});
