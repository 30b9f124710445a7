import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { conformanceSummary, explainConformance, type SpecificationLimitInput } from "../../../lib/results/conformance-summary";
import { convertUnit } from "../../../lib/results/property-units";

// Limits as cited in shared/DOMAIN.md (GRI-GCL3, from public project specifications):
// index flux ≤ 1e-8 m^3/m^2/s; k ≤ 5e-11 m/s (5e-9 cm/s); swell index ≥ 24 mL/2 g; fluid loss ≤ 18 mL;
// bentonite mass per unit area ≥ 3.66 kg/m^2. Rounding per ASTM E29 (rounding method: round once, half to
// even, to the last significant place of the limit as written); the half-even expectations are checked
// against decimal.js ROUND_HALF_EVEN, an npm reference library, in the last block.
const limit = (limitText: string, unit: string, direction: "MAXIMUM" | "MINIMUM", conformanceMethod: "ROUNDING" | "ABSOLUTE" = "ROUNDING"): SpecificationLimitInput => ({ limitText, unit, direction, conformanceMethod });
const K_MAX = limit("5e-11", "m/s", "MAXIMUM");
const FLUX_MAX = limit("1e-8", "m3/m2/s", "MAXIMUM");
const SWELL_MIN = limit("24", "mL/2 g", "MINIMUM");
const MASS_MIN = limit("3.66", "kg/m2", "MINIMUM");

describe("ASTM E29 in plain words", () => {
  it("a small flux that rounds to 0 at the limit's place is explained as a rounded comparison, not a measured zero", () => {
    // 2.4e-9 against GRI-GCL3's 1e-8 m³/m²/s (DOMAIN.md), rounded to the nearest 1e-8, half to even: 0.24 → 0.
    const s = conformanceSummary({ value: 2.4e-9, unit: "m3/m2/s" }, limit("1e-8", "m3/m2/s", "MAXIMUM"));
    expect(s).toMatchObject({ comparedValue: "0", conforms: true, measuredValue: "2.40 × 10⁻⁹ m³/m²/s" });
    expect(s.plainRule).toContain("rounded to the nearest 1 × 10⁻⁸ m³/m²/s it reads 0. That 0 is not a measured zero: the result is smaller than half of 1 × 10⁻⁸ m³/m²/s, so it does not exceed the maximum.");
  });

  it("for a minimum, a result that rounds to 0 falls short of it; the absolute method says so in words too", () => {
    const s = conformanceSummary({ value: 0.4, unit: "kg/m2" }, limit("3", "kg/m2", "MINIMUM"));
    expect(s).toMatchObject({ comparedValue: "0", conforms: false });
    expect(s.plainRule).toMatch(/so it falls short of the minimum\.$/);
    const a = conformanceSummary({ value: 5.01e-11, unit: "m/s" }, { ...limit("5e-11", "m/s", "MAXIMUM"), conformanceMethod: "ABSOLUTE" });
    expect(a.plainRule).toBe("The result as measured, 5.01 × 10⁻¹¹ m/s, is compared with the limit; any excursion beyond it fails (ASTM E29 absolute method).");
  });
});

describe("hydraulic conductivity against the GRI-GCL3 maximum of 5e-11 m/s", () => {
  it("5.4e-11 rounds to 5e-11 and conforms (rounding method)", () => {
    const s = conformanceSummary({ value: 5.4e-11, unit: "m/s" }, K_MAX);
    expect(s).toEqual({
      limitText: "5e-11", unit: "m/s", direction: "MAXIMUM", method: "ROUNDING", comparedValue: "5e-11", conforms: true,
      statement: "5.40 × 10⁻¹¹ m/s, rounded to 5 × 10⁻¹¹ m/s (ASTM E29, half to even), does not exceed the maximum of 5 × 10⁻¹¹ m/s: conforms.",
      measuredValue: "5.40 × 10⁻¹¹ m/s",
      plainRule: "The specification states its limit to the nearest 1 × 10⁻¹¹ m/s, so the result is rounded once to that place, halves to even, and the rounded value is compared with the limit (ASTM E29 rounding method). Measured 5.40 × 10⁻¹¹ m/s; rounded 5 × 10⁻¹¹ m/s.",
    });
  });

  it("5.5e-11 rounds half to even to 6e-11 and does not conform", () => {
    const s = conformanceSummary({ value: 5.5e-11, unit: "m/s" }, K_MAX);
    expect(s).toMatchObject({ comparedValue: "6e-11", conforms: false });
    expect(s.statement).toBe("5.50 × 10⁻¹¹ m/s, rounded to 6 × 10⁻¹¹ m/s (ASTM E29, half to even), exceeds the maximum of 5 × 10⁻¹¹ m/s: does not conform.");
  });

  it("4.5e-11 rounds half to even to 4e-11 and conforms", () => {
    expect(conformanceSummary({ value: 4.5e-11, unit: "m/s" }, K_MAX)).toMatchObject({ comparedValue: "4e-11", conforms: true });
  });

  it("5.01e-11 by the absolute method does not conform (any excursion fails), though rounding would pass it", () => {
    const s = conformanceSummary({ value: 5.01e-11, unit: "m/s" }, limit("5e-11", "m/s", "MAXIMUM", "ABSOLUTE"));
    expect(s).toMatchObject({ method: "ABSOLUTE", comparedValue: "5.01e-11", conforms: false });
    expect(s.statement).toBe("5.01 × 10⁻¹¹ m/s, taken as measured (absolute method), exceeds the maximum of 5 × 10⁻¹¹ m/s: does not conform.");
    expect(conformanceSummary({ value: 5.01e-11, unit: "m/s" }, K_MAX).conforms).toBe(true);
  });

  it("a value equal to the limit conforms by either method", () => {
    expect(conformanceSummary({ value: 5e-11, unit: "m/s" }, K_MAX).conforms).toBe(true);
    expect(conformanceSummary({ value: 5e-11, unit: "m/s" }, limit("5e-11", "m/s", "MAXIMUM", "ABSOLUTE")).conforms).toBe(true);
  });
});

describe("index flux against the GRI-GCL3 maximum of 1e-8 m^3/m^2/s", () => {
  it("9.6e-9 rounds to 1e-8 and conforms", () => {
    expect(conformanceSummary({ value: 9.6e-9, unit: "m3/m2/s" }, FLUX_MAX)).toMatchObject({ comparedValue: "1e-8", conforms: true });
  });

  it("1.05e-8 rounds to 1e-8 (0.05 of the 1e-8 place is below a half) and conforms; absolutely it does not", () => {
    const r = conformanceSummary({ value: 1.05e-8, unit: "m3/m2/s" }, FLUX_MAX);
    expect(r).toMatchObject({ comparedValue: "1e-8", conforms: true });
    expect(r.statement).toBe("1.05 × 10⁻⁸ m³/m²/s, rounded to 1 × 10⁻⁸ m³/m²/s (ASTM E29, half to even), does not exceed the maximum of 1 × 10⁻⁸ m³/m²/s: conforms.");
    expect(conformanceSummary({ value: 1.05e-8, unit: "m3/m2/s" }, { ...FLUX_MAX, conformanceMethod: "ABSOLUTE" })).toMatchObject({ comparedValue: "1.05e-8", conforms: false });
  });

  it("1.5e-8 rounds half to even to 2e-8 and does not conform", () => {
    expect(conformanceSummary({ value: 1.5e-8, unit: "m3/m2/s" }, FLUX_MAX)).toMatchObject({ comparedValue: "2e-8", conforms: false });
  });
});

describe("index properties (minimum limits)", () => {
  it("swell index 23.5 mL/2 g rounds half to even to 24 and conforms to the minimum of 24", () => {
    const s = conformanceSummary({ value: 23.5, unit: "mL/2 g" }, SWELL_MIN);
    expect(s).toMatchObject({ comparedValue: "24", conforms: true });
    expect(s.statement).toBe("23.5 mL/2 g, rounded to 24 mL/2 g (ASTM E29, half to even), is not below the minimum of 24 mL/2 g: conforms.");
  });

  it("swell index 23.4 rounds to 23 and does not conform; 22.5 rounds half to even to 22", () => {
    const s = conformanceSummary({ value: 23.4, unit: "mL/2 g" }, SWELL_MIN);
    expect(s).toMatchObject({ comparedValue: "23", conforms: false });
    expect(s.statement).toMatch(/is below the minimum of 24 mL\/2 g: does not conform\.$/);
    expect(conformanceSummary({ value: 22.5, unit: "mL/2 g" }, SWELL_MIN).comparedValue).toBe("22");
  });

  it("mass per area 3.655 kg/m² rounds to 3.66 (the 5 before the half is odd, so up to the even 6) and conforms", () => {
    expect(conformanceSummary({ value: 3.655, unit: "kg/m2" }, MASS_MIN)).toMatchObject({ comparedValue: "3.66", conforms: true });
  });

  it("mass per area 3.645 rounds half to even to 3.64 and does not conform; 3.665 stays 3.66", () => {
    expect(conformanceSummary({ value: 3.645, unit: "kg/m2" }, MASS_MIN)).toMatchObject({ comparedValue: "3.64", conforms: false });
    expect(conformanceSummary({ value: 3.665, unit: "kg/m2" }, MASS_MIN)).toMatchObject({ comparedValue: "3.66", conforms: true });
  });

  it("fluid loss 18.5 mL rounds half to even to 18 and conforms to the maximum of 18; 18.6 does not", () => {
    const FLUID_MAX = limit("18", "mL", "MAXIMUM");
    expect(conformanceSummary({ value: 18.5, unit: "mL" }, FLUID_MAX)).toMatchObject({ comparedValue: "18", conforms: true });
    expect(conformanceSummary({ value: 18.6, unit: "mL" }, FLUID_MAX)).toMatchObject({ comparedValue: "19", conforms: false });
  });
});

describe("a limit stated in cm/s against a result in m/s (GRI-GCL3's 5e-9 cm/s)", () => {
  const CM_LIMIT = limit("5e-9", "cm/s", "MAXIMUM");

  it("5.4e-11 m/s is 5.4e-9 cm/s, rounds to 5e-9 and conforms; the statement shows both units", () => {
    const e = explainConformance({ value: 5.4e-11, unit: "m/s" }, CM_LIMIT);
    expect(e).toMatchObject({ converted: true, value: "5.4e-11", valueInLimitUnit: "5.4e-9", roundingPlace: "1e-9" });
    expect(e.summary).toMatchObject({ unit: "cm/s", comparedValue: "5e-9", conforms: true });
    expect(e.summary.statement).toBe("5.40 × 10⁻¹¹ m/s (5.40 × 10⁻⁹ cm/s), rounded to 5 × 10⁻⁹ cm/s (ASTM E29, half to even), does not exceed the maximum of 5 × 10⁻⁹ cm/s: conforms.");
  });

  it("5.5e-11 m/s -> 5.5e-9 cm/s -> 6e-9: does not conform; 4.5e-11 -> 4e-9: conforms", () => {
    expect(conformanceSummary({ value: 5.5e-11, unit: "m/s" }, CM_LIMIT)).toMatchObject({ comparedValue: "6e-9", conforms: false });
    expect(conformanceSummary({ value: 4.5e-11, unit: "m/s" }, CM_LIMIT)).toMatchObject({ comparedValue: "4e-9", conforms: true });
  });

  it("rounds in the limit's unit after an exact conversion: the binary product would move the half", () => {
    // 2.5e-10 m/s × 100 in binary floats is 2.5000000000000002e-8, which rounds up to 3e-8; the exact
    // 2.5e-8 cm/s rounds half to even to 2e-8. And 9.5e-11 × 100 = 9.499999999999999e-9 would round down.
    expect(2.5e-10 * 100).toBe(2.5000000000000002e-8);
    expect(9.5e-11 * 100).toBe(9.499999999999999e-9);
    expect(conformanceSummary({ value: 2.5e-10, unit: "m/s" }, limit("2e-8", "cm/s", "MAXIMUM"))).toMatchObject({ comparedValue: "2e-8", conforms: true });
    expect(conformanceSummary({ value: 9.5e-11, unit: "m/s" }, limit("9e-9", "cm/s", "MAXIMUM"))).toMatchObject({ comparedValue: "1e-8", conforms: false });
  });

  it("a cm/s result against an m/s limit converts the other way", () => {
    expect(conformanceSummary({ value: 5.4e-9, unit: "cm/s" }, K_MAX)).toMatchObject({ unit: "m/s", comparedValue: "5e-11", conforms: true });
  });

  it("superscript units are the same units", () => {
    expect(conformanceSummary({ value: 9.6e-9, unit: "m³/m²/s" }, FLUX_MAX).conforms).toBe(true);
  });

  it("refuses to compare units of different kinds, with a sentence", () => {
    expect(() => conformanceSummary({ value: 5.4e-11, unit: "m/s" }, limit("18", "mL", "MAXIMUM"))).toThrowError("A value in m/s cannot be compared with a limit in mL: they measure different things.");
    expect(() => conformanceSummary({ value: 1, unit: "furlong/fortnight" }, K_MAX)).toThrowError(/not one Seepline knows/);
  });
});

describe("independent reference: decimal.js ROUND_HALF_EVEN gives the same compared values", () => {
  it.each([
    ["5.4e-11", "1e-11", "5e-11"], ["5.5e-11", "1e-11", "6e-11"], ["4.5e-11", "1e-11", "4e-11"],
    ["1.05e-8", "1e-8", "1e-8"], ["23.5", "1", "24"], ["3.655", "0.01", "3.66"], ["3.645", "0.01", "3.64"],
  ])("%s to the %s place is %s", (value, place, expected) => {
    expect(new Decimal(value).toNearest(place, Decimal.ROUND_HALF_EVEN).toString()).toBe(expected);
  });

  it("the unit conversion is exact in decimal", () => {
    expect(convertUnit(2.5e-10, "m/s", "cm/s")).toBe("2.5e-8");
    expect(convertUnit("3.66", "kg/m2", "g/m2")).toBe("3660");
    expect(convertUnit(1e-8, "m3/m2/s", "cm3/cm2/s")).toBe("0.000001");
  });
});
