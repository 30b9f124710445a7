import { describe, expect, it } from "vitest";
import { calibrationStatus, DUE_SOON_DAYS, type CalibrationRecord } from "../../../lib/equipment/calibration-status";

// Dates are invented; the rule is the lab's (shared/DOMAIN.md, issue 5): used only while calibrated and in service.
const now = new Date("2026-03-01T12:00:00Z");
const day = 86_400_000;
const cal = (calibratedDaysAgo: number, validDays: number, passed = true): CalibrationRecord => {
  const calibratedAt = new Date(now.getTime() - calibratedDaysAgo * day);
  return { calibratedAt, dueAt: new Date(calibratedAt.getTime() + validDays * day), passed };
};
const status = (calibrations: CalibrationRecord[], inService = true) => calibrationStatus({ assetTag: "CELL-01", inService, calibrations, now });

describe("calibrationStatus", () => {
  it("is current when the latest calibration passed and is due well ahead", () => {
    const s = status([cal(30, 365)]);
    expect(s).toMatchObject({ usable: true, state: "current" });
    expect(s.message).toBe("CELL-01 is calibrated until 2027-01-30.");
  });

  it("warns but allows use when due within the due-soon window", () => {
    expect(DUE_SOON_DAYS).toBe(30);
    expect(status([cal(350, 365)])).toMatchObject({ usable: true, state: "due-soon" });
    expect(status([cal(335, 365)])).toMatchObject({ usable: true, state: "current" }); // 30 days left exactly: not "soon"
  });

  it("refuses use once the due date has passed", () => {
    const s = status([cal(400, 365)]);
    expect(s).toMatchObject({ usable: false, state: "overdue" });
    expect(s.message).toMatch(/^CELL-01 was due for calibration on 2026-01-25\.$/);
  });

  it("refuses use after a failed calibration, however recent", () => {
    expect(status([cal(1, 365, false)])).toMatchObject({ usable: false, state: "failed" });
  });

  it("refuses use with no calibration on record", () => {
    expect(status([])).toMatchObject({ usable: false, state: "never", dueAt: null });
  });

  it("refuses use when out of service, whatever the calibration", () => {
    expect(status([cal(10, 365)], false)).toMatchObject({ usable: false, state: "out-of-service", dueAt: null });
    expect(status([], false).state).toBe("out-of-service");
  });

  it("judges by the latest calibration by date, even when it is listed first or last", () => {
    const old = cal(400, 365); // overdue
    const fresh = cal(5, 365); // current
    const freshFailed = cal(2, 365, false);
    expect(status([old, fresh]).state).toBe("current");
    expect(status([fresh, old]).state).toBe("current");
    expect(status([fresh, freshFailed, old]).state).toBe("failed");
    expect(status([freshFailed, fresh]).state).toBe("failed");
  });

  it("does not reorder the caller's list", () => {
    const list = [cal(400, 365), cal(5, 365)];
    const copy = [...list];
    status(list);
    expect(list).toEqual(copy);
  });
});
