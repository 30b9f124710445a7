import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { decideConformance, lastSignificantPlaceExponent, roundHalfEven, roundToSignificantHalfEven } from "../../../lib/hydraulics";

describe("half-even rounding (ASTM E29 rounding method) and the binary-float traps", () => {
  it("2.25 to 2 significant figures is 2.2, where toPrecision gives 2.3", () => {
    // 2.25 is exact in binary, so toPrecision rounds the true half upward; half-even keeps the even 2.
    expect((2.25).toPrecision(2)).toBe("2.3");
    expect(roundToSignificantHalfEven(2.25, 2)).toBe("2.2");
    expect(roundToSignificantHalfEven(2.35, 2)).toBe("2.4"); // half to the even 4
    // decimal.js directly, as the independent reference.
    expect(new Decimal("2.25").toSignificantDigits(2, Decimal.ROUND_HALF_EVEN).toString()).toBe("2.2");
  });

  it("1.005 and 1.015 to 2 decimals", () => {
    // 1.005 is stored as 1.00499999999999989..., so toFixed gives "1.00" for the wrong reason;
    // half-even on the decimal 1.005 also gives 1.00 (0 is even), for the right one.
    expect((1.005).toFixed(2)).toBe("1.00");
    expect(roundHalfEven(1.005, 2)).toBe("1");
    // 1.015 is stored as 1.01499999999999990..., so toFixed gives "1.01"; half-even on 1.015 gives 1.02.
    expect((1.015).toFixed(2)).toBe("1.01");
    expect(roundHalfEven(1.015, 2)).toBe("1.02");
    expect(roundHalfEven("1.025", 2)).toBe("1.02");
    expect(new Decimal("1.015").toDecimalPlaces(2, Decimal.ROUND_HALF_EVEN).toString()).toBe("1.02");
  });

  it("last significant place of a limit as written", () => {
    expect(lastSignificantPlaceExponent("1e-8")).toBe(-8);
    expect(lastSignificantPlaceExponent("5e-11")).toBe(-11);
    expect(lastSignificantPlaceExponent("5.0e-11")).toBe(-12);
    expect(lastSignificantPlaceExponent("3.66")).toBe(-2);
    expect(lastSignificantPlaceExponent("24")).toBe(0);
    expect(() => lastSignificantPlaceExponent("abc")).toThrowError(/limit/);
  });
});

describe("decideConformance", () => {
  it("index flux 1.04e-8 against a maximum of 1e-8 (GRI-GCL3)", () => {
    // Rounding: 1.04e-8 to the 1e-8 place is 1e-8, and 1e-8 ≤ 1e-8, so it conforms.
    const r = decideConformance({ value: 1.04e-8, limit: "1e-8", kind: "max", method: "rounding" });
    expect(r).toMatchObject({ conforms: true, comparedValue: "1e-8", roundingPlace: "1e-8", value: "1.04e-8" });
    // Absolute: 1.04e-8 > 1e-8 fails.
    const a = decideConformance({ value: 1.04e-8, limit: "1e-8", kind: "max", method: "absolute" });
    expect(a).toMatchObject({ conforms: false, comparedValue: "1.04e-8", roundingPlace: null });
    expect(a.statement).toMatch(/does not conform/);
  });

  it("halves go to even: 1.5e-8 -> 2e-8 fails, 2.5e-8 -> 2e-8, 5.5e-11 -> 6e-11, 4.5e-11 -> 4e-11", () => {
    expect(decideConformance({ value: 1.5e-8, limit: "1e-8", kind: "max", method: "rounding" })).toMatchObject({ conforms: false, comparedValue: "2e-8" });
    expect(decideConformance({ value: 2.5e-8, limit: "1e-8", kind: "max", method: "rounding" }).comparedValue).toBe("2e-8");
    // k limit 5e-11 m/s (GRI-GCL3, 5e-9 cm/s):
    expect(decideConformance({ value: 5.4e-11, limit: "5e-11", kind: "max", method: "rounding" })).toMatchObject({ conforms: true, comparedValue: "5e-11" });
    expect(decideConformance({ value: 5.5e-11, limit: "5e-11", kind: "max", method: "rounding" })).toMatchObject({ conforms: false, comparedValue: "6e-11" });
    expect(decideConformance({ value: 4.5e-11, limit: "5e-11", kind: "max", method: "rounding" }).comparedValue).toBe("4e-11");
  });

  it("a limit written with more places rounds more finely", () => {
    // 5.04e-11 to the 0.1e-11 place of "5.0e-11" is 5.0e-11: conforms; 5.06e-11 -> 5.1e-11: fails.
    expect(decideConformance({ value: 5.04e-11, limit: "5.0e-11", kind: "max", method: "rounding" }).conforms).toBe(true);
    expect(decideConformance({ value: 5.06e-11, limit: "5.0e-11", kind: "max", method: "rounding" })).toMatchObject({ conforms: false, comparedValue: "5.1e-11" });
  });

  it("minimum limits: bentonite mass 3.66 kg/m^2 and swell index 24 mL/2 g", () => {
    // 3.655 -> 3.66 (the 5 rounds to the even 6): conforms; 3.645 -> 3.64: fails; absolute 3.655 < 3.66 fails.
    expect(decideConformance({ value: 3.655, limit: "3.66", kind: "min", method: "rounding" })).toMatchObject({ conforms: true, comparedValue: "3.66" });
    expect(decideConformance({ value: 3.645, limit: "3.66", kind: "min", method: "rounding" })).toMatchObject({ conforms: false, comparedValue: "3.64" });
    expect(decideConformance({ value: 3.655, limit: "3.66", kind: "min", method: "absolute" }).conforms).toBe(false);
    expect(decideConformance({ value: 23.5, limit: 24, kind: "min", method: "rounding" })).toMatchObject({ conforms: true, comparedValue: "24" });
    expect(decideConformance({ value: 22.5, limit: 24, kind: "min", method: "rounding" }).comparedValue).toBe("22");
  });

  it("rounds once, not in steps", () => {
    // 1.45 against a maximum of 1: once to units gives 1 (conforms). Stepwise 1.45 -> 1.5 -> 2 would fail it.
    const r = decideConformance({ value: 1.45, limit: "1", kind: "max", method: "rounding" });
    expect(r).toMatchObject({ conforms: true, comparedValue: "1" });
    const stepwise = new Decimal("1.45").toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toDecimalPlaces(0, Decimal.ROUND_HALF_UP);
    expect(stepwise.toString()).toBe("2");
  });

  it("refuses non-numbers", () => {
    expect(() => decideConformance({ value: Number.NaN, limit: "1e-8", kind: "max", method: "rounding" })).toThrowError(/value/);
    expect(() => decideConformance({ value: 1, limit: "x", kind: "max", method: "rounding" })).toThrowError(/limit/);
  });
});
