import { describe, expect, it } from "vitest";
import { PSI_PA } from "../../../lib/hydraulics/units";
import { m2ToMm2, mm2ToM2, readBuretteAreasM2, recordCalibrationSchema, registerEquipmentSchema, setEquipmentStatusSchema } from "../../../lib/validation/equipment";

/** The first message per field, as parseOrThrow and the form show it. */
function issues(result: { success: boolean; error?: { issues: Array<{ path: PropertyKey[]; message: string }> } }): Record<string, string> {
  const out: Record<string, string> = {};
  for (const i of result.error?.issues ?? []) out[i.path.join(".")] ??= i.message;
  return out;
}

describe("registering equipment", () => {
  const good = { assetTag: " cell-07 ", kind: "PERMEAMETER_CELL", name: "Cell 7", ratedMaxPressure: "1000", pressureUnit: "KPA" };

  it("upper-cases the asset tag and keeps the entered pressure in its unit", () => {
    const parsed = registerEquipmentSchema.parse(good);
    expect(parsed).toMatchObject({ assetTag: "CELL-07", ratedMaxPressure: 1000, pressureUnit: "KPA", status: "IN_SERVICE" });
  });

  it("refuses bad tags, the reserved tag NEW, and a cell without a rated pressure", () => {
    expect(issues(registerEquipmentSchema.safeParse({ ...good, assetTag: "CELL 07" }))).toHaveProperty("assetTag");
    expect(issues(registerEquipmentSchema.safeParse({ ...good, assetTag: "CELL--07" }))).toHaveProperty("assetTag");
    expect(issues(registerEquipmentSchema.safeParse({ ...good, assetTag: "new" })).assetTag).toMatch(/reserved/);
    expect(issues(registerEquipmentSchema.safeParse({ ...good, assetTag: "" })).assetTag).toBe("Enter the asset tag.");
    expect(issues(registerEquipmentSchema.safeParse({ ...good, ratedMaxPressure: "" }))).toHaveProperty("ratedMaxPressure");
    expect(registerEquipmentSchema.safeParse({ ...good, kind: "THERMOMETER", ratedMaxPressure: "" }).success).toBe(true);
  });

  it("caps the rating at 10 MPa in either unit (catches kPa typed as psi)", () => {
    // 10 MPa / 6894.757 Pa per psi = 1450.4 psi (NIST SP 811 factor).
    expect(10_000_000 / PSI_PA).toBeCloseTo(1450.38, 2);
    expect(registerEquipmentSchema.safeParse({ ...good, ratedMaxPressure: "1450", pressureUnit: "PSI" }).success).toBe(true);
    expect(issues(registerEquipmentSchema.safeParse({ ...good, ratedMaxPressure: "1451", pressureUnit: "PSI" }))).toHaveProperty("ratedMaxPressure");
    expect(issues(registerEquipmentSchema.safeParse({ ...good, ratedMaxPressure: "10001" }))).toHaveProperty("ratedMaxPressure");
  });
});

describe("recording a calibration", () => {
  const base = { equipmentId: "e1", calibratedAt: "2026-01-10", dueAt: "2027-01-10", reference: "CAL-1", performedBy: "Metrology", passed: true };

  it("needs the due date on or after the calibration date", () => {
    expect(recordCalibrationSchema.safeParse({ ...base, dueAt: "2026-01-10" }).success).toBe(true);
    expect(issues(recordCalibrationSchema.safeParse({ ...base, dueAt: "2026-01-09" })).dueAt).toMatch(/before the calibration date/);
  });

  it("asks a burette panel for both areas, in mm² between 1 and 5000, shown with the other errors at once", () => {
    const missing = issues(recordCalibrationSchema.safeParse({ ...base, reference: "", equipmentKind: "BURETTE_PANEL" }));
    expect(Object.keys(missing).sort()).toEqual(["inflowBuretteAreaMm2", "outflowBuretteAreaMm2", "reference"]);
    expect(issues(recordCalibrationSchema.safeParse({ ...base, equipmentKind: "BURETTE_PANEL", inflowBuretteAreaMm2: "0.9", outflowBuretteAreaMm2: "5001" }))).toMatchObject({
      inflowBuretteAreaMm2: expect.stringMatching(/at least 1/), outflowBuretteAreaMm2: expect.stringMatching(/at most 5000/),
    });
    expect(recordCalibrationSchema.parse({ ...base, equipmentKind: "BURETTE_PANEL", inflowBuretteAreaMm2: "31,4", outflowBuretteAreaMm2: "31.2" })).toMatchObject({ inflowBuretteAreaMm2: 31.4 });
    expect(recordCalibrationSchema.safeParse({ ...base, equipmentKind: "THERMOMETER" }).success).toBe(true);
  });

  it("reads a checkbox's 'false' as false and refuses a missing result", () => {
    expect(recordCalibrationSchema.parse({ ...base, passed: "false" }).passed).toBe(false);
    expect(recordCalibrationSchema.parse({ ...base, passed: "on" }).passed).toBe(true);
    expect(issues(recordCalibrationSchema.safeParse({ ...base, passed: undefined }))).toHaveProperty("passed");
  });
});

describe("status and stored values", () => {
  it("needs a version for the concurrent-edit check, and the reason for the change", () => {
    expect(setEquipmentStatusSchema.safeParse({ equipmentId: "e1", status: "RETIRED", reason: "Cracked cell body" }).success).toBe(false);
    expect(setEquipmentStatusSchema.parse({ equipmentId: "e1", status: "RETIRED", version: "3", reason: "Cracked cell body" }).version).toBe(3);
    const noReason = setEquipmentStatusSchema.safeParse({ equipmentId: "e1", status: "RETIRED", version: "3", reason: " " });
    expect(noReason.success).toBe(false);
    if (!noReason.success) expect(noReason.error.issues[0]?.path).toEqual(["reason"]);
  });

  it("converts mm² and m² exactly and reads stored burette areas", () => {
    // 1 mm² = 1e-6 m² (SI prefixes, exact).
    expect(mm2ToM2(31.4)).toBeCloseTo(3.14e-5, 15);
    expect(m2ToMm2(3.14e-5)).toBeCloseTo(31.4, 10);
    expect(readBuretteAreasM2({ inflowBuretteAreaM2: 3.14e-5, outflowBuretteAreaM2: 3.12e-5 })).toEqual({ inflowBuretteAreaM2: 3.14e-5, outflowBuretteAreaM2: 3.12e-5 });
    expect(readBuretteAreasM2({})).toBeNull();
    expect(readBuretteAreasM2(null)).toBeNull();
  });
});
