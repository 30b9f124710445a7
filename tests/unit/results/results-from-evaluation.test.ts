import { describe, expect, it } from "vitest";
import { evaluateRun, validateDeclaredUncertainties, type Reading, type RunInput } from "../../../lib/hydraulics";
import { DEMO_LAB_DECLARED_UNCERTAINTIES } from "../../../prisma/seed/demo-uncertainties";
import { resultsFromEvaluation } from "../../../lib/results/results-from-evaluation";

const specimen = { diameterMm: 100, thicknessMm: 5 };

/** Steady run: readings one hour apart, 1.0 mL in and out per hour, 14 kPa, 20 °C (worked example below). */
function steadyReadings(count: number): Reading[] {
  return Array.from({ length: count }, (_, i) => ({ elapsedS: i * 3600, inflowMl: i, outflowMl: i, headKPa: 14, temperatureC: 20 }));
}
const run = (count: number, method: RunInput["method"]): RunInput => ({ method, specimen, readings: steadyReadings(count) });

// Worked example (arithmetic written out): A = π 0.1² / 4 = 0.0078539816 m²; q = 1e-6 m³ / (A × 3600 s)
// = 3.5367765e-8 m³/m²/s; i = (14 / 9.81) m / 0.005 m = 285.42304; k = q / i = 1.2391349e-10 m/s;
// R_T at 20 °C by the D5084 equation, 2.2902 × 0.9842^20 / 20^0.1702 = 1.0002425, so k20 = 1.2394354e-10 m/s.
const FLUX = 3.5367765e-8;
const K20 = 1.2394354e-10;

describe("resultsFromEvaluation", () => {
  it("D5887 reports index flux and k20 beside it, with the uncertainty, temperature and unit-weight basis", () => {
    const ev = evaluateRun(run(8, "D5887"), { uncertainty: DEMO_LAB_DECLARED_UNCERTAINTIES });
    expect(ev.termination.met).toBe(true);
    const results = resultsFromEvaluation(ev, "D5887");
    expect(results.map((r) => [r.property, r.unit])).toEqual([["INDEX_FLUX", "m3/m2/s"], ["HYDRAULIC_CONDUCTIVITY", "m/s"]]);
    const [flux, k] = results;
    expect(flux!.value).toBeCloseTo(FLUX, 14);
    expect(k!.value).toBeCloseTo(K20, 16);
    expect(flux!.expandedUncertainty).toBe(ev.uncertainty!.fluxM3PerM2PerS);
    expect(k!.expandedUncertainty).toBe(ev.uncertainty!.k20MPerS);
    expect(flux).toMatchObject({ temperatureC: 20, unitWeightBasis: "conventional-9.81", earlyEnd: false });
  });

  it("D5084 and D6766 report hydraulic conductivity only", () => {
    const ev = evaluateRun(run(8, "D5084"));
    expect(ev.termination.met).toBe(true);
    const results = resultsFromEvaluation(ev, "D5084");
    expect(results).toHaveLength(1);
    expect(results[0]).toMatchObject({ property: "HYDRAULIC_CONDUCTIVITY", unit: "m/s", expandedUncertainty: null });
    expect(results[0]!.value).toBeCloseTo(K20, 16);
  });

  it("refuses, with a sentence naming the unmet criteria, a run whose criteria are not met", () => {
    const ev = evaluateRun(run(3, "D5887")); // 2 intervals, 4 needed
    expect(ev.reported.flux).toBeNull();
    expect(() => resultsFromEvaluation(ev, "D5887")).toThrowError(/^The termination criteria are not met \(.+\), so the run has no result to report/);
  });

  it("with allowEarlyEnd, reports the means over the last intervals, marked as an early end", () => {
    const ev = evaluateRun(run(3, "D5887"), { uncertainty: DEMO_LAB_DECLARED_UNCERTAINTIES });
    const results = resultsFromEvaluation(ev, "D5887", { allowEarlyEnd: true });
    expect(results[0]).toMatchObject({ property: "INDEX_FLUX", earlyEnd: true, expandedUncertainty: null });
    expect(results[0]!.value).toBeCloseTo(FLUX, 14);
    expect(results[1]!.value).toBeCloseTo(K20, 16);
  });

  it("an early end states an uncertainty when given the specimen, by the library's own propagation", () => {
    // Asking for 5 consecutive intervals of a 4-interval run leaves the criteria unmet over those 4 intervals...
    const unmet = evaluateRun(run(5, "D5887"), { termination: { consecutiveIntervals: 5 } });
    expect(unmet.termination.met).toBe(false);
    const early = resultsFromEvaluation(unmet, "D5887", { allowEarlyEnd: true, earlyEndUncertainty: { declared: DEMO_LAB_DECLARED_UNCERTAINTIES, ...specimen } });
    // ...and the default 4 meets them over the same 4 intervals, so the library's own U must be the same.
    const met = evaluateRun(run(5, "D5887"), { uncertainty: DEMO_LAB_DECLARED_UNCERTAINTIES });
    expect(met.termination.met).toBe(true);
    expect(early[0]!.expandedUncertainty).toBeCloseTo(met.uncertainty!.fluxM3PerM2PerS, 22);
    expect(early[1]!.expandedUncertainty).toBeCloseTo(met.uncertainty!.k20MPerS, 24);
  });

  it("refuses a method that is not the one evaluated", () => {
    expect(() => resultsFromEvaluation(evaluateRun(run(8, "D5887")), "D5084")).toThrowError("The run was evaluated as ASTM D5887 but is recorded as ASTM D5084; re-evaluate it before reporting.");
  });
});

describe("DEMO_LAB_DECLARED_UNCERTAINTIES", () => {
  it("is a valid declaration for the library", () => {
    expect(() => validateDeclaredUncertainties(DEMO_LAB_DECLARED_UNCERTAINTIES)).not.toThrow();
    expect(Object.isFrozen(DEMO_LAB_DECLARED_UNCERTAINTIES)).toBe(true);
  });
});
