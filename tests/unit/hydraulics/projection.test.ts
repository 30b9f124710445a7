import { describe, expect, it } from "vitest";
import { evaluateRun, type Reading, type RunInput } from "../../../lib/hydraulics";

const specimen = { diameterMm: 100, thicknessMm: 5 };

/**
 * Hourly readings whose flow decays to a steady state, (1 + 2 e^(-i/6)) mL per hour, with ±2 %
 * deterministic pseudo-noise (a linear congruential generator, so the test is repeatable).
 */
function decayingRun(intervals: number): Reading[] {
  const rs: Reading[] = [{ elapsedS: 0, inflowMl: 0, outflowMl: 0, headKPa: 14, temperatureC: 20 }];
  let v = 0;
  let seed = 12345;
  for (let i = 1; i <= intervals; i++) {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    v += (1 + 2 * Math.exp(-i / 6)) * (1 + 0.04 * (seed / 2147483648 - 0.5));
    rs.push({ elapsedS: i * 3600, inflowMl: v, outflowMl: v * 0.97, headKPa: 14, temperatureC: 20 });
  }
  return rs;
}

const d5887 = (readings: Reading[]): RunInput => ({ method: "D5887", specimen, readings });

describe("projection of termination", () => {
  it("is the present time once the criteria are met", () => {
    const rs = decayingRun(60);
    const ev = evaluateRun(d5887(rs));
    expect(ev.termination.met).toBe(true);
    expect(ev.projection.projectedAtS).toBe(60 * 3600);
  });

  it("projects a dying trend close to when the criteria are actually met", () => {
    const all = decayingRun(80);
    // Find when the criteria are really first met by evaluating after each reading.
    let actualS = Number.NaN;
    for (let m = 3; m <= all.length; m++) {
      const ev = evaluateRun(d5887(all.slice(0, m)));
      if (ev.termination.met) {
        actualS = (all[m - 1] as Reading).elapsedS;
        break;
      }
    }
    expect(actualS).toBe(18 * 3600); // met after 18 hours for this seed
    // Projection made at 11 hours, before the criteria are met.
    const early = evaluateRun(d5887(all.slice(0, 12)));
    expect(early.termination.met).toBe(false);
    const p = early.projection.projectedAtS;
    expect(p).not.toBeNull();
    expect(p as number).toBeGreaterThan(11 * 3600);
    // Within ±25 % of the actual time (it gives about 17.3 h against 18 h).
    expect(Math.abs((p as number) / actualS - 1)).toBeLessThan(0.25);
    expect(early.projection.reason).toMatch(/shrinking by a factor/);
  });

  it("is null with a reason when there are too few intervals to judge a trend", () => {
    const ev = evaluateRun(d5887(decayingRun(5)));
    expect(ev.projection.projectedAtS).toBeNull();
    expect(ev.projection.reason).toMatch(/needs 8 intervals; there are 5/);
  });

  it("is null when flux rises (the trend is not dying away)", () => {
    const v = Array.from({ length: 10 }, (_, i) => 1 + 0.1 * i * i);
    let cum = 0;
    const rs: Reading[] = [{ elapsedS: 0, inflowMl: 0, outflowMl: 0, headKPa: 14, temperatureC: 20 }];
    v.forEach((dv, i) => {
      cum += dv;
      rs.push({ elapsedS: (i + 1) * 3600, inflowMl: cum, outflowMl: cum, headKPa: 14, temperatureC: 20 });
    });
    const ev = evaluateRun(d5887(rs));
    expect(ev.termination.met).toBe(false);
    expect(ev.projection.projectedAtS).toBeNull();
    expect(ev.projection.reason).toMatch(/not dying away/);
  });

  it("is null when the ratio sits outside its band without approaching it", () => {
    const rs = Array.from({ length: 10 }, (_, i) => ({ elapsedS: i * 3600, inflowMl: i, outflowMl: i * 0.5, headKPa: 14, temperatureC: 20 }));
    const ev = evaluateRun(d5887(rs));
    expect(ev.projection.projectedAtS).toBeNull();
    expect(ev.projection.reason).toMatch(/no clear approach/);
  });

  it("projects pore volumes at the present outflow rate (D6766)", () => {
    // 10 mL/day in, 9.5 mL/day out for 4 days, in chemical equilibrium. PV = 28.81697 mL (see pore-volumes test).
    // Now: 38 mL = 1.318666 PV; rate 9.5 / 28.81697 = 0.329667 PV/day; (2 - 1.318666) / 0.329667 = 2.066726 days more.
    const rs = Array.from({ length: 5 }, (_, i) => ({
      elapsedS: i * 86400, inflowMl: 10 * i, outflowMl: 9.5 * i, headKPa: 14, temperatureC: 20,
      influentEcMsPerM: 100, effluentEcMsPerM: 101, influentPh: 7, effluentPh: 7.1,
    }));
    const ev = evaluateRun({ method: "D6766", specimen: { ...specimen, bentoniteMassPerAreaKgPerM2: 3.66 }, readings: rs });
    const pv = ev.projection.byCriterion.find((c) => c.key === "pore-volumes");
    expect(pv?.projectedAtS as number).toBeCloseTo(4 * 86400 + 2.066726 * 86400, -1);
    // Flow is steady and the chemistry matches, so pore volumes are the only criterion left.
    expect(ev.termination.criteria.filter((c) => !c.met).map((c) => c.key)).toEqual(["pore-volumes"]);
    expect(ev.projection.projectedAtS).toBe(pv?.projectedAtS);
  });
});
