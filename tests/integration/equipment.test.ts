import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { withActor } from "@/lib/server/db/transaction";
import { findEquipmentStatuses } from "@/lib/server/equipment/find-usable-equipment";
import { getEquipment } from "@/lib/server/equipment/get-equipment";
import { listEquipment } from "@/lib/server/equipment/list-equipment";
import { recordCalibration } from "@/lib/server/equipment/record-calibration";
import { registerEquipment } from "@/lib/server/equipment/register-equipment";
import { setEquipmentStatus } from "@/lib/server/equipment/set-equipment-status";
import { enteredPressureToPa } from "@/lib/units/pressure-entry";
import { readBuretteAreasM2 } from "@/lib/validation/equipment";
import { codeOf } from "../support/refusals";
import { db, makeProject, makeUser, unique } from "../support/factories";

const DAY = 86_400_000;


async function fieldErrorsOf(promise: Promise<unknown>): Promise<Record<string, string>> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof AppError) return error.fieldErrors;
    throw error;
  }
  throw new Error("expected the operation to fail");
}

const tag = (prefix: string) => unique(prefix).toUpperCase();
const isoDay = (date: Date) => date.toISOString().slice(0, 10);

/** Registers an instrument through the operation, as the administrator would. */
async function register(admin: CurrentUser, overrides: Record<string, unknown> = {}) {
  return registerEquipment({
    actor: admin,
    input: { assetTag: tag("CELL"), kind: "PERMEAMETER_CELL", name: "Test cell", serialNumber: "SN-1", ratedMaxPressure: "1000", pressureUnit: "KPA", ...overrides },
  });
}

/** A calibration done `daysAgo` days ago, valid for `validDays`. */
function calibration(equipmentId: string, daysAgo: number, validDays = 365, extra: Record<string, unknown> = {}) {
  const calibratedAt = new Date(Date.now() - daysAgo * DAY);
  return { equipmentId, calibratedAt: isoDay(calibratedAt), dueAt: isoDay(new Date(calibratedAt.getTime() + validDays * DAY)), reference: unique("CAL"), performedBy: "Test metrology", passed: true, ...extra };
}

/** The smallest chain that lets a run point at a cell and another instrument (shipment, roll, coupon, specimen). */
async function makeRunUsing(cellId: string, panel: { id: string; calibrationId: string }) {
  const technician = await makeUser("TECHNICIAN");
  const project = await makeProject();
  return withActor(technician, async (tx) => {
    await tx.testMethod.upsert({ where: { code: "D5887" }, update: {}, create: { code: "D5887", title: "Index flux", defaults: {} } });
    const shipment = await tx.shipment.create({ data: { labNumber: unique("S"), clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "Carrier", receivedAt: new Date(), receivedById: technician.id } });
    const roll = await tx.roll.create({ data: { labNumber: unique("R"), shipmentId: shipment.id, projectId: project.id, rollNumber: unique("roll"), lotNumber: "L1", product: "GCL", manufacturer: "Maker" } });
    const coupon = await tx.coupon.create({ data: { labNumber: unique("C"), rollId: roll.id, positionInSample: "centre", lengthMm: 300, widthMm: 300, cutById: technician.id, cutAt: new Date() } });
    const specimen = await tx.specimen.create({ data: { labNumber: unique("SP"), couponId: coupon.id, dieDiameterMm: 100, initialThicknessMm: 7, initialMassG: 60, intendedMethodCode: "D5887", preparedById: technician.id, preparedAt: new Date() } });
    return tx.run.create({
      data: {
        labNumber: unique("RUN"), specimenId: specimen.id, cellId, methodCode: "D5887", performedById: technician.id,
        equipment: { create: [{ equipmentId: panel.id, calibrationId: panel.calibrationId, role: "burette panel" }] },
      },
    });
  });
}

describe("equipment register", () => {
  it("registers a cell, records a calibration, and then shows it as current and usable", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const cell = await register(admin, { assetTag: ` ${tag("cell").toLowerCase()} `, ratedMaxPressure: "145", pressureUnit: "PSI" });
    expect(cell.assetTag).toMatch(/^CELL-[0-9A-F]{8}$/); // trimmed and upper-cased
    const stored = await db().equipment.findUniqueOrThrow({ where: { id: cell.id } });
    expect(stored.ratedMaxPressurePa).toBeCloseTo(enteredPressureToPa(145, "PSI"), 6);
    expect(stored.ratedMaxPressurePa).toBeCloseTo(999_739.81, 2); // 145 psi × 6894.757 293 Pa/psi (NIST SP 811), worked by hand

    let listed = (await listEquipment({ actor: admin })).find((e) => e.id === cell.id)!;
    expect(listed.calibration).toMatchObject({ usable: false, state: "never" });

    await recordCalibration({ actor: admin, input: calibration(cell.id, 10) });
    const technician = await makeUser("TECHNICIAN");
    listed = (await listEquipment({ actor: technician })).find((e) => e.id === cell.id)!;
    expect(listed).toMatchObject({ assetTag: cell.assetTag, kind: "PERMEAMETER_CELL", status: "IN_SERVICE", calibration: { usable: true, state: "current" } });
    expect(listed.lastCalibration).toMatchObject({ passed: true });
    expect((await listEquipment({ actor: technician, kind: "THERMOMETER" })).some((e) => e.id === cell.id)).toBe(false);

    const item = await getEquipment({ actor: technician, assetTag: cell.assetTag.toLowerCase() });
    expect(item.calibrations).toHaveLength(1);
    expect(item.calibration.state).toBe("current");
    expect(item.runs).toEqual([]);
  });

  it("makes overdue, failed and out-of-service equipment unusable for a new run", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const overdue = await register(admin);
    await recordCalibration({ actor: admin, input: calibration(overdue.id, 400, 365) });
    const failed = await register(admin);
    await recordCalibration({ actor: admin, input: calibration(failed.id, 1, 365, { passed: false }) });
    const parked = await register(admin);
    await recordCalibration({ actor: admin, input: calibration(parked.id, 1) });
    await setEquipmentStatus({ actor: admin, input: { equipmentId: parked.id, version: parked.version, status: "OUT_OF_SERVICE", reason: "Checked by the administrator" } });

    const statuses = await findEquipmentStatuses({ ids: [overdue.id, failed.id, parked.id, "no-such-id"], now: new Date() });
    expect(statuses.get(overdue.id)?.status).toMatchObject({ usable: false, state: "overdue" });
    expect(statuses.get(failed.id)?.status).toMatchObject({ usable: false, state: "failed" });
    expect(statuses.get(parked.id)?.status).toMatchObject({ usable: false, state: "out-of-service" });
    expect(statuses.has("no-such-id")).toBe(false);
  });

  it("refuses a burette panel's calibration without both burette areas, and stores them in m²", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const panel = await register(admin, { assetTag: tag("BP"), kind: "BURETTE_PANEL", name: "Burette panel" });
    // The form's kind is not trusted: the server applies the rule with the kind on record.
    const errors = await fieldErrorsOf(recordCalibration({ actor: admin, input: { ...calibration(panel.id, 5), equipmentKind: "THERMOMETER", inflowBuretteAreaMm2: "31.4" } }));
    expect(Object.keys(errors)).toEqual(["outflowBuretteAreaMm2"]);
    expect(Object.keys(await fieldErrorsOf(recordCalibration({ actor: admin, input: { ...calibration(panel.id, 5), equipmentKind: "BURETTE_PANEL" } })))).toEqual(
      expect.arrayContaining(["inflowBuretteAreaMm2", "outflowBuretteAreaMm2"]),
    );
    expect(await codeOf(recordCalibration({ actor: admin, input: { ...calibration(panel.id, 5), inflowBuretteAreaMm2: "0.5", outflowBuretteAreaMm2: "31" } }))).toBe("INVALID_INPUT");
    expect(await db().calibration.count({ where: { equipmentId: panel.id } })).toBe(0);

    // An older calibration recorded after a newer one: the latest by date still wins.
    await recordCalibration({ actor: admin, input: { ...calibration(panel.id, 5), inflowBuretteAreaMm2: "31.42", outflowBuretteAreaMm2: "31,2" } });
    await recordCalibration({ actor: admin, input: { ...calibration(panel.id, 200), inflowBuretteAreaMm2: "30", outflowBuretteAreaMm2: "30" } });
    const statuses = await findEquipmentStatuses({ ids: [panel.id], now: new Date() });
    const entry = statuses.get(panel.id)!;
    expect(entry).toMatchObject({ assetTag: panel.assetTag, kind: "BURETTE_PANEL", ratedMaxPressurePa: 1_000_000, status: { usable: true, state: "current" } });
    const latest = await db().calibration.findFirstOrThrow({ where: { equipmentId: panel.id }, orderBy: { calibratedAt: "desc" } });
    expect(entry.latestCalibrationId).toBe(latest.id);
    const areas = readBuretteAreasM2(entry.latestValues)!;
    expect(areas.inflowBuretteAreaM2).toBeCloseTo(31.42e-6, 12);
    expect(areas.outflowBuretteAreaM2).toBeCloseTo(31.2e-6, 12);
  });

  it("refuses a due date before the calibration date", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const cell = await register(admin);
    const errors = await fieldErrorsOf(recordCalibration({ actor: admin, input: calibration(cell.id, 10, -5) }));
    expect(errors).toHaveProperty("dueAt");
  });

  it("lets only the administrator register equipment and record calibrations", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const technician = await makeUser("TECHNICIAN");
    const qa = await makeUser("QA_MANAGER");
    const assetTag = tag("CELL");
    expect(await codeOf(register(technician, { assetTag }))).toBe("FORBIDDEN");
    expect(await codeOf(register(qa, { assetTag }))).toBe("FORBIDDEN");
    expect(await db().equipment.findUnique({ where: { assetTag } })).toBeNull();
    const cell = await register(admin);
    expect(await codeOf(recordCalibration({ actor: technician, input: calibration(cell.id, 1) }))).toBe("FORBIDDEN");
    expect(await codeOf(setEquipmentStatus({ actor: technician, input: { equipmentId: cell.id, version: 1, status: "RETIRED", reason: "Checked by the administrator" } }))).toBe("FORBIDDEN");
  });

  it("refuses a duplicate asset tag with a message on the field", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const first = await register(admin);
    let caught: unknown;
    try {
      await register(admin, { assetTag: first.assetTag.toLowerCase(), name: "Another cell" });
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(AppError);
    expect((caught as AppError).code).toBe("CONFLICT");
    expect((caught as AppError).fieldErrors).toHaveProperty("assetTag");
    expect(await db().equipment.count({ where: { assetTag: first.assetTag } })).toBe(1);
  });

  it("refuses a status change made on a stale version, and a calibration for retired equipment", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const cell = await register(admin);
    await setEquipmentStatus({ actor: admin, input: { equipmentId: cell.id, version: cell.version, status: "OUT_OF_SERVICE", reason: "Checked by the administrator" } });
    expect(await codeOf(setEquipmentStatus({ actor: admin, input: { equipmentId: cell.id, version: cell.version, status: "IN_SERVICE", reason: "Checked by the administrator" } }))).toBe("CONFLICT");
    expect(await codeOf(setEquipmentStatus({ actor: admin, input: { equipmentId: "no-such-id", version: 1, status: "IN_SERVICE", reason: "Checked by the administrator" } }))).toBe("NOT_FOUND");
    const retired = await setEquipmentStatus({ actor: admin, input: { equipmentId: cell.id, version: cell.version + 1, status: "RETIRED", reason: "Checked by the administrator" } });
    expect(retired).toMatchObject({ status: "RETIRED", version: cell.version + 2 });
    expect(await codeOf(recordCalibration({ actor: admin, input: calibration(cell.id, 1) }))).toBe("ILLEGAL_TRANSITION");
  });

  it("keeps the calibration insert in the audit trail with the administrator as actor", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const cell = await register(admin);
    const input = calibration(cell.id, 3);
    const recorded = await recordCalibration({ actor: admin, input });
    const rows = await db().auditLog.findMany({ where: { tableName: "Calibration", rowId: recorded.id }, orderBy: { id: "asc" } });
    expect(rows.map((r) => [r.operation, r.actorId])).toEqual([["INSERT", admin.id]]);
    expect(rows[0]!.after).toMatchObject({ equipmentId: cell.id, reference: input.reference, passed: true, recordedById: admin.id });
    const equipmentRows = await db().auditLog.findMany({ where: { tableName: "Equipment", rowId: cell.id } });
    expect(equipmentRows.map((r) => [r.operation, r.actorId])).toEqual([["INSERT", admin.id]]);
  });

  it("lists the runs that used an instrument, as cell or as another instrument, and reads inside a transaction", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const cell = await register(admin);
    const panel = await register(admin, { assetTag: tag("BP"), kind: "BURETTE_PANEL", name: "Burette panel" });
    const panelCal = await recordCalibration({ actor: admin, input: { ...calibration(panel.id, 5), inflowBuretteAreaMm2: "31.4", outflowBuretteAreaMm2: "31.2" } });
    const run = await makeRunUsing(cell.id, { id: panel.id, calibrationId: panelCal.id });

    const asCell = await getEquipment({ actor: admin, assetTag: cell.assetTag });
    expect(asCell.runs.map((r) => [r.labNumber, r.role])).toEqual([[run.labNumber, "cell"]]);
    const asPanel = await getEquipment({ actor: admin, assetTag: panel.assetTag });
    expect(asPanel.runs).toMatchObject([{ labNumber: run.labNumber, role: "burette panel", calibrationId: panelCal.id }]);

    const inTx = await withActor(admin, (tx) => findEquipmentStatuses({ ids: [cell.id, panel.id], now: new Date(), tx }));
    expect(inTx.get(cell.id)?.status.state).toBe("never");
    expect(inTx.get(panel.id)?.latestCalibrationId).toBe(panelCal.id);
  });
});
