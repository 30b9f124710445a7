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
    // IAPWS: mu(10 °C) / mu(20 °C) = 1.3059 / 1.0016 = 1.30382
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
    ["unknown method", { ...run(good), method: "D9999" as RunInput["method"] }, /^method/],
  ] as const)("%s", (_label, input, message) => {
    expect(() => evaluateRun(input)).toThrowError(message);
  });

  it("bad options are named too", () => {
    expect(() => evaluateRun(run(good), { termination: { consecutiveIntervals: 2 } })).toThrowError(/options\.termination\.consecutiveIntervals/);
    expect(() => evaluateRun(run(good), { termination: { ratioMin: 1.3 } })).toThrowError(/options\.termination\.ratioMin/);
    expect(() =>
      evaluateRun(run(good), { uncertainty: { diameterMm: -1, thicknessMm: 0, volumeMl: 0, timeS: 0, pressureKPa: 0, temperatureC: 0 } }),
    ).toThrowError(/options\.uncertainty\.diameterMm/);
  });

  it("a burette head that goes non-positive is rejected", () => {
    const input: RunInput = { ...run(steadyReadings(3)), burettes: { inflowAreaMm2: 10, outflowAreaMm2: 10, initialLevelDifferenceMm: -1600 } };
    expect(() => evaluateRun(input)).toThrowError(/readings\[0\].*burettes\.initialLevelDifferenceMm/);
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
      }),
      { numRuns: 200 },
    );
  });
});
