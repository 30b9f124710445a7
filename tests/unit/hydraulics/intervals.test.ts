import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  computeIntervals,
  cumulativeInflowMl,
  cumulativeOutflowMl,
  fallingHeadRisingTailKMPerS,
  headLossM,
  levelDifferenceAfterFlowMm,
  specimenAreaM2,
  specimenVolumeM3,
  type Reading,
} from "../../../lib/hydraulics";

const specimen = { diameterMm: 100, thicknessMm: 5 };
const reading = (elapsedS: number, inflowMl: number, outflowMl: number, temperatureC = 20, headKPa = 14): Reading => ({
  elapsedS,
  inflowMl,
  outflowMl,
  headKPa,
  temperatureC,
});

describe("geometry", () => {
  it("100 mm specimen", () => {
    // A = pi × 0.1^2 / 4 = 0.0078539816 m^2; V = A × 0.005 m = 3.92699e-5 m^3 (39.27 mL).
    expect(specimenAreaM2(100)).toBeCloseTo(0.007853981633974483, 15);
    expect(specimenVolumeM3(100, 5)).toBeCloseTo(3.9269908169872415e-5, 15);
  });
});

describe("burettes", () => {
  it("cumulative volumes from levels and areas", () => {
    // Inflow level falls 250.0 -> 240.0 -> 228.5 mm in a 78.54 mm^2 burette (10 mm bore):
    // (250 - 240) × 78.54 / 1000 = 0.7854 mL; (250 - 228.5) × 78.54 / 1000 = 1.68861 mL.
    expect(cumulativeInflowMl([250, 240, 228.5], 78.54)).toEqual([0, expect.closeTo(0.7854, 12), expect.closeTo(1.68861, 12)]);
    // Outflow level rises 100 -> 109 mm in the same burette: 9 × 78.54 / 1000 = 0.70686 mL.
    expect(cumulativeOutflowMl([100, 109], 78.54)).toEqual([0, expect.closeTo(0.70686, 12)]);
  });

  it("head loss = dp / gamma_w + level difference", () => {
    // 14 kPa / 9.81 kN/m^3 = 1.427115 m; plus (300 - 120) mm = 0.18 m -> 1.607115 m.
    expect(headLossM({ differentialPressureKPa: 14, inflowLevelMm: 300, outflowLevelMm: 120, unitWeightKNPerM3: 9.81 })).toBeCloseTo(1.6071151885830784, 12);
    // 1 mL out of a 100 mm^2 inflow burette lowers it 10 mm; 1 mL into a 50 mm^2 outflow burette raises it 20 mm:
    // 180 - 10 - 20 = 150 mm.
    expect(levelDifferenceAfterFlowMm({ initialLevelDifferenceMm: 180, inflowMl: 1, outflowMl: 1, inflowAreaMm2: 100, outflowAreaMm2: 50 })).toBeCloseTo(150, 12);
  });
});

describe("falling head, rising tail (D5084 method C)", () => {
  it("worked example", () => {
    // a_in = a_out = 1e-4 m^2, A = 0.0078539816 m^2, L = 0.005 m, dt = 3600 s, h1 = 1.5 m, h2 = 1.4 m.
    // a_in a_out L / ((a_in + a_out) A dt) = 5e-11 / (2e-4 × 0.0078539816 × 3600) = 5e-11 / 5.654867e-3 = 8.841941e-9
    // ln(1.5 / 1.4) = 0.0689929; k = 8.841941e-9 × 0.0689929 = 6.100309e-10 m/s.
    const k = fallingHeadRisingTailKMPerS({
      inflowBuretteAreaM2: 1e-4,
      outflowBuretteAreaM2: 1e-4,
      specimenAreaM2: specimenAreaM2(100),
      thicknessM: 0.005,
      durationS: 3600,
      head1M: 1.5,
      head2M: 1.4,
    });
    expect(k).toBeCloseTo(6.100309186e-10, 18);
  });

  it("tends to the constant-head k when the head barely falls", () => {
    // 0.01 mL through 100 mm^2 burettes moves each level 0.1 mm against a 1.4 m head: the ln form and
    // q L / h_mean must agree closely (they differ only at second order in dh/h).
    const burettes = { inflowAreaMm2: 100, outflowAreaMm2: 100, initialLevelDifferenceMm: 0 };
    const rs = [reading(0, 0, 0), reading(3600, 0.01, 0.01)];
    const [fh] = computeIntervals(rs, specimen, { burettes });
    expect(fh).toBeDefined();
    const x = fh as NonNullable<typeof fh>;
    // Heads: 1.427115 m at the start, 0.2 mm less at the end (0.1 mm fall + 0.1 mm rise).
    expect(x.headM).toBeCloseTo(14 / 9.81 - 0.0001, 12);
    expect(Math.abs(x.k / (x.flux / x.gradient) - 1)).toBeLessThan(1e-8);
  });
});

describe("interval quantities, worked example", () => {
  // d = 100 mm, L = 5 mm, dt = 3600 s, inflow 1.0 mL, outflow 0.9 mL, 14 kPa, 20 °C, gamma_w 9.81.
  // A t = 0.0078539816 × 3600 = 28.274334 m^2 s
  // inflowFlux = 1e-6 / 28.274334 = 3.536777e-8; outflowFlux = 0.9e-6 / 28.274334 = 3.183099e-8
  // flux = (3.536777e-8 + 3.183099e-8) / 2 = 3.359938e-8 m^3/m^2/s; ratio = 0.9 / 1.0 = 0.9
  // h = 14 / 9.81 = 1.427115 m; i = 1.427115 / 0.005 = 285.4230; permittivity = 3.359938e-8 / 1.427115 = 2.354356e-8 1/s
  // k = 3.359938e-8 / 285.4230 = 1.177178e-10 m/s; k20 = k × R_T(20) = 1.177178e-10 × 1.000243 = 1.177464e-10 m/s
  const [iv] = computeIntervals([reading(0, 0, 0), reading(3600, 1.0, 0.9)], specimen);
  it("matches the hand calculation", () => {
    expect(iv).toBeDefined();
    const x = iv as NonNullable<typeof iv>;
    expect(x.inflowFlux).toBeCloseTo(3.536776513e-8, 16);
    expect(x.outflowFlux).toBeCloseTo(3.183098862e-8, 16);
    expect(x.flux).toBeCloseTo(3.359937687e-8, 16);
    expect(x.ratio).toBeCloseTo(0.9, 14);
    expect(x.gradient).toBeCloseTo(285.4230377, 6);
    expect(x.permittivityPerS).toBeCloseTo(2.354356337e-8, 16);
    expect(x.k).toBeCloseTo(1.177178168e-10, 18);
    expect(x.k20).toBeCloseTo(1.177463676e-10, 18);
    expect(x.viscosityRatioSource).toBe("D5084-equation");
  });

  it("interval temperature is the mean of its two readings", () => {
    const [t] = computeIntervals([reading(0, 0, 0, 18), reading(3600, 1, 1, 22)], specimen);
    expect(t?.temperatureC).toBe(20);
  });

  it("density-at-temperature basis lowers k by 9.78907 / 9.81 = 0.997867 at 20 °C", () => {
    // A smaller gamma_w makes the same 14 kPa a larger head, so k = q L / h is smaller in proportion.
    const [d] = computeIntervals([reading(0, 0, 0), reading(3600, 1.0, 0.9)], specimen, { unitWeightBasis: "density-at-temperature" });
    expect((d?.k as number) / (iv?.k as number)).toBeCloseTo(0.997867, 5);
  });
});

describe("interval invariants (property-based)", () => {
  const vol = fc.double({ min: 0.01, max: 50, noNaN: true });
  const temp = fc.double({ min: 0, max: 40, noNaN: true });

  it("flux and k scale with volume; ratio does not", () => {
    fc.assert(
      fc.property(vol, vol, fc.double({ min: 0.1, max: 100, noNaN: true }), temp, (vin, vout, c, t) => {
        const [a] = computeIntervals([reading(0, 0, 0, t), reading(7200, vin, vout, t)], specimen);
        const [b] = computeIntervals([reading(0, 0, 0, t), reading(7200, vin * c, vout * c, t)], specimen);
        expect(Math.abs((b?.flux as number) / (a?.flux as number) / c - 1)).toBeLessThan(1e-12);
        expect(Math.abs((b?.k20 as number) / (a?.k20 as number) / c - 1)).toBeLessThan(1e-12);
        expect(Math.abs((b?.ratio as number) / (a?.ratio as number) - 1)).toBeLessThan(1e-12);
      }),
    );
  });

  it("equal inflow and outflow give ratio 1 and flux = inflow flux", () => {
    fc.assert(
      fc.property(vol, fc.double({ min: 60, max: 1e6, noNaN: true }), (v, dt) => {
        const [x] = computeIntervals([reading(100, 2, 2), reading(100 + dt, 2 + v, 2 + v)], specimen);
        expect(x?.ratio).toBe(1);
        expect(x?.flux).toBe(x?.inflowFlux);
      }),
    );
  });

  it("k20 equals k at 20 °C on the IAPWS basis, and k × 1.000243 on the D5084 equation", () => {
    fc.assert(
      fc.property(vol, vol, (vin, vout) => {
        const rs = [reading(0, 0, 0, 20), reading(3600, vin, vout, 20)];
        const [ia] = computeIntervals(rs, specimen, { viscosityRatioBasis: "IAPWS-2008" });
        expect(ia?.k20).toBe(ia?.k);
        const [eq] = computeIntervals(rs, specimen);
        expect((eq?.k20 as number) / (eq?.k as number)).toBeCloseTo(1.0002425354, 9);
      }),
    );
  });

  it("k is proportional to thickness and inversely to head", () => {
    fc.assert(
      fc.property(vol, fc.double({ min: 0.5, max: 20, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true }), (v, l, hKPa) => {
        const rs = [reading(0, 0, 0, 20, hKPa), reading(3600, v, v, 20, hKPa)];
        const [x] = computeIntervals(rs, { diameterMm: 100, thicknessMm: l });
        const q = x?.flux as number;
        expect(x?.k as number).toBeCloseTo((q * l * 1e-3) / (hKPa / 9.81), 20);
      }),
    );
  });
});
