import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { evaluateRun, type Reading, type RunInput } from "../../../lib/hydraulics";

const specimen = { diameterMm: 100, thicknessMm: 5 };

/** Steady run: `count` readings one hour apart, 1.0 mL in and 0.95 mL out per hour, 14 kPa, 20 °C. */
function steadyReadings(count: number, inPerH = 1.0, outPerH = 0.95): Reading[] {
  return Array.from({ length: count }, (_, i) => ({
    elapsedS: i * 3600,
    inflowMl: i * inPerH,
    outflowMl: i * outPerH,
    headKPa: 14,
    temperatureC: 20,
  }));
}

const run = (readings: Reading[], method: RunInput["method"] = "D5887"): RunInput => ({ method, specimen, readings });

describe("evaluateRun contract", () => {
  it("returns the contract shape with numbers in SI", () => {
    const ev = evaluateRun(run(steadyReadings(6)));
    expect(ev.intervals).toHaveLength(5);
    const iv = ev.intervals[0];
    for (const key of ["fromS", "toS", "inflowFlux", "outflowFlux", "flux", "ratio", "gradient", "k", "k20"]) {
      expect(typeof (iv as unknown as Record<string, unknown>)[key]).toBe("number");
    }
    // flux = (1.0 + 0.95) / 2 mL / (0.0078539816 m^2 × 3600 s) = 0.975e-6 / 28.274334 = 3.448357e-8 m^3/m^2/s
    expect(iv?.flux).toBeCloseTo(3.448357100e-8, 16);
    expect(iv?.ratio).toBeCloseTo(0.95, 12);
    expect(iv?.fromS).toBe(0);
    expect(iv?.toS).toBe(3600);
    // k = 3.448357e-8 / (14 / 9.81 / 0.005) = 3.448357e-8 / 285.4230 = 1.208157e-10 m/s
    expect(iv?.k).toBeCloseTo(1.208156541e-10, 18);
    expect(ev.unitWeightBasis).toBe("conventional-9.81");
    expect(ev.calculation).toBe("constant-head");
    expect(() => JSON.stringify(ev)).not.toThrow();
  });

  it("reported stays null until the criteria are met, then is the mean of the last 4 intervals", () => {
    const early = evaluateRun(run(steadyReadings(4))); // 3 intervals < 4 needed
    expect(early.termination.met).toBe(false);
    expect(early.reported).toEqual({ flux: null, k20: null });
    const later = evaluateRun(run(steadyReadings(6)));
    expect(later.termination.met).toBe(true);
    // All intervals equal, so the mean is the interval value: flux 3.448357e-8; k20 = 1.208157e-10 × 1.000243 = 1.208450e-10.
    expect(later.reported.flux).toBeCloseTo(3.4483571e-8, 15);
    expect(later.reported.k20).toBeCloseTo(1.20844956e-10, 17);
  });

  it("reports the mean of the last N, not the latest interval", () => {
    // Intervals carry 1.0, 1.0, 1.1, 0.9, 1.1, 0.9 mL in and out; the last 4 average 1.0 mL.
    const vols = [0, 1, 2, 3.1, 4.0, 5.1, 6.0];
    const rs = vols.map((v, i) => ({ elapsedS: i * 3600, inflowMl: v, outflowMl: v, headKPa: 14, temperatureC: 20 }));
    const ev = evaluateRun(run(rs));
    expect(ev.termination.met).toBe(true);
    // 1.0 mL / 28.274334 m^2 s = 3.536777e-8
    expect(ev.reported.flux).toBeCloseTo(3.5367765e-8, 14);
  });

  it("works without an options argument and honours options when given", () => {
    const rs = steadyReadings(6);
    const a = evaluateRun(run(rs));
    const b = evaluateRun(run(rs), { unitWeightBasis: "density-at-temperature", viscosityRatioBasis: "IAPWS-2008" });
    expect(b.unitWeightBasis).toBe("density-at-temperature");
    expect(b.intervals[0]?.k20).toBe(b.intervals[0]?.k); // IAPWS ratio is exactly 1 at 20 °C
    // k ∝ gamma_w: 9.78907 / 9.81 = 0.997867
    expect((b.intervals[0]?.k as number) / (a.intervals[0]?.k as number)).toBeCloseTo(0.997867, 5);
  });

  it("uses IAPWS outside 15–30 °C and says so", () => {
    const rs = steadyReadings(6).map((r) => ({ ...r, temperatureC: 10 }));
    const ev = evaluateRun(run(rs));
    expect(ev.intervals[0]?.viscosityRatioSource).toBe("IAPWS-2008");
    // IAPWS 2008 at 0.1 MPa: mu(10 °C) / mu(20 °C) = 1.3059 / 1.0016 = 1.30382 (1.0016 from DOMAIN.md;
    // 1.3059 mPa s at 10 °C from memory of the IAPWS table, not quoted in DOMAIN.md).
    expect(ev.intervals[0]?.viscosityRatio).toBeCloseTo(1.30382, 4);
    expect(ev.warnings.join(" ")).toMatch(/IAPWS/);
  });

  it("falling head when burettes are given", () => {
    const rs = steadyReadings(6, 1, 1);
    const ev = evaluateRun({ ...run(rs, "D5084"), burettes: { inflowAreaMm2: 100, outflowAreaMm2: 100, initialLevelDifferenceMm: 500 } });
    expect(ev.calculation).toBe("falling-head-rising-tail");
    // Reading 0: h = 14/9.81 + 0.5 = 1.927115 m; reading 1: levels moved 10 mm each, h = 1.907115 m.
    // k = (1e-4 × 1e-4 × 0.005) / (2e-4 × 0.0078539816 × 3600) × ln(1.927115 / 1.907115)
    //   = 8.841941e-9 × 0.010432 = 9.2242e-11 m/s
    expect(ev.intervals[0]?.k).toBeCloseTo(8.841941283e-9 * Math.log(1.9271151885830784 / 1.9071151885830784), 20);
    expect(ev.intervals[0]?.k).toBeCloseTo(9.2242e-11, 14);
  });

  it("worked example: d = 100 mm, L = 6 mm, 14 kPa, 1 mL in and out over 24 h, at 20 °C and at 25 °C", () => {
    // A = pi × 0.1^2 / 4 = 7.853981634e-3 m^2; q = 1e-6 m^3 / (7.853981634e-3 m^2 × 86400 s) = 1.473656880e-9 m^3/m^2/s
    // dh = 14 kPa / 9.81 kN/m^3 = 1.427115189 m; i = 1.427115189 / 0.006 = 237.8525314; k = q / i = 6.195674570e-12 m/s
    // D5084 R_T(20) = 1.000243 (water.test.ts): k20 = 6.195674570e-12 × 1.0002425354 = 6.197177241e-12 m/s
    // D5084 R_T(25) = 0.8892585 (water.test.ts): k20 = 6.195674570e-12 × 0.8892585271 = 5.509556443e-12 m/s,
    // smaller than k: water at 25 °C is less viscous than at 20 °C, so the same specimen passes more.
    const at = (T: number) =>
      evaluateRun({
        method: "D5887",
        specimen: { diameterMm: 100, thicknessMm: 6 },
        readings: [
          { elapsedS: 0, inflowMl: 0, outflowMl: 0, headKPa: 14, temperatureC: T },
          { elapsedS: 86400, inflowMl: 1, outflowMl: 1, headKPa: 14, temperatureC: T },
        ],
      });
    const i20 = at(20).intervals[0] as NonNullable<ReturnType<typeof at>["intervals"][number]>;
    const i25 = at(25).intervals[0] as NonNullable<ReturnType<typeof at>["intervals"][number]>;
    const rel = (a: number, b: number) => Math.abs(a / b - 1);
    expect(rel(i20.inflowFlux, 1.47365688e-9)).toBeLessThan(1e-8);
    expect(rel(i20.outflowFlux, 1.47365688e-9)).toBeLessThan(1e-8);
    expect(rel(i20.flux, 1.47365688e-9)).toBeLessThan(1e-8);
    expect(i20.ratio).toBe(1);
    expect(rel(i20.gradient, 237.8525314)).toBeLessThan(1e-9);
    expect(rel(i20.k, 6.19567457e-12)).toBeLessThan(1e-8);
    expect(rel(i20.k20, 6.197177241e-12)).toBeLessThan(1e-8);
    expect(rel(i25.k, 6.19567457e-12)).toBeLessThan(1e-8);
    expect(rel(i25.k20, 5.509556443e-12)).toBeLessThan(1e-8);
    expect(i25.k20).toBeLessThan(i25.k);
    // Against the IAPWS 2008 table of DOMAIN.md, 0.8900 / 1.0016 = 0.888578: within the equation's 0.16 %.
    expect(rel(i25.k20, 6.19567457e-12 * (0.89 / 1.0016))).toBeLessThan(0.0016);
    // Two readings make one interval, fewer than the 4 the criteria need.
    expect(at(20).reported).toEqual({ flux: null, k20: null });
  });

  it("D5887 reports index flux and k20 together", () => {
    const ev = evaluateRun(run(steadyReadings(8)));
    expect(ev.method).toBe("D5887");
    expect(ev.reported.flux).not.toBeNull();
    expect(ev.reported.k20).not.toBeNull();
  });
});

describe("evaluateRun validation names the offending field", () => {
  const good = steadyReadings(3);
  const withReading = (i: number, patch: Partial<Reading>): RunInput =>
    run(good.map((r, j) => (j === i ? { ...r, ...patch } : r)));

  it.each([
    ["fewer than 2 readings", run(good.slice(0, 1)), /^readings must hold at least 2/],
    ["no readings", run([]), /^readings/],
    ["elapsed time repeats", withReading(1, { elapsedS: 0 }), /readings\[1\]\.elapsedS must be greater/],
    ["elapsed time goes back", withReading(2, { elapsedS: 100 }), /readings\[2\]\.elapsedS/],
    ["negative elapsed time", withReading(0, { elapsedS: -5 }), /readings\[0\]\.elapsedS/],
    ["negative inflow", withReading(1, { inflowMl: -0.1 }), /readings\[1\]\.inflowMl/],
    ["NaN outflow", withReading(1, { outflowMl: Number.NaN }), /readings\[1\]\.outflowMl/],
    ["infinite inflow", withReading(2, { inflowMl: Infinity }), /readings\[2\]\.inflowMl/],
    ["zero head", withReading(1, { headKPa: 0 }), /readings\[1\]\.headKPa/],
    ["negative head", withReading(0, { headKPa: -14 }), /readings\[0\]\.headKPa/],
    ["temperature above 40 °C", withReading(1, { temperatureC: 40.5 }), /readings\[1\]\.temperatureC/],
    ["temperature below 0 °C", withReading(0, { temperatureC: -1 }), /readings\[0\]\.temperatureC/],
    ["NaN temperature", withReading(0, { temperatureC: Number.NaN }), /readings\[0\]\.temperatureC/],
    ["negative EC", withReading(1, { effluentEcMsPerM: -1 }), /readings\[1\]\.effluentEcMsPerM/],
    ["pH above 14", withReading(1, { influentPh: 15 }), /readings\[1\]\.influentPh/],
    ["zero diameter", { ...run(good), specimen: { diameterMm: 0, thicknessMm: 5 } }, /specimen\.diameterMm/],
    ["negative thickness", { ...run(good), specimen: { diameterMm: 100, thicknessMm: -5 } }, /specimen\.thicknessMm/],
    ["zero thickness", { ...run(good), specimen: { diameterMm: 100, thicknessMm: 0 } }, /specimen\.thicknessMm/],
    ["NaN diameter", { ...run(good), specimen: { diameterMm: Number.NaN, thicknessMm: 5 } }, /specimen\.diameterMm/],
    ["negative diameter", { ...run(good), specimen: { diameterMm: -100, thicknessMm: 5 } }, /specimen\.diameterMm/],
    ["infinite thickness", { ...run(good), specimen: { diameterMm: 100, thicknessMm: Infinity } }, /specimen\.thicknessMm/],
    ["NaN elapsed time", withReading(1, { elapsedS: Number.NaN }), /readings\[1\]\.elapsedS/],
    ["NaN head", withReading(2, { headKPa: Number.NaN }), /readings\[2\]\.headKPa/],
    ["NaN influent EC", withReading(2, { influentEcMsPerM: Number.NaN }), /readings\[2\]\.influentEcMsPerM/],
    ["infinite effluent EC", withReading(0, { effluentEcMsPerM: Infinity }), /readings\[0\]\.effluentEcMsPerM/],
    ["negative influent pH", withReading(1, { influentPh: -0.1 }), /readings\[1\]\.influentPh/],
    ["NaN effluent pH", withReading(2, { effluentPh: Number.NaN }), /readings\[2\]\.effluentPh/],
    ["unknown method", { ...run(good), method: "D9999" as RunInput["method"] }, /^method/],
  ] as const)("%s", (_label, input, message) => {
    expect(() => evaluateRun(input)).toThrowError(message);
  });

  it("accepts the ends of the temperature range, 0 °C and 40 °C", () => {
    expect(() => evaluateRun(withReading(0, { temperatureC: 0 }))).not.toThrow();
    expect(() => evaluateRun(withReading(2, { temperatureC: 40 }))).not.toThrow();
  });

  it("bad options are named too", () => {
    expect(() => evaluateRun(run(good), { termination: { consecutiveIntervals: 2 } })).toThrowError(/options\.termination\.consecutiveIntervals/);
    expect(() => evaluateRun(run(good), { termination: { ratioMin: 1.3 } })).toThrowError(/options\.termination\.ratioMin/);
    expect(() =>
      evaluateRun(run(good), { uncertainty: { diameterMm: -1, thicknessMm: 0, volumeMl: 0, timeS: 0, pressureKPa: 0, temperatureC: 0 } }),
    ).toThrowError(/options\.uncertainty\.diameterMm/);
    expect(() => evaluateRun(run(good), { termination: { criteria: ["ratio-band", "bogus" as "trend"] } })).toThrowError(/options\.termination\.criteria/);
  });

  it("a burette head that goes non-positive is rejected", () => {
    const input: RunInput = { ...run(steadyReadings(3)), burettes: { inflowAreaMm2: 10, outflowAreaMm2: 10, initialLevelDifferenceMm: -1600 } };
    expect(() => evaluateRun(input)).toThrowError(/readings\[0\].*burettes\.initialLevelDifferenceMm/);
  });
});

describe("evaluateRun edge cases that must not crash", () => {
  const hourly = (vin: (i: number) => number, vout: (i: number) => number, count = 8): Reading[] =>
    Array.from({ length: count }, (_, i) => ({ elapsedS: i * 3600, inflowMl: vin(i), outflowMl: vout(i), headKPa: 14, temperatureC: 20 }));

  it("zero outflow in one interval: ratio 0 there, criteria not met, nothing reported", () => {
    // Outflow stalls between readings 5 and 6 (5 mL both times).
    const ev = evaluateRun(run(hourly((i) => i, (i) => (i <= 5 ? i : i - 1))));
    expect(ev.intervals[5]?.ratio).toBe(0);
    expect(ev.intervals[5]?.outflowFlux).toBe(0);
    expect(ev.termination.met).toBe(false);
    expect(ev.reported).toEqual({ flux: null, k20: null });
  });

  it("readings with only inflow, and readings with no flow at all", () => {
    for (const method of ["D5887", "D5084", "D6766"] as const) {
      const only = evaluateRun(run(hourly((i) => i, () => 0), method));
      expect(only.termination.met).toBe(false);
      expect(only.reported).toEqual({ flux: null, k20: null });
      const none = evaluateRun(run(hourly(() => 0, () => 0), method));
      expect(none.termination.met).toBe(false);
      expect(Number.isNaN(none.intervals[0]?.ratio)).toBe(true); // 0 / 0: no inflow to compare with
      expect(none.termination.criteria.find((c) => c.key === "ratio-band")?.message).toMatch(/No inflow was recorded/);
    }
  });

  it("a cumulative volume that goes down (uncorrected burette refill) is never reported", () => {
    // 1 mL/h; at reading 7 both burettes were refilled and the readings restart from 0: interval 6 shows
    // -6 mL in and -6 mL out, a ratio of 1 that must not pass the ratio band.
    const ev = evaluateRun(run(hourly((i) => (i < 7 ? i : i - 7), (i) => (i < 7 ? i : i - 7), 9)));
    expect(ev.intervals[6]?.ratio).toBe(1);
    expect(ev.termination.met).toBe(false);
    expect(ev.reported).toEqual({ flux: null, k20: null });
    expect(ev.termination.criteria.find((c) => c.key === "ratio-band")?.message).toMatch(/went down.*burette refill/);
    expect(ev.warnings.join(" ")).toMatch(/decreased/);
  });

  it("a long run of 20,000 readings at one temperature", () => {
    const rs = hourly((i) => i, (i) => 0.97 * i, 20_000);
    const ev = evaluateRun(run(rs, "D5084"));
    expect(ev.intervals).toHaveLength(19_999);
    expect(ev.termination.met).toBe(true);
    expect(Number.isFinite(ev.reported.k20)).toBe(true);
    // Every interval at 20 °C carries the same R_T.
    expect(new Set(ev.intervals.map((iv) => iv.viscosityRatio)).size).toBe(1);
  });

  it("burettes: the first reading's cumulative volume does not shift the heads", () => {
    // initialLevelDifferenceMm is the level difference at the first reading, so a run whose cumulative
    // volumes start at 5 mL must give the same heads and k as one that starts at 0.
    const burettes = { inflowAreaMm2: 100, outflowAreaMm2: 100, initialLevelDifferenceMm: 500 };
    const from0 = hourly((i) => i, (i) => i, 6);
    const from5 = from0.map((r) => ({ ...r, inflowMl: r.inflowMl + 5, outflowMl: r.outflowMl + 5 }));
    const a = evaluateRun({ ...run(from0, "D5084"), burettes });
    const b = evaluateRun({ ...run(from5, "D5084"), burettes });
    // First interval: h1 = 14 / 9.81 + 0.5 = 1.927115 m, h2 = 1.907115 m (see "falling head" above).
    expect(b.intervals[0]?.headM).toBeCloseTo((1.9271151885830784 + 1.9071151885830784) / 2, 12);
    expect(b.intervals.map((iv) => iv.k)).toEqual(a.intervals.map((iv) => iv.k));
  });
});

describe("evaluateRun invariants (property-based)", () => {
  it("never throws on valid random runs and keeps flux = (in + out) / 2", () => {
    const arb = fc.array(
      fc.record({
        dt: fc.integer({ min: 1, max: 86400 }),
        vin: fc.double({ min: 0, max: 5, noNaN: true }),
        vout: fc.double({ min: 0, max: 5, noNaN: true }),
        head: fc.double({ min: 0.1, max: 100, noNaN: true }),
        temp: fc.double({ min: 0, max: 40, noNaN: true }),
      }),
      { minLength: 2, maxLength: 30 },
    );
    fc.assert(
      fc.property(arb, fc.constantFrom("D5887", "D5084", "D6766" as const), (steps, method) => {
        let t = 0;
        let vin = 0;
        let vout = 0;
        const rs = steps.map((s) => {
          t += s.dt;
          vin += s.vin;
          vout += s.vout;
          return { elapsedS: t, inflowMl: vin, outflowMl: vout, headKPa: s.head, temperatureC: s.temp };
        });
        const ev = evaluateRun({ method, specimen, readings: rs });
        expect(ev.intervals).toHaveLength(rs.length - 1);
        for (const iv of ev.intervals) expect(iv.flux).toBeCloseTo((iv.inflowFlux + iv.outflowFlux) / 2, 20);
        expect(ev.termination.met ? ev.reported.flux !== null : ev.reported.flux === null).toBe(true);
        // NaN (or Infinity) must never reach the reported values.
        if (ev.reported.flux !== null) expect(Number.isFinite(ev.reported.flux)).toBe(true);
        if (ev.reported.k20 !== null) expect(Number.isFinite(ev.reported.k20)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});
