import { evaluate } from "mathjs";
import { describe, expect, it } from "vitest";
import { cumulativeVolumesAcrossRefillsMl, evaluateRun, type Reading } from "../../../lib/hydraulics";

// A worked example of ASTM D5084 method C (falling head in the inflow burette, rising tail in the outflow
// burette) with the head taken from the burette levels, the datum offsets of the two burettes' zeros and a
// refill. Invented numbers; the check values come from the D5084 method C formula typed here into mathjs,
//   k = a_in a_out L / ((a_in + a_out) A dt) · ln(h1 / h2),
// independently of lib/hydraulics.
const A_IN_MM2 = 31.4;
const A_OUT_MM2 = 31.2;
const ZERO_IN_MM = 0; // the inflow burette's 0 mark is on the datum
const ZERO_OUT_MM = 40; // the outflow burette's 0 mark sits 40 mm higher
const DP_KPA = 531 - 517; // influent minus effluent line pressure
const L_MM = 5.9;
const D_MM = 100;

// Scale readings (mm) as the technician writes them; reading 3 is taken five minutes after a refill of the
// inflow burette and a drain of the outflow one (reading 2 is just before it).
const SCALE = [
  { hours: 0, inflow: 450.0, outflow: 20.0 },
  { hours: 6, inflow: 437.2, outflow: 32.8 },
  { hours: 12, inflow: 424.6, outflow: 45.3 },
  { hours: 12 + 5 / 60, inflow: 480.0, outflow: 10.0, afterRefill: true as const },
  { hours: 18, inflow: 467.5, outflow: 22.4 },
];

/** The head at a reading by hand: dp / gamma_w + level difference above the common datum, m. */
const headM = (r: (typeof SCALE)[number]) => DP_KPA / 9.81 + (r.inflow + ZERO_IN_MM - (r.outflow + ZERO_OUT_MM)) / 1000;

/** k of one interval by D5084 method C, typed into mathjs. */
function methodC(a: (typeof SCALE)[number], b: (typeof SCALE)[number]): number {
  return evaluate("aIn * aOut * L / ((aIn + aOut) * A * dt) * log(h1 / h2)", {
    aIn: A_IN_MM2 * 1e-6, aOut: A_OUT_MM2 * 1e-6, L: L_MM / 1000, A: (Math.PI * (D_MM / 1000) ** 2) / 4, dt: (b.hours - a.hours) * 3600, h1: headM(a), h2: headM(b),
  }) as number;
}

function readings(): Reading[] {
  const volumes = cumulativeVolumesAcrossRefillsMl(
    SCALE.map((r) => ({ inflowLevelMm: r.inflow, outflowLevelMm: r.outflow, afterRefill: r.afterRefill ?? false })),
    { inflowAreaMm2: A_IN_MM2, outflowAreaMm2: A_OUT_MM2 },
  );
  return SCALE.map((r, i) => ({
    elapsedS: r.hours * 3600, inflowMl: volumes[i]!.inflowMl, outflowMl: volumes[i]!.outflowMl, headKPa: DP_KPA, temperatureC: 20,
    inflowLevelMm: r.inflow + ZERO_IN_MM, outflowLevelMm: r.outflow + ZERO_OUT_MM, ...(r.afterRefill && { afterRefill: r.afterRefill }),
  }));
}

describe("falling head with rising tail from burette levels (ASTM D5084 method C)", () => {
  it("takes the head from the levels above the common datum and gives each interval's k as the method C formula does", () => {
    const ev = evaluateRun({ method: "D5084", specimen: { diameterMm: D_MM, thicknessMm: L_MM }, readings: readings(), burettes: { inflowAreaMm2: A_IN_MM2, outflowAreaMm2: A_OUT_MM2 } });
    expect(ev.calculation).toBe("falling-head-rising-tail");
    // Reading 0: 14 / 9.81 + (450 - 60) / 1000 = 1.427115 + 0.390 = 1.817115 m; the level difference adds 27 % to the pressure head.
    expect(headM(SCALE[0]!)).toBeCloseTo(1.8171151885830785, 12);
    // No interval spans the refill: 0–6 h, 6–12 h, then 12 h 5 min–18 h.
    expect(ev.intervals.map((iv) => [iv.fromS / 3600, iv.toS / 3600])).toEqual([[0, 6], [6, 12], [12 + 5 / 60, 18]]);
    const expected = [methodC(SCALE[0]!, SCALE[1]!), methodC(SCALE[1]!, SCALE[2]!), methodC(SCALE[3]!, SCALE[4]!)];
    ev.intervals.forEach((iv, i) => expect(iv.k / expected[i]! - 1).toBeCloseTo(0, 12));
    // First interval by hand: h2 = 1.427115 + (437.2 - 72.8) / 1000 = 1.791515 m; ln(1.817115 / 1.791515) = 0.01418845;
    // 31.4e-6 × 31.2e-6 × 0.0059 / (62.6e-6 × 0.007853982 × 21600) = 5.442749e-10; k = 7.72241e-12 m/s.
    expect(ev.intervals[0]!.k).toBeCloseTo(7.72241e-12, 16);
    // The mean head of an interval is the mean of the heads at its two readings.
    expect(ev.intervals[2]!.headM).toBeCloseTo((headM(SCALE[3]!) + headM(SCALE[4]!)) / 2, 12);
  });

  it("carries the cumulative flow across the refill and counts none during it", () => {
    const rs = readings();
    // Inflow: (450 - 424.6) × 31.4 / 1000 = 0.79756 mL before the refill, + (480 - 467.5) × 31.4 / 1000 = 0.3925 mL after it.
    expect(rs[2]!.inflowMl).toBeCloseTo(0.79756, 10);
    expect(rs[3]!.inflowMl).toBe(rs[2]!.inflowMl);
    expect(rs[4]!.inflowMl).toBeCloseTo(0.79756 + 0.3925, 10);
    // Outflow: (45.3 - 20) × 31.2 / 1000 = 0.78936 mL, then (22.4 - 10) × 31.2 / 1000 = 0.38688 mL.
    expect(rs[4]!.outflowMl).toBeCloseTo(0.78936 + 0.38688, 10);
  });

  it("without levels stays constant head, whose k is larger here because it leaves out the level difference", () => {
    const withLevels = evaluateRun({ method: "D5084", specimen: { diameterMm: D_MM, thicknessMm: L_MM }, readings: readings(), burettes: { inflowAreaMm2: A_IN_MM2, outflowAreaMm2: A_OUT_MM2 } });
    const volumesOnly = readings().map(({ inflowLevelMm: _i, outflowLevelMm: _o, ...r }) => r);
    const constant = evaluateRun({ method: "D5084", specimen: { diameterMm: D_MM, thicknessMm: L_MM }, readings: volumesOnly });
    expect(constant.calculation).toBe("constant-head");
    // Constant head: k = q L / (dp / gamma_w); the head there is 1.427 m where the levels make it about 1.79 m.
    const ratio = constant.intervals[0]!.k / withLevels.intervals[0]!.k;
    expect(ratio).toBeGreaterThan(1.2);
    expect(ratio).toBeCloseTo(withLevels.intervals[0]!.headM / (DP_KPA / 9.81), 2);
  });

  it("refuses levels on some readings only, a refill on the first reading, and falling-head burettes with neither levels nor an initial difference", () => {
    const rs = readings();
    const { inflowLevelMm: _i, outflowLevelMm: _o, ...bare } = rs[2]!;
    expect(() => evaluateRun({ method: "D5084", specimen: { diameterMm: D_MM, thicknessMm: L_MM }, readings: [rs[0]!, rs[1]!, bare] })).toThrowError(/^readings\[2\]\.inflowLevelMm and outflowLevelMm are missing/);
    expect(() => evaluateRun({ method: "D5084", specimen: { diameterMm: D_MM, thicknessMm: L_MM }, readings: [{ ...rs[0]!, afterRefill: true }, rs[1]!] })).toThrowError(/^readings\[0\]\.afterRefill/);
    const volumesOnly = rs.map(({ inflowLevelMm: _a, outflowLevelMm: _b, afterRefill: _c, ...r }) => r);
    expect(() => evaluateRun({ method: "D5084", specimen: { diameterMm: D_MM, thicknessMm: L_MM }, readings: volumesOnly, burettes: { inflowAreaMm2: 31.4, outflowAreaMm2: 31.2 } })).toThrowError(/^burettes\.initialLevelDifferenceMm must be a finite number when the readings carry no burette levels/);
  });
});

describe("a D6766 run of six weeks with 30 refills", () => {
  // Exact falling-head, rising-tail physics (the analytical solution behind D5084 method C): with constant k,
  // h(t) = h0 · exp(-c t), c = k (a_in + a_out) A / (a_in a_out L); the volume that passed moves the inflow
  // level down by V / a_in and the outflow level up by V / a_out. Readings every 6 h for 42 days; 30 times,
  // every 5 or 6 readings (after reading ceil(j × 168 / 31)), the technician refills and drains, five minutes
  // long. Invented numbers.
  const K = 4e-11; // m/s, a bentonite attacked by a salt solution
  const aIn = A_IN_MM2 * 1e-6;
  const aOut = A_OUT_MM2 * 1e-6;
  const A = (Math.PI * 0.1 ** 2) / 4;
  const L = 0.006;
  const c = (K * (aIn + aOut) * A) / (aIn * aOut * L);
  const hp = 14 / 9.81;

  function simulate(): { readings: Reading[]; refills: number; totalMl: number } {
    const out: Reading[] = [];
    let zin = 0.45;
    let zout = 0.05;
    let t = 0;
    let totalMl = 0;
    let refills = 0;
    const chem = { influentEcMsPerM: 1100, effluentEcMsPerM: 1060, influentPh: 7.2, effluentPh: 7.4 };
    out.push({ elapsedS: 0, inflowMl: 0, outflowMl: 0, headKPa: 14, temperatureC: 20, inflowLevelMm: zin * 1000, outflowLevelMm: zout * 1000 });
    for (let n = 1; n <= 168; n++) {
      const dt = 6 * 3600 - (out[out.length - 1]!.afterRefill ? 300 : 0);
      const h1 = hp + zin - zout;
      const h2 = h1 * Math.exp(-c * dt);
      const vM3 = (h1 - h2) / (1 / aIn + 1 / aOut);
      zin -= vM3 / aIn;
      zout += vM3 / aOut;
      t += dt;
      totalMl += vM3 * 1e6;
      out.push({ elapsedS: t, inflowMl: totalMl, outflowMl: totalMl, headKPa: 14, temperatureC: 20, inflowLevelMm: zin * 1000, outflowLevelMm: zout * 1000, ...chem });
      if (refills < 30 && n === Math.ceil(((refills + 1) * 168) / 31)) {
        refills++;
        zin = 0.45;
        zout = 0.05;
        t += 300;
        out.push({ elapsedS: t, inflowMl: totalMl, outflowMl: totalMl, headKPa: 14, temperatureC: 20, inflowLevelMm: zin * 1000, outflowLevelMm: zout * 1000, afterRefill: true, ...chem });
      }
    }
    return { readings: out, refills, totalMl };
  }

  it("gives every interval the true k, spans no refill, counts the flow through all 30 and meets the D6766 criteria", () => {
    const { readings: rs, refills, totalMl } = simulate();
    expect(refills).toBe(30);
    expect(rs[rs.length - 1]!.elapsedS / 86400).toBeGreaterThan(41.9);
    // Levels stay on a 0–500 mm scale throughout: the refills are needed and enough.
    for (const r of rs) expect(r.inflowLevelMm! > 0 && r.outflowLevelMm! < 500).toBe(true);
    const ev = evaluateRun(
      { method: "D6766", specimen: { diameterMm: 100, thicknessMm: 6, bentoniteMassPerAreaKgPerM2: 4.8 }, readings: rs, burettes: { inflowAreaMm2: A_IN_MM2, outflowAreaMm2: A_OUT_MM2 } },
      { termination: { trendQuantity: "k20" } },
    );
    expect(ev.intervals).toHaveLength(rs.length - 1 - 30);
    const refillTimes = new Set(rs.filter((r) => r.afterRefill).map((r) => r.elapsedS));
    for (const iv of ev.intervals) {
      expect(refillTimes.has(iv.toS)).toBe(false);
      expect(iv.k / K - 1).toBeCloseTo(0, 9);
    }
    // Pore volumes from all the outflow: n = 1 - (4.8 / 0.006) / 2750 = 0.709091; V_p = n × 47.1239 mL = 33.4151 mL.
    expect(ev.poreVolumesOfFlow).toBeCloseTo(totalMl / (0.7090909090909091 * Math.PI * 0.05 ** 2 * 0.006 * 1e6), 9);
    expect(ev.poreVolumesOfFlow!).toBeGreaterThan(2);
    expect(ev.termination.met).toBe(true);
    // k20 = k × R_T(20 °C) = 4e-11 × 1.000243 (the D5084 equation at 20 °C, see water.test.ts).
    expect(ev.reported.k20! / (K * 1.0002425354) - 1).toBeCloseTo(0, 6);
  });
});
