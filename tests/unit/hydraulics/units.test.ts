import fc from "fast-check";
import { unit } from "mathjs";
import { describe, expect, it } from "vitest";
import {
  cmPerSToMPerS,
  CONVENTIONAL_UNIT_WEIGHT_KN_PER_M3,
  daysToS,
  hoursToS,
  INCH_M,
  inchToMm,
  kPaToPa,
  kPaToPsi,
  m3ToMl,
  minutesToS,
  mlToM3,
  mmToInch,
  mPerSToCmPerS,
  paToKPa,
  POUND_FORCE_N,
  POUND_KG,
  pressureKPaToHeadM,
  PSI_PA,
  psiToKPa,
  sToHours,
  STANDARD_GRAVITY_M_PER_S2,
  unitWeightOfWaterKNPerM3,
} from "../../../lib/hydraulics";

const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe("exact constants (NIST SP 811, 2008, Appendix B)", () => {
  it("inch, pound, g_n are the exact defined values", () => {
    // NIST SP 811 B.8: inch -> metre 2.54 E-02 (exact); pound (avoirdupois) -> kg 4.535 923 7 E-01 (exact);
    // B.8 footnote / SP 330: standard acceleration of gravity 9.806 65 m/s^2 (exact).
    expect(INCH_M).toBe(0.0254);
    expect(POUND_KG).toBe(0.45359237);
    expect(STANDARD_GRAVITY_M_PER_S2).toBe(9.80665);
  });

  it("pound-force and psi follow from the definitions", () => {
    // lbf = 0.45359237 kg × 9.80665 m/s^2 = 4.4482216152605 N (NIST SP 811 B.8 lists 4.448 222 E+00).
    expect(POUND_FORCE_N).toBeCloseTo(4.4482216152605, 13);
    // psi = 4.4482216152605 N / (0.0254 m)^2 = 4.4482216152605 / 0.00064516 = 6894.757293168361 Pa.
    expect(PSI_PA).toBeCloseTo(6894.757293168361, 9);
    // NIST SP 811 B.8 prints the factor rounded to 7 digits: 6.894 757 E+03.
    expect(Number(PSI_PA.toPrecision(7))).toBe(6894.757);
  });
});

describe("unit factors against mathjs (independent implementation)", () => {
  it("psi to kPa", () => {
    // mathjs derives lbf/in^2 from its exact lbf and inch: 6.894757293168361 kPa.
    expect(psiToKPa(1)).toBeCloseTo(unit(1, "lbf/inch^2").toNumber("kPa"), 12);
    // mathjs's own 'psi' entry is stored rounded (6894.75729276459 Pa), 6e-11 relative from exact.
    expect(rel(psiToKPa(1), unit(1, "psi").toNumber("kPa"))).toBeLessThan(1e-10);
    expect(psiToKPa(2)).toBeCloseTo(13.789514586336722, 10); // 2 psi, the usual driving head
  });

  it("length, volume, conductivity, time", () => {
    expect(inchToMm(1)).toBe(unit(1, "inch").toNumber("mm")); // 25.4 exactly
    expect(mlToM3(1)).toBe(unit(1, "mL").toNumber("m^3")); // 1e-6
    expect(mPerSToCmPerS(5e-11)).toBeCloseTo(unit(5e-11, "m/s").toNumber("cm/s"), 25); // 5e-9 cm/s
    expect(hoursToS(1)).toBe(unit(1, "h").toNumber("s"));
    expect(minutesToS(1)).toBe(unit(1, "minute").toNumber("s"));
    expect(daysToS(1)).toBe(unit(1, "day").toNumber("s"));
  });
});

describe("round trips (property-based)", () => {
  const positive = fc.double({ min: 1e-12, max: 1e9, noNaN: true });
  it("every conversion inverts", () => {
    fc.assert(
      fc.property(positive, (x) => {
        expect(rel(kPaToPsi(psiToKPa(x)), x)).toBeLessThan(1e-14);
        expect(rel(mmToInch(inchToMm(x)), x)).toBeLessThan(1e-14);
        expect(rel(m3ToMl(mlToM3(x)), x)).toBeLessThan(1e-14);
        expect(rel(cmPerSToMPerS(mPerSToCmPerS(x)), x)).toBeLessThan(1e-14);
        expect(rel(paToKPa(kPaToPa(x)), x)).toBeLessThan(1e-14);
        expect(rel(sToHours(hoursToS(x)), x)).toBeLessThan(1e-14);
      }),
    );
  });
});

describe("unit weight of water", () => {
  it("conventional basis is 9.81 kN/m^3 at any temperature", () => {
    expect(unitWeightOfWaterKNPerM3(5)).toBe(9.81);
    expect(unitWeightOfWaterKNPerM3(35, "conventional-9.81")).toBe(CONVENTIONAL_UNIT_WEIGHT_KN_PER_M3);
  });

  it("density basis is rho(T) g_n", () => {
    // 998.2067 kg/m^3 at 20 °C (Tanaka et al. 2001, Table) × 9.80665 = 9789.07 N/m^3 = 9.78907 kN/m^3.
    expect(unitWeightOfWaterKNPerM3(20, "density-at-temperature")).toBeCloseTo(9.78907, 4);
    // The bases differ by 9.81 / 9.78907 - 1 = 0.21 %, the size DOMAIN.md warns of.
    expect(9.81 / unitWeightOfWaterKNPerM3(20, "density-at-temperature") - 1).toBeCloseTo(0.00214, 4);
  });

  it("14 kPa is 1.4271 m of water on the conventional basis", () => {
    // 14 / 9.81 = 1.427115...
    expect(pressureKPaToHeadM(14, 9.81)).toBeCloseTo(1.4271151885830784, 12);
  });
});
