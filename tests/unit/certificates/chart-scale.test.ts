import { describe, expect, it } from "vitest";
import { axisScale, powerOfTen } from "@/lib/certificates/chart-scale";

// Steps of 1, 2, 2.5 and 5 times a power of ten are common practice for chart axes.
describe("axisScale", () => {
  it("covers the data with round ticks from zero", () => {
    expect(axisScale([6, 30, 147], { includeZero: true, targetTicks: 6 })).toMatchObject({ min: 0, max: 150, ticks: [0, 50, 100, 150], exponent: 0, labels: ["0", "50", "100", "150"] });
    expect(axisScale([0.3, 1.2])).toMatchObject({ ticks: [0.25, 0.5, 0.75, 1, 1.25], labels: ["0.25", "0.50", "0.75", "1.00", "1.25"] });
  });

  it("puts one power of ten into the title for very small values, and labels stay short", () => {
    const flux = axisScale([2.4e-9, 5.1e-9], { includeZero: true });
    expect(flux.exponent).toBe(-9);
    expect(flux.labels).toEqual(["0", "2", "4", "6"]);
    expect(flux.max).toBeCloseTo(6e-9, 20);
    const k = axisScale([0.87e-10, 1.9e-10], { includeZero: true });
    expect(k).toMatchObject({ exponent: -10, labels: ["0.0", "0.5", "1.0", "1.5", "2.0"] });
  });

  it("has no floating-point noise in its ticks", () => {
    const { ticks } = axisScale([0.1, 0.7], { targetTicks: 7 });
    expect(ticks).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7]);
  });

  it("copes with a single value, no values and non-finite values", () => {
    expect(axisScale([5])).toMatchObject({ min: 4.5, max: 5.5 });
    expect(axisScale([])).toMatchObject({ min: 0, max: 1 });
    expect(axisScale([Number.NaN, 2, Number.POSITIVE_INFINITY], { includeZero: true })).toMatchObject({ min: 0, max: 2 });
  });

  it("labels negative ticks without a stray minus on zero", () => {
    expect(axisScale([-1, 1]).labels).toContain("0.0");
    expect(axisScale([-1, 1]).labels[0]).toBe("-1.0");
  });
});

describe("powerOfTen", () => {
  it("writes the exponent in superscript digits", () => {
    expect(powerOfTen(-9)).toBe("10⁻⁹");
    expect(powerOfTen(-11)).toBe("10⁻¹¹");
    expect(powerOfTen(4)).toBe("10⁴");
  });
});
