import { describe, expect, it } from "vitest";
import { evaluate, unit } from "mathjs";
import { formatDecimalText, formatLimit, formatPropertyUncertainty, formatPropertyValue } from "@/lib/format/result-numbers";
import { reportedResults } from "@/lib/results/reported-results";
import { unitWeightWords, viscosityWords } from "@/lib/results/basis-words";

describe("one notation for results, uncertainties and limits", () => {
  it("writes a flux with two significant digits in SI, never as a raw float", () => {
    const f = formatPropertyValue("INDEX_FLUX", 2.107918801839325e-9, "m3/m2/s", "SI");
    expect(f.text).toBe("2.1 × 10⁻⁹ m³/m²/s");
    expect(f.text).not.toMatch(/e-?\d/);
  });

  it("converts k to cm/s exactly: 1 m/s is 100 cm/s (mathjs as the independent reference)", () => {
    // mathjs: unit(1, "m/s").toNumber("cm/s") = 100.
    expect(unit(1, "m/s").toNumber("cm/s")).toBe(100);
    expect(formatPropertyValue("HYDRAULIC_CONDUCTIVITY", 2.45e-11, "m/s", "CENTIMETRE").text).toBe("2.4 × 10⁻⁹ cm/s"); // 2.45e-9, half to even -> 2.4
    expect(formatPropertyValue("HYDRAULIC_CONDUCTIVITY", 2.55e-11, "m/s", "CENTIMETRE").text).toBe("2.6 × 10⁻⁹ cm/s");
  });

  it("converts flux to cm³/cm²/s: the same factor as m/s to cm/s (m³/m²/s is m/s), mathjs", () => {
    expect(evaluate("1 m^3/m^2/s to cm^3/cm^2/s").toNumber("cm/s")).toBeCloseTo(100, 12);
    expect(formatPropertyValue("INDEX_FLUX", 2.4e-9, "m3/m2/s", "CENTIMETRE").text).toBe("2.4 × 10⁻⁷ cm³/cm²/s");
  });

  it("writes the uncertainty in the result's unit and power of ten, rounded up (GUM 7.2.6)", () => {
    expect(formatPropertyUncertainty("INDEX_FLUX", 2.01e-10, 2.43e-9, "m3/m2/s", "SI")).toBe("± 0.21 × 10⁻⁹ m³/m²/s");
    expect(formatPropertyUncertainty("HYDRAULIC_CONDUCTIVITY", 3.1e-12, 2.7e-11, "m/s", "CENTIMETRE")).toBe("± 0.31 × 10⁻⁹ cm/s");
    expect(formatPropertyUncertainty("HYDRAULIC_CONDUCTIVITY", null, 2.7e-11, "m/s", "SI")).toBeNull();
  });

  it("writes limits in the same notation, keeping their written digits", () => {
    expect(formatDecimalText("1e-8")).toBe("1 × 10⁻⁸");
    expect(formatDecimalText("5.0e-11")).toBe("5.0 × 10⁻¹¹");
    expect(formatDecimalText("24")).toBe("24");
    expect(formatDecimalText("3.66")).toBe("3.66");
    expect(formatLimit({ limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM" })).toBe("≤ 1 × 10⁻⁸ m³/m²/s");
    expect(formatLimit({ limitText: "5e-9", unit: "cm/s", direction: "MAXIMUM" })).toBe("≤ 5 × 10⁻⁹ cm/s");
    expect(formatLimit({ limitText: "24", unit: "mL/2 g", direction: "MINIMUM" })).toBe("≥ 24 mL/2 g");
  });

  it("names the bases in words, never by their codes", () => {
    expect(unitWeightWords("conventional-9.81")).toContain("9.81 kN/m³");
    expect(unitWeightWords("conventional-9.81")).not.toContain("conventional-9.81");
    expect(viscosityWords("IAPWS-2008")).toContain("IAPWS 2008 water viscosities");
  });

  it("has nothing to report for a run without an evaluation", () => {
    const verdict = { evaluation: null, reason: "No permeation readings yet." } as never;
    expect(reportedResults(verdict, "D5887", { earlyEnd: false, unitSystem: "SI", limits: null })).toEqual({ ok: false, reason: "No permeation readings yet." });
  });
});
