import { describe, expect, it } from "vitest";
import { formatNumber, formatResultValue, formatUncertainty, formatUnit } from "../../../lib/results/format-result";

describe("formatResultValue", () => {
  it("writes small values in scientific form with superscript powers and units", () => {
    expect(formatResultValue(2.43e-9, "m3/m2/s")).toBe("2.4 × 10⁻⁹ m³/m²/s");
    expect(formatResultValue(1.2084e-10, "m/s")).toBe("1.2 × 10⁻¹⁰ m/s");
  });

  it("has a plain ASCII form", () => {
    expect(formatResultValue(2.43e-9, "m3/m2/s", { ascii: true })).toBe("2.4e-9 m3/m2/s");
    expect(formatResultValue(5.45e-11, "m/s", { ascii: true, significantDigits: 3 })).toBe("5.45e-11 m/s");
  });

  it("keeps trailing zeros to the digits asked for", () => {
    expect(formatResultValue(2e-9, "m3/m2/s")).toBe("2.0 × 10⁻⁹ m³/m²/s");
    expect(formatNumber(3.6, { significantDigits: 3 })).toBe("3.60");
  });

  it("rounds half to even in decimal (ASTM E29), where toPrecision rounds the binary 2.25 up", () => {
    // 2.25 is exact in binary; (2.25).toPrecision(2) is "2.3" (shared/DOMAIN.md), half-even gives 2.2.
    expect((2.25).toPrecision(2)).toBe("2.3");
    expect(formatNumber(2.25)).toBe("2.2");
    expect(formatNumber(2.35)).toBe("2.4");
    // The same digits as a flux: the shortest decimal form 2.25e-9 is rounded, not its binary neighbour.
    expect(formatNumber(2.25e-9, { ascii: true })).toBe("2.2e-9");
    // 9.96e-9 to 2 digits carries into the next power of ten.
    expect(formatNumber(9.96e-9, { ascii: true })).toBe("1.0e-8");
  });

  it("writes index-test values plainly", () => {
    expect(formatResultValue(23.5, "mL/2 g", { significantDigits: 3 })).toBe("23.5 mL/2 g");
    expect(formatResultValue(3.655, "kg/m2", { significantDigits: 3 })).toBe("3.66 kg/m²");
    expect(formatNumber(0)).toBe("0");
  });

  it("refuses what is not a number", () => {
    expect(() => formatNumber(Number.NaN)).toThrowError(/finite/);
    expect(() => formatNumber(1, { significantDigits: 0 })).toThrowError(/significantDigits/);
  });
});

describe("formatUnit", () => {
  it("superscripts powers, leaves other units alone", () => {
    expect(formatUnit("m3/m2/s")).toBe("m³/m²/s");
    expect(formatUnit("cm3/cm2/s")).toBe("cm³/cm²/s");
    expect(formatUnit("kg/m2")).toBe("kg/m²");
    expect(formatUnit("mL/2 g")).toBe("mL/2 g");
    expect(formatUnit("m/s")).toBe("m/s");
    expect(formatUnit("m³/m²/s", { ascii: true })).toBe("m3/m2/s");
  });
});

describe("formatUncertainty", () => {
  it("states U (k = 2) in the value's power of ten, two digits rounded up (GUM 7.2.6)", () => {
    expect(formatUncertainty(2.1e-10, "m3/m2/s", { value: 2.43e-9 })).toBe("± 0.21 × 10⁻⁹ m³/m²/s (k = 2)");
    // 2.11e-10 rounds up to 0.22e-9, never down.
    expect(formatUncertainty(2.11e-10, "m3/m2/s", { value: 2.43e-9, ascii: true })).toBe("± 0.22e-9 m3/m2/s (k = 2)");
  });

  it("without the value, in its own power of ten", () => {
    expect(formatUncertainty(3.04e-12, "m/s")).toBe("± 3.1 × 10⁻¹² m/s (k = 2)");
  });

  it("plain values stay plain; none is null", () => {
    expect(formatUncertainty(0.012, "kg/m2", { value: 3.66 })).toBe("± 0.012 kg/m² (k = 2)");
    expect(formatUncertainty(null, "m/s")).toBeNull();
    expect(() => formatUncertainty(-1, "m/s")).toThrowError(/≥ 0/);
  });
});
