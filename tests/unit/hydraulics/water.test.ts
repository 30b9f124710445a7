import { describe, expect, it } from "vitest";
import {
  d5084ViscosityRatio,
  iapwsViscosityPaS,
  iapwsViscosityRatio,
  viscosityRatio,
  waterDensityKgPerM3,
  waterViscosityMPaS,
} from "../../../lib/hydraulics";

describe("IAPWS R12-08 viscosity", () => {
  it("reproduces the release's own computer-program verification values (Table 4)", () => {
    // IAPWS R12-08 Table 4 (mu2 = 1), in µPa s. From memory of the release; the agreement to 9
    // significant digits of an independent implementation is itself the check.
    expect(iapwsViscosityPaS(298.15, 998) * 1e6).toBeCloseTo(889.7351, 4);
    expect(iapwsViscosityPaS(298.15, 1200) * 1e6).toBeCloseTo(1437.649467, 4);
    expect(iapwsViscosityPaS(373.15, 1000) * 1e6).toBeCloseTo(307.883622, 4);
    expect(iapwsViscosityPaS(433.15, 1) * 1e6).toBeCloseTo(14.538324, 5);
    expect(iapwsViscosityPaS(873.15, 600) * 1e6).toBeCloseTo(77.430195, 5);
  });

  it("matches the IAPWS 2008 viscosities of water at 0.1 MPa given in DOMAIN.md", () => {
    // IAPWS 2008 (as quoted in DOMAIN.md): 15 °C 1.1376, 20 °C 1.0016, 25 °C 0.8900, 30 °C 0.7972 mPa s.
    // Table values are rounded to 4 decimals, so ±0.00006 covers rounding plus the density formula.
    expect(Math.abs(waterViscosityMPaS(15) - 1.1376)).toBeLessThan(6e-5);
    expect(Math.abs(waterViscosityMPaS(20) - 1.0016)).toBeLessThan(6e-5);
    expect(Math.abs(waterViscosityMPaS(25) - 0.89)).toBeLessThan(6e-5);
    expect(Math.abs(waterViscosityMPaS(30) - 0.7972)).toBeLessThan(6e-5);
  });
});

describe("water density (Tanaka et al. 2001)", () => {
  it("hits the table values", () => {
    // Tanaka et al., Metrologia 38 (2001) 301, Table: 20 °C 998.2067, 4 °C 999.9749, 25 °C 997.0470 kg/m^3
    // (from memory of that table; the formula is the paper's eq. 1).
    expect(waterDensityKgPerM3(20)).toBeCloseTo(998.2067, 3);
    expect(waterDensityKgPerM3(4)).toBeCloseTo(999.9749, 3);
    expect(waterDensityKgPerM3(25)).toBeCloseTo(997.047, 3);
    // Maximum density near 3.98 °C: density at 4 °C exceeds that at 0 and at 8 °C.
    expect(waterDensityKgPerM3(4)).toBeGreaterThan(waterDensityKgPerM3(0));
    expect(waterDensityKgPerM3(4)).toBeGreaterThan(waterDensityKgPerM3(8));
  });
});

describe("D5084 viscosity ratio R_T", () => {
  it("worked example at 25 °C", () => {
    // 0.9842^25 = exp(25 ln 0.9842) = exp(-0.398154) = 0.671559; 25^0.1702 = exp(0.1702 × 3.218876) = 1.729535;
    // R_T = 2.2902 × 0.671559 / 1.729535 = 1.538004 / 1.729535 = 0.889259.
    expect(d5084ViscosityRatio(25)).toBeCloseTo(0.889259, 6);
  });

  it("gives 1.00023 (not 1) at 20 °C", () => {
    // 0.9842^20 = exp(-0.318523) = 0.727222; 20^0.1702 = exp(0.509874) = 1.665081;
    // 2.2902 × 0.727222 / 1.665081 = 1.665485 / 1.665081 = 1.000243.
    expect(d5084ViscosityRatio(20)).toBeCloseTo(1.000243, 6);
  });

  it("stays within 0.16 % of the IAPWS ratio from 15 to 30 °C", () => {
    // DOMAIN.md says "about 0.15 %"; the largest deviation is 0.154 % at 15 °C, so the bound is 0.16 %.
    let worst = 0;
    for (let t = 15; t <= 30; t += 0.25) worst = Math.max(worst, Math.abs(d5084ViscosityRatio(t) / iapwsViscosityRatio(t) - 1));
    expect(worst).toBeLessThan(0.0016);
    expect(worst).toBeGreaterThan(0.0015); // the deviation is real, not zero
  });

  it("also against the published table values directly", () => {
    // IAPWS 2008 table: R_T(15) = 1.1376 / 1.0016 = 1.135783; R_T(25) = 0.8900 / 1.0016 = 0.888578;
    // R_T(30) = 0.7972 / 1.0016 = 0.795927.
    expect(Math.abs(d5084ViscosityRatio(15) / (1.1376 / 1.0016) - 1)).toBeLessThan(0.0016);
    expect(Math.abs(d5084ViscosityRatio(25) / (0.89 / 1.0016) - 1)).toBeLessThan(0.0016);
    expect(Math.abs(d5084ViscosityRatio(30) / (0.7972 / 1.0016) - 1)).toBeLessThan(0.0016);
  });

  it("drifts about 1.2 % at 10 °C, so the default basis switches to IAPWS there", () => {
    expect(d5084ViscosityRatio(10) / iapwsViscosityRatio(10) - 1).toBeCloseTo(0.0123, 3);
    expect(viscosityRatio(10)).toEqual({ ratio: iapwsViscosityRatio(10), source: "IAPWS-2008" });
    expect(viscosityRatio(22).source).toBe("D5084-equation");
    expect(viscosityRatio(22, "IAPWS-2008").source).toBe("IAPWS-2008");
    expect(viscosityRatio(10, "D5084-equation").ratio).toBe(d5084ViscosityRatio(10));
    // The equation has no value at 0 °C (divides by 0^0.1702), so IAPWS is used whatever the basis.
    expect(viscosityRatio(0, "D5084-equation").source).toBe("IAPWS-2008");
    expect(viscosityRatio(0).ratio).toBeCloseTo(1.7919 / 1.0016, 3); // 0 °C: about 1.7919 mPa s (from memory)
  });
});
