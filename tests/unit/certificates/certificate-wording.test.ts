import { describe, expect, it } from "vitest";
import { conditionValue, custodyActionLabel, isoDate, isoDateTime, prettyUnit, roleLabel, valueWithUnit, withoutCoverageFactor } from "@/lib/certificates/certificate-wording";

describe("certificate wording", () => {
  it("sets powers of metres as superscripts and leaves other units alone", () => {
    expect(prettyUnit("m3/m2/s")).toBe("m³/m²/s");
    expect(prettyUnit("kg/m2")).toBe("kg/m²");
    expect(prettyUnit("mm2")).toBe("mm²");
    expect(prettyUnit("m/s")).toBe("m/s");
    expect(prettyUnit("mL/2 g")).toBe("mL/2 g");
    expect(prettyUnit("m23")).toBe("m23");
  });

  it("writes conditions with their unit, trailing zeros dropped, or says none was recorded", () => {
    expect(conditionValue(34.5, "kPa")).toBe("34.5 kPa");
    expect(conditionValue(14, "kPa")).toBe("14 kPa");
    expect(conditionValue(20.64, "°C")).toBe("20.6 °C");
    expect(conditionValue(5.9, "mm", 2)).toBe("5.9 mm");
    expect(conditionValue(null, "kPa")).toBe("not recorded");
    expect(conditionValue(Number.NaN, "kPa")).toBe("not recorded");
  });

  it("names custody steps and roles, and keeps text it does not know", () => {
    expect(custodyActionLabel("TEST_STARTED")).toBe("Test started");
    expect(custodyActionLabel("mounted in a cell")).toBe("Mounted in a cell");
    expect(roleLabel("QA_MANAGER")).toBe("QA manager");
    expect(roleLabel("Technical manager")).toBe("Technical manager");
  });

  it("adds a result's unit only when its display lacks it, and drops a repeated coverage factor", () => {
    expect(valueWithUnit("2.4 × 10⁻⁹ m³/m²/s", "m3/m2/s")).toBe("2.4 × 10⁻⁹ m³/m²/s");
    expect(valueWithUnit("2.4e-9 m3/m2/s", "m3/m2/s")).toBe("2.4e-9 m3/m2/s");
    expect(valueWithUnit("2.4e-9", "m3/m2/s")).toBe("2.4e-9 m³/m²/s");
    expect(withoutCoverageFactor("± 0.21 × 10⁻⁹ m³/m²/s (k = 2)")).toBe("± 0.21 × 10⁻⁹ m³/m²/s");
    expect(withoutCoverageFactor("± 0.2 (k = 3)")).toBe("± 0.2 (k = 3)");
  });

  it("writes ISO times as the lab does, in UTC", () => {
    expect(isoDate("2026-12-14T09:30:00.000Z")).toBe("2026-12-14");
    expect(isoDateTime("2026-12-14T09:30:00.000Z")).toBe("2026-12-14 09:30 UTC");
    expect(isoDateTime("2026-12-14T10:30:00+01:00")).toBe("2026-12-14 09:30 UTC");
    expect(isoDateTime(null)).toBe("—");
    // In the lab's zone when the certificate names one (Europe/Berlin is UTC+1 in December; IANA tz database).
    expect(isoDateTime("2026-12-14T23:30:00.000Z", "Europe/Berlin")).toBe("2026-12-15 00:30 CET");
    expect(isoDate("2026-12-14T23:30:00.000Z", "Europe/Berlin")).toBe("2026-12-15");
  });
});
