import { describe, expect, it } from "vitest";
import { evaluateRun, TERMINATION_DEFAULTS, type Criterion, type Reading, type RunInput } from "../../../lib/hydraulics";

const specimen = { diameterMm: 100, thicknessMm: 5 };

/** Readings from per-interval volumes (mL), one interval every dtS seconds; extra fields per reading. */
function readingsFrom(
  inPerInterval: readonly number[],
  outPerInterval: readonly number[],
  extra: (i: number) => Partial<Reading> = () => ({}),
  dtS = 3600,
): Reading[] {
  const rs: Reading[] = [{ elapsedS: 0, inflowMl: 0, outflowMl: 0, headKPa: 14, temperatureC: 20, ...extra(0) }];
  let vin = 0;
  let vout = 0;
  for (let i = 0; i < inPerInterval.length; i++) {
    vin += inPerInterval[i] as number;
    vout += outPerInterval[i] as number;
    rs.push({ elapsedS: (i + 1) * dtS, inflowMl: vin, outflowMl: vout, headKPa: 14, temperatureC: 20, ...extra(i + 1) });
  }
  return rs;
}
const repeat = (v: number, n: number) => Array.from({ length: n }, () => v);
const byKey = (cs: Criterion[], key: Criterion["key"]) => {
  const c = cs.find((x) => x.key === key);
  if (!c) throw new Error(`no criterion ${key}`);
  return c;
};

describe("criteria sets per method", () => {
  it("name the expected criteria", () => {
    expect(TERMINATION_DEFAULTS.D5887.criteria).toEqual(["ratio-band", "trend"]);
    expect(TERMINATION_DEFAULTS.D5084.criteria).toEqual(["ratio-band", "k-band", "trend"]);
    expect(TERMINATION_DEFAULTS.D6766.criteria).toEqual(["ratio-band", "trend", "ec-equilibrium", "ph-equilibrium", "pore-volumes"]);
    expect(TERMINATION_DEFAULTS.D5084).toMatchObject({ ratioMin: 0.75, ratioMax: 1.25, consecutiveIntervals: 4, kBandFraction: 0.25, kBandFractionBelowThreshold: 0.5, kBandThresholdMPerS: 1e-10 });
  });
});

describe("D5887", () => {
  const run = (rs: Reading[]): RunInput => ({ method: "D5887", specimen, readings: rs });

  it("clearly met: steady flow, ratio 0.95", () => {
    const ev = evaluateRun(run(readingsFrom(repeat(1, 6), repeat(0.95, 6))));
    expect(ev.termination.met).toBe(true);
    const ratio = byKey(ev.termination.criteria, "ratio-band");
    expect(ratio.value).toBeCloseTo(0.95, 10);
    expect(ratio.limit).toMatch(/0\.75.*1\.25/);
    expect(byKey(ev.termination.criteria, "trend").value).toBe(1); // flat: p = 1
  });

  it("clearly not met: outflow half the inflow", () => {
    const ev = evaluateRun(run(readingsFrom(repeat(1, 6), repeat(0.5, 6))));
    expect(ev.termination.met).toBe(false);
    const ratio = byKey(ev.termination.criteria, "ratio-band");
    expect(ratio.met).toBe(false);
    expect(ratio.value).toBeCloseTo(0.5, 10);
    expect(ratio.message).toMatch(/0\.500 is outside 0\.75–1\.25/);
    expect(byKey(ev.termination.criteria, "trend").met).toBe(true);
  });

  it("clearly not met: flux still falling 10 % an interval", () => {
    // Volumes 1, 0.9, 0.81, ... : the last 4 intervals fall 0.59, 0.53, 0.48, 0.43 mL — a plain trend.
    const v = Array.from({ length: 8 }, (_, i) => 0.9 ** i);
    const ev = evaluateRun(run(readingsFrom(v, v)));
    const trend = byKey(ev.termination.criteria, "trend");
    expect(trend.met).toBe(false);
    expect(trend.value as number).toBeLessThan(0.01);
    expect(trend.message).toMatch(/falling/);
    expect(ev.reported.flux).toBeNull();
  });

  it("not met with too few intervals, saying how many", () => {
    const ev = evaluateRun(run(readingsFrom(repeat(1, 3), repeat(1, 3))));
    expect(ev.termination.met).toBe(false);
    expect(byKey(ev.termination.criteria, "ratio-band").message).toMatch(/Needs 4 consecutive intervals and there are 3/);
  });

  it("a scattered but level flux is not a trend", () => {
    // Last 4: 1.05, 0.95, 1.04, 0.97 — slope -0.015 per interval, se 0.0252, t = -0.595, df 2: p = 0.61.
    const v = [1, 1, 1.05, 0.95, 1.04, 0.97];
    const ev = evaluateRun(run(readingsFrom(v, v)));
    const trend = byKey(ev.termination.criteria, "trend");
    expect(trend.met).toBe(true);
    expect(trend.value).toBeCloseTo(0.612, 3);
    expect(ev.termination.met).toBe(true);
  });

  it("lab-adjusted numbers are used", () => {
    const rs = readingsFrom(repeat(1, 6), repeat(0.8, 6));
    expect(evaluateRun(run(rs)).termination.met).toBe(true);
    const strict = evaluateRun(run(rs), { termination: { ratioMin: 0.9, ratioMax: 1.1 } });
    expect(strict.termination.met).toBe(false);
    expect(byKey(strict.termination.criteria, "ratio-band").limit).toMatch(/0\.9 ≤ outflow\/inflow ≤ 1\.1/);
    const six = evaluateRun(run(rs), { termination: { consecutiveIntervals: 6 } });
    expect(six.termination.met).toBe(true);
    const seven = evaluateRun(run(rs), { termination: { consecutiveIntervals: 7 } });
    expect(seven.termination.met).toBe(false);
  });
});

describe("D5084", () => {
  const run = (rs: Reading[]): RunInput => ({ method: "D5084", specimen, readings: rs });

  it("clearly met: steady k", () => {
    const ev = evaluateRun(run(readingsFrom(repeat(1, 6), repeat(1, 6))));
    expect(ev.termination.met).toBe(true);
    expect(byKey(ev.termination.criteria, "k-band").value).toBeCloseTo(0, 10);
  });

  it("k spread of ±26.8 % fails the ±25 % band when k ≥ 1e-10 m/s", () => {
    // Last 4 volumes 1.3, 0.75, 1.3, 0.75 mL/h: mean 1.025, largest deviation 0.275 / 1.025 = 26.83 %.
    // k at 1 mL/h = 3.536777e-8 / 285.4230 = 1.2391e-10 m/s, above 1e-10, so the band is ±25 %.
    const v = [1, 1, 1.3, 0.75, 1.3, 0.75];
    const ev = evaluateRun(run(readingsFrom(v, v)));
    const band = byKey(ev.termination.criteria, "k-band");
    expect(band.met).toBe(false);
    expect(band.value).toBeCloseTo(0.268293, 5);
    expect(byKey(ev.termination.criteria, "trend").met).toBe(true); // alternating, no trend (p ≈ 0.55)
    expect(ev.termination.met).toBe(false);
  });

  it("the same spread passes the ±50 % band when k < 1e-10 m/s", () => {
    // Scale volumes by 0.4: k at 0.41 mL/h mean is 0.41 × 1.2391e-10 = 5.08e-11 m/s, below 1e-10.
    const v = [1, 1, 1.3, 0.75, 1.3, 0.75].map((x) => x * 0.4);
    const ev = evaluateRun(run(readingsFrom(v, v)));
    const band = byKey(ev.termination.criteria, "k-band");
    expect(band.met).toBe(true);
    expect(band.value).toBeCloseTo(0.268293, 5);
    expect(ev.termination.met).toBe(true);
  });

  it("clearly not met: k falling steadily", () => {
    const v = Array.from({ length: 8 }, (_, i) => 0.9 ** i);
    const ev = evaluateRun(run(readingsFrom(v, v)));
    expect(byKey(ev.termination.criteria, "trend").met).toBe(false);
    expect(byKey(ev.termination.criteria, "k-band").met).toBe(true); // 0.9^4..0.9^7: mean 0.5641, largest deviation 16.3 % < 25 %
    expect(ev.termination.met).toBe(false);
  });
});

describe("D6766", () => {
  const chemistry = (ecRatio: number, phDiff: number) => () => ({
    influentEcMsPerM: 100,
    effluentEcMsPerM: 100 * ecRatio,
    influentPh: 7,
    effluentPh: 7 + phDiff,
  });
  // 10 mL per day: 8 days of 0.95 × 10 mL outflow = 76 mL. Pore volume (see pore-volumes.test.ts):
  // n = 1 - (3.66 / 0.005) / 2750 = 0.733818; PV = 0.733818 × 39.2699 mL = 28.8170 mL -> 2.637 PV.
  const base = (ec = 1.05, ph = 0.2) => readingsFrom(repeat(10, 8), repeat(9.5, 8), chemistry(ec, ph), 86400);
  const run = (rs: Reading[], withMass = true): RunInput => ({
    method: "D6766",
    specimen: withMass ? { ...specimen, bentoniteMassPerAreaKgPerM2: 3.66 } : specimen,
    readings: rs,
  });

  it("clearly met: steady, in chemical equilibrium, 2.64 pore volumes", () => {
    const ev = evaluateRun(run(base()));
    expect(ev.termination.met).toBe(true);
    expect(ev.poreVolumesOfFlow).toBeCloseTo(76 / 28.817, 3);
    expect(byKey(ev.termination.criteria, "ec-equilibrium").value).toBeCloseTo(1.05, 12);
    expect(byKey(ev.termination.criteria, "ph-equilibrium").value).toBeCloseTo(0.2, 12);
  });

  it("clearly not met: effluent EC 30 % above influent", () => {
    const ev = evaluateRun(run(base(1.3)));
    const ec = byKey(ev.termination.criteria, "ec-equilibrium");
    expect(ec.met).toBe(false);
    expect(ec.value).toBeCloseTo(1.3, 12);
    expect(ec.message).toMatch(/not yet in chemical equilibrium/);
    expect(ev.termination.met).toBe(false);
  });

  it("clearly not met: effluent pH 1.2 units off", () => {
    const ev = evaluateRun(run(base(1.0, -1.2)));
    const ph = byKey(ev.termination.criteria, "ph-equilibrium");
    expect(ph.met).toBe(false);
    expect(ph.value).toBeCloseTo(-1.2, 12);
    expect(ph.message).toBe("Effluent pH is 1.2 below the influent's, more than the 0.5 allowed; keep permeating.");
    expect(ev.termination.met).toBe(false);
  });

  it("EC exactly at the 10 % edge counts as within", () => {
    expect(byKey(evaluateRun(run(base(1.1))).termination.criteria, "ec-equilibrium").met).toBe(true);
  });

  it("without bentonite mass or porosity the pore-volume criterion says what is missing", () => {
    const ev = evaluateRun(run(base(), false));
    const pv = byKey(ev.termination.criteria, "pore-volumes");
    expect(pv.met).toBe(false);
    expect(pv.value).toBeNull();
    expect(pv.message).toBe("Pore volumes cannot be counted: enter the specimen's measured porosity or its dry bentonite mass per unit area.");
    expect(ev.termination.met).toBe(false);
  });

  it("too few pore volumes", () => {
    // 4 days × 9.5 mL = 38 mL = 1.32 PV < 2.
    const ev = evaluateRun(run(readingsFrom(repeat(10, 4), repeat(9.5, 4), chemistry(1, 0), 86400)));
    const pv = byKey(ev.termination.criteria, "pore-volumes");
    expect(pv.met).toBe(false);
    expect(pv.value).toBeCloseTo(38 / 28.817, 3);
  });

  it("no chemistry recorded", () => {
    const ev = evaluateRun(run(readingsFrom(repeat(10, 8), repeat(9.5, 8), () => ({}), 86400)));
    expect(byKey(ev.termination.criteria, "ec-equilibrium").message).toMatch(/No reading has both influent and effluent EC/);
    expect(byKey(ev.termination.criteria, "ph-equilibrium").met).toBe(false);
  });
});
