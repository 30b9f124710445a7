import { describe, expect, it } from "vitest";
import {
  d5084ViscosityRatio,
  evaluateRun,
  expandedUncertainty,
  standardUncertaintyFromExpanded,
  standardUncertaintyFromRectangular,
  type DeclaredUncertainties,
} from "../../../lib/hydraulics";

const declared: DeclaredUncertainties = { diameterMm: 0.1, thicknessMm: 0.1, volumeMl: 0.02, timeS: 1, pressureKPa: 0.1, temperatureC: 0.2 };

describe("expanded uncertainty (k = 2)", () => {
  it("worked example over four 1-hour intervals of 0.975 mL mean volume", () => {
    // Relative standard uncertainties:
    //   diameter    2 × 0.1 / 100            = 0.002
    //   thickness   0.1 / 5                  = 0.02
    //   volume      0.02 / (4 × 0.975 = 3.9) = 0.0051282
    //   time        sqrt(2) × 1 / 14400      = 0.0000982
    //   pressure    (0.1 / 9.81) / (14 / 9.81) = 0.0071429
    //   temperature |d ln R_T / dT| × 0.2 = |ln 0.9842 - 0.1702 / 20| × 0.2 = 0.0244362 × 0.2 = 0.0048872
    // u_r(flux) = sqrt(0.002^2 + 0.0051282^2 + 0.0000982^2) = 0.0055053 -> U_r = 0.0110106
    // u_r(k20)  = sqrt(0.0055053^2 + 0.02^2 + 0.0071429^2 + 0.0048872^2) = sqrt(5.05206e-4) = 0.0224768 -> U_r = 0.0449536
    const u = expandedUncertainty({
      fluxM3PerM2PerS: 3.448357e-8,
      k20MPerS: 1.20845e-10,
      diameterMm: 100,
      thicknessMm: 5,
      volumeMl: 3.9,
      durationS: 14400,
      headM: 14 / 9.81,
      unitWeightKNPerM3: 9.81,
      temperatureC: 20,
      declared,
    });
    expect(u.budget.diameterMm).toBeCloseTo(0.002, 12);
    expect(u.budget.thicknessMm).toBeCloseTo(0.02, 12);
    expect(u.budget.volumeMl).toBeCloseTo(0.00512821, 8);
    expect(u.budget.timeS).toBeCloseTo(0.0000982093, 9);
    expect(u.budget.pressureKPa).toBeCloseTo(0.00714286, 8);
    expect(u.budget.temperatureC).toBeCloseTo(0.2 * Math.abs(Math.log(0.9842) - 0.1702 / 20), 7);
    expect(u.fluxRelative).toBeCloseTo(0.0110106, 6);
    expect(u.k20Relative).toBeCloseTo(0.0449536, 6);
    expect(u.k20MPerS).toBeCloseTo(0.0449536 * 1.20845e-10, 16);
    expect(u.coverageFactor).toBe(2);
    // Sanity on the derivative used: the equation's slope by a plain difference.
    expect((Math.log(d5084ViscosityRatio(20.01)) - Math.log(d5084ViscosityRatio(19.99))) / 0.02).toBeCloseTo(-0.0244362, 6);
  });

  it("evaluateRun carries it once reported, and only when declared", () => {
    const readings = Array.from({ length: 6 }, (_, i) => ({ elapsedS: i * 3600, inflowMl: i, outflowMl: i * 0.95, headKPa: 14, temperatureC: 20 }));
    const input = { method: "D5084" as const, specimen: { diameterMm: 100, thicknessMm: 5 }, readings };
    expect(evaluateRun(input).uncertainty).toBeNull();
    const ev = evaluateRun(input, { uncertainty: declared });
    expect(ev.uncertainty?.k20Relative).toBeCloseTo(0.0449536, 5);
    expect(ev.uncertainty?.k20MPerS).toBeCloseTo(0.0449536 * (ev.reported.k20 as number), 15);
    expect(evaluateRun({ ...input, readings: readings.slice(0, 3) }, { uncertainty: declared }).uncertainty).toBeNull();
  });

  it("the temperature slope is taken with one formula at the 15 °C and 30 °C switch-overs", () => {
    // At 15 °C the default basis uses the D5084 equation: |d ln R_T / dT| = |ln 0.9842 - 0.1702 / 15|
    // = 0.0159262 + 0.0113467 = 0.0272729 per °C. Mixing IAPWS below 15 °C with the equation above
    // (0.15 % apart) would give about 0.0115 per °C instead.
    const at = (temperatureC: number) =>
      expandedUncertainty({
        fluxM3PerM2PerS: 1e-8, k20MPerS: 1e-11, diameterMm: 100, thicknessMm: 5, volumeMl: 4, durationS: 14400,
        headM: 1.4, unitWeightKNPerM3: 9.81, temperatureC,
        declared: { diameterMm: 0, thicknessMm: 0, volumeMl: 0, timeS: 0, pressureKPa: 0, temperatureC: 1 },
      }).budget.temperatureC;
    expect(at(15)).toBeCloseTo(Math.abs(Math.log(0.9842) - 0.1702 / 15), 6);
    // 30 °C: |ln 0.9842 - 0.1702 / 30| = 0.0159262 + 0.0056733 = 0.0215995
    expect(at(30)).toBeCloseTo(Math.abs(Math.log(0.9842) - 0.1702 / 30), 6);
  });

  it("refuses a window with no flow instead of returning NaN", () => {
    expect(() =>
      expandedUncertainty({
        fluxM3PerM2PerS: 0, k20MPerS: 0, diameterMm: 100, thicknessMm: 5, volumeMl: 0, durationS: 14400,
        headM: 1.4, unitWeightKNPerM3: 9.81, temperatureC: 20, declared,
      }),
    ).toThrowError(/volumeMl/);
  });

  it("conversions from certificates and tolerances", () => {
    // A caliper with ±0.05 mm rectangular tolerance: 0.05 / sqrt(3) = 0.028868 mm. A certificate U = 0.2 kPa (k = 2): 0.1 kPa.
    expect(standardUncertaintyFromRectangular(0.05)).toBeCloseTo(0.0288675, 7);
    expect(standardUncertaintyFromExpanded(0.2)).toBe(0.1);
  });
});
