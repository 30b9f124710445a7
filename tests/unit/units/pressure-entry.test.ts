import fc from "fast-check";
import { unit } from "mathjs";
import { describe, expect, it } from "vitest";
import { PSI_PA } from "../../../lib/hydraulics/units";
import { enteredPressureToPa, formatPressure, formatPressureNumber, paPerUnit, paToEnteredPressure } from "../../../lib/units/pressure-entry";

const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe("pressure entry in the person's unit", () => {
  it("uses the exact psi factor of lib/hydraulics", () => {
    // One source for the factor: lbf / in^2 from the exact pound, g_n and inch (NIST SP 811, 2008, B.8).
    expect(paPerUnit("PSI")).toBe(PSI_PA);
    expect(paPerUnit("KPA")).toBe(1000);
  });

  it("converts psi to Pa as NIST SP 811 does", () => {
    // NIST SP 811 (2008) B.8: pound-force per square inch (psi) -> pascal (Pa) 6.894 757 E+03.
    expect(rel(enteredPressureToPa(1, "PSI"), 6.894757e3)).toBeLessThan(1e-7);
    // Exact from the definitions: 0.45359237 × 9.80665 / 0.0254² = 6894.757 293 168 361 Pa (common arithmetic).
    expect(enteredPressureToPa(1, "PSI")).toBeCloseTo(6894.757293168361, 9);
  });

  it("agrees with mathjs for psi and kPa", () => {
    // mathjs 15 unit definitions (npm reference library); it stores psi rounded, so compare at 1e-9 relative.
    for (const value of [1, 2, 5, 14.5, 50, 100, 145.0377]) {
      expect(rel(enteredPressureToPa(value, "PSI"), unit(value, "psi").toNumber("Pa"))).toBeLessThan(1e-9);
      expect(rel(paToEnteredPressure(value * 1000, "PSI"), unit(value, "kPa").toNumber("psi"))).toBeLessThan(1e-9);
      expect(rel(enteredPressureToPa(value, "KPA"), unit(value, "kPa").toNumber("Pa"))).toBeLessThan(1e-12);
    }
  });

  it("gives back what was entered after storing in Pa (both units)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 10_000, noNaN: true }), fc.constantFrom("KPA" as const, "PSI" as const), (value, u) => {
        expect(rel(paToEnteredPressure(enteredPressureToPa(value, u), u), value)).toBeLessThan(1e-14);
      }),
    );
  });

  it("knows the usual set-up figures: 35 kPa is about 5 psi and 14 kPa about 2 psi", () => {
    // shared/DOMAIN.md (common practice): confining margin 35 kPa (5 psi), permeation head 14 kPa (2 psi).
    expect(paToEnteredPressure(35_000, "PSI")).toBeCloseTo(5.076, 3);
    expect(paToEnteredPressure(enteredPressureToPa(2, "PSI"), "KPA")).toBeCloseTo(13.790, 3);
  });
});

describe("formatPressure", () => {
  it("shows whole kPa and tenths of a psi by default, a dash when there is no value", () => {
    // 1 MPa = 145.037 738 psi (mathjs, and 1e6 / 6894.757 293 168 361).
    expect(formatPressure(1_000_000, "KPA")).toBe("1000 kPa");
    expect(formatPressure(1_000_000, "PSI")).toBe("145.0 psi");
    expect(formatPressure(700_000)).toBe("700 kPa");
    expect(formatPressure(null, "PSI")).toBe("—");
    expect(formatPressure(undefined)).toBe("—");
    expect(formatPressure(Number.NaN)).toBe("—");
  });

  it("takes other decimals on request and never shows minus zero", () => {
    expect(formatPressure(13_789.5, "KPA", { decimals: 1 })).toBe("13.8 kPa");
    expect(formatPressure(enteredPressureToPa(5, "PSI"), "PSI", { decimals: 2 })).toBe("5.00 psi");
    expect(formatPressureNumber(-1, "KPA")).toBe("0");
    expect(formatPressureNumber(-0.01, "PSI", { decimals: 2 })).toBe("0.00");
  });
});
