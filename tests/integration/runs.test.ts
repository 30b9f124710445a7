import { describe, expect, it } from "vitest";
import { withActor } from "@/lib/server/db/transaction";
import { assignSpecimenToCell } from "@/lib/server/runs/assign-specimen-to-cell";
import { grantCalibrationOverride } from "@/lib/server/runs/grant-calibration-override";
import { recordPostTest } from "@/lib/server/runs/record-post-test";
import { recordStage } from "@/lib/server/runs/record-stage";
import { submitRun } from "@/lib/server/runs/submit-run";
import { terminateRun } from "@/lib/server/runs/terminate-run";
import { failure } from "../support/refusals";
import { db, makeProject, makeUser, unique } from "../support/factories";
import { makeInstrument } from "../support/make-instrument";

const DAY = 86_400_000;
const SYSTEM = { id: "system:test" };


/** A specimen prepared 8 days ago from a roll received 10 days ago, so its run may be dated back a week. */
async function makePreparedSpecimen(technicianId: string) {
  const project = await makeProject();
  const ago = (days: number) => new Date(Date.now() - days * DAY);
  return withActor(SYSTEM, async (tx) => {
    const shipment = await tx.shipment.create({ data: { labNumber: unique("S"), clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "x", receivedAt: ago(10), receivedById: technicianId } });
    const roll = await tx.roll.create({ data: { labNumber: unique("R"), shipmentId: shipment.id, projectId: project.id, rollNumber: unique("r"), lotNumber: "L", product: "GCL", manufacturer: "M", state: "CUT" } });
    const coupon = await tx.coupon.create({ data: { labNumber: unique("C"), rollId: roll.id, positionInSample: "centre", lengthMm: 300, widthMm: 300, cutById: technicianId, cutAt: ago(9) } });
    return tx.specimen.create({ data: { labNumber: unique("P"), couponId: coupon.id, dieDiameterMm: 100, initialThicknessMm: 6, initialMassG: 45, intendedMethodCode: "D5887", preparedById: technicianId, preparedAt: ago(8) } });
  });
}

async function setUp() {
  const [technician, other, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
  const [cell, staleCell, panel, transducer, specimen] = await Promise.all([
    makeInstrument("PERMEAMETER_CELL"),
    makeInstrument("PERMEAMETER_CELL", { calibratedDaysAgo: 400 }),
    makeInstrument("BURETTE_PANEL", { values: { inflowBuretteAreaM2: 3.14e-5, outflowBuretteAreaM2: 3.12e-5 } }),
    makeInstrument("PRESSURE_TRANSDUCER", { ratedMaxPressurePa: 700_000 }),
    makePreparedSpecimen(technician.id),
  ]);
  const assignInput = (cellId: string) => ({ specimenId: specimen.id, cellId, burettePanelId: panel.id, transducerId: transducer.id, methodCode: "D5887", pressureUnit: "KPA", effectiveStress: "34.5", mountedAt: new Date(Date.now() - 7 * DAY).toISOString() });
  return { technician, other, qa, cell, staleCell, panel, transducer, specimen, assignInput };
}

/** Readings of a steady run: 2e-9 m3/m2/s through a 100 mm specimen every 6 h (invented for the test). */
async function addSteadyReadings(runId: string, technicianId: string, count: number) {
  const areaM2 = (Math.PI * 0.1 ** 2) / 4;
  const stepMl = 2e-9 * areaM2 * 21_600 * 1e6;
  await withActor(SYSTEM, (tx) =>
    tx.reading.createMany({
      data: Array.from({ length: count }, (_, i) => ({
        runId, sequence: i + 1, takenAt: new Date(Date.now() - (count - i) * 21_600_000), elapsedS: i * 21_600,
        inflowCumulativeMl: i * stepMl, outflowCumulativeMl: i * stepMl * 0.98, headPa: 14_000, temperatureC: 20, recordedById: technicianId,
      })),
    }),
  );
}

describe("cell assignment and calibration", () => {
  it("refuses a cell past its calibration date, then allows it once a QA manager has granted an override, which the run records", async () => {
    const { technician, qa, staleCell, assignInput, specimen } = await setUp();
    const refused = await failure(assignSpecimenToCell({ actor: technician, input: assignInput(staleCell.id) }));
    expect(refused.code).toBe("ILLEGAL_TRANSITION");
    expect(refused.message).toMatch(new RegExp(`${staleCell.assetTag} was due for calibration on \\d{4}-\\d{2}-\\d{2}\\..*ask a QA manager`));
    expect((await db().specimen.findUniqueOrThrow({ where: { id: specimen.id } })).state).toBe("PREPARED");

    expect((await failure(grantCalibrationOverride({ actor: technician, input: { equipmentId: staleCell.id, reason: "Calibration booked for Friday", validDays: 3 } }))).code).toBe("FORBIDDEN");
    await grantCalibrationOverride({ actor: qa, input: { equipmentId: staleCell.id, reason: "Calibration booked for Friday", validDays: 3 } });
    const run = await assignSpecimenToCell({ actor: technician, input: assignInput(staleCell.id) });
    const stored = await db().run.findUniqueOrThrow({ where: { id: run.id }, include: { equipment: true } });
    expect(stored).toMatchObject({ state: "SET_UP", performedById: technician.id, calibrationOverrideById: qa.id, effectiveStressPa: 34_500 });
    expect(stored.calibrationOverrideReason).toBe(`${staleCell.assetTag}: Calibration booked for Friday`);
    expect(stored.equipment.map((e) => e.role).sort()).toEqual(["burette panel", "permeameter cell", "pressure transducer"]);
    expect(stored.equipment.every((e) => e.calibrationId)).toBe(true);
    expect((await db().specimen.findUniqueOrThrow({ where: { id: specimen.id } })).state).toBe("ASSIGNED");
  });

  it("does not put two runs in one cell", async () => {
    const { technician, cell, assignInput } = await setUp();
    await assignSpecimenToCell({ actor: technician, input: assignInput(cell.id) });
    const second = await makePreparedSpecimen(technician.id);
    const error = await failure(assignSpecimenToCell({ actor: technician, input: { ...assignInput(cell.id), specimenId: second.id } }));
    expect(error.code).toBe("CONFLICT");
    expect(error.message).toMatch(/That cell is holding run T\d{2}-\d{5}/);
  });
});

describe("stages, termination, post-test and submission", () => {
  it("warns on a broken confining margin until acknowledged, refuses a pressure above a rating, and keeps the run's steps in order", async () => {
    const { technician, other, cell, assignInput, specimen } = await setUp();
    const run = await assignSpecimenToCell({ actor: technician, input: assignInput(cell.id) });
    const stage = { runId: run.id, version: 1, kind: "SATURATION", pressureUnit: "KPA", cellPressure: "330", influentPressure: "310", effluentPressure: "310", startedAt: new Date(Date.now() - 6 * DAY).toISOString() };

    expect((await failure(recordStage({ actor: other, input: stage }))).code).toBe("FORBIDDEN");
    const warned = await failure(recordStage({ actor: technician, input: stage }));
    expect(warned.message).toMatch(/exceeds the higher line pressure by 20\.0 kPa, less than the 35 kPa confining margin/);
    expect(warned.fieldErrors).toHaveProperty("acknowledgeMargin");
    expect(await db().runStage.count({ where: { runId: run.id } })).toBe(0);

    const over = await failure(recordStage({ actor: technician, input: { ...stage, cellPressure: "760", influentPressure: "700", effluentPressure: "700" } }));
    expect(over.message).toMatch(/is rated to 700 kPa; 760 kPa would exceed it/);

    await recordStage({ actor: technician, input: { ...stage, acknowledgeMargin: true } });
    expect(await db().runStage.findFirstOrThrow({ where: { runId: run.id } })).toMatchObject({ marginAcknowledged: true, cellPressurePa: 330_000, recordedById: technician.id });

    const early = await failure(terminateRun({ actor: technician, input: { runId: run.id, version: 2, kind: "EARLY_END", reason: "Membrane leak" } }));
    expect(early.message).toMatch(/A run that is saturating cannot terminate the run/);

    await recordStage({ actor: technician, input: { ...stage, version: 2, kind: "EQUILIBRATION", cellPressure: "552", influentPressure: "517", effluentPressure: "517", startedAt: new Date(Date.now() - 5 * DAY).toISOString() } });
    await recordStage({ actor: technician, input: { ...stage, version: 3, kind: "PERMEATION", cellPressure: "552", influentPressure: "531", effluentPressure: "517", startedAt: new Date(Date.now() - 3 * DAY).toISOString() } });
    expect((await db().specimen.findUniqueOrThrow({ where: { id: specimen.id } })).state).toBe("UNDER_TEST");
    const stages = await db().runStage.findMany({ where: { runId: run.id }, orderBy: { sequence: "asc" } });
    expect(stages.map((s) => [s.kind, s.endedAt !== null])).toEqual([["SATURATION", true], ["EQUILIBRATION", true], ["PERMEATION", false]]);

    // Criteria not met with three readings: terminating on criteria is refused with the reasons.
    await addSteadyReadings(run.id, technician.id, 3);
    const notYet = await failure(terminateRun({ actor: technician, input: { runId: run.id, version: 4, kind: "CRITERIA_MET" } }));
    expect(notYet.message).toMatch(/^The termination criteria are not met yet: /);

  });

  it("terminates when the saved readings meet the criteria, records post-test data and submits", async () => {
    const { technician, cell, assignInput, specimen } = await setUp();
    const run = await assignSpecimenToCell({ actor: technician, input: assignInput(cell.id) });
    const base = { runId: run.id, pressureUnit: "KPA" };
    const daysAgo = (d: number) => new Date(Date.now() - d * DAY).toISOString();
    await recordStage({ actor: technician, input: { ...base, version: 1, kind: "SATURATION", cellPressure: "345", influentPressure: "310", effluentPressure: "310", startedAt: daysAgo(7) } });
    await recordStage({ actor: technician, input: { ...base, version: 2, kind: "EQUILIBRATION", cellPressure: "552", influentPressure: "517", effluentPressure: "517", startedAt: daysAgo(6) } });
    await recordStage({ actor: technician, input: { ...base, version: 3, kind: "PERMEATION", cellPressure: "552", influentPressure: "531", effluentPressure: "517", startedAt: daysAgo(4) } });
    await addSteadyReadings(run.id, technician.id, 8);

    expect((await failure(submitRun({ actor: technician, input: { runId: run.id, version: 4 } }))).code).toBe("ILLEGAL_TRANSITION");
    // The end of permeation is when it happened, entered by the technician: not before the last reading
    // (taken 6 h ago), not in the future; nothing is saved when refused.
    const hoursAgo = (h: number) => new Date(Date.now() - h * 3_600_000);
    const tooEarly = await failure(terminateRun({ actor: technician, input: { runId: run.id, version: 4, kind: "CRITERIA_MET", endedAt: hoursAgo(7).toISOString() } }));
    expect(tooEarly.fieldErrors.endedAt).toMatch(/^The end of permeation \(.+\) is before reading 8 was taken \(.+\); it cannot be earlier than that\.$/);
    const ahead = await failure(terminateRun({ actor: technician, input: { runId: run.id, version: 4, kind: "CRITERIA_MET", endedAt: hoursAgo(-2).toISOString() } }));
    expect(ahead.fieldErrors).toHaveProperty("endedAt");
    expect((await db().run.findUniqueOrThrow({ where: { id: run.id } })).terminatedAt).toBeNull();
    const endedAt = new Date(Math.floor(hoursAgo(5).getTime() / 60_000) * 60_000);
    await terminateRun({ actor: technician, input: { runId: run.id, version: 4, kind: "CRITERIA_MET", endedAt: endedAt.toISOString() } });
    expect((await db().run.findUniqueOrThrow({ where: { id: run.id } })).terminatedAt).toEqual(endedAt);
    expect((await db().runStage.findFirstOrThrow({ where: { runId: run.id, kind: "PERMEATION" } })).endedAt).toEqual(endedAt);
    const tested = await db().custodyEvent.findFirstOrThrow({ where: { specimenId: specimen.id, action: "TESTED" } });
    expect(tested.occurredAt).toEqual(endedAt);
    expect((await db().specimen.findUniqueOrThrow({ where: { id: specimen.id } })).state).toBe("TESTED");
    expect((await failure(recordPostTest({ actor: technician, input: { runId: run.id, version: 5, thicknessMm: "0", finalMassG: "70" } }))).fieldErrors).toHaveProperty("thicknessMm");
    await recordPostTest({ actor: technician, input: { runId: run.id, version: 5, thicknessMm: "5.9", finalMassG: "71.2", observations: "Even hydration" } });
    await submitRun({ actor: technician, input: { runId: run.id, version: 6 } });
    expect(await db().run.findUniqueOrThrow({ where: { id: run.id } })).toMatchObject({ state: "SUBMITTED", terminationKind: "CRITERIA_MET", postTestThicknessMm: 5.9 });
  });
});

describe("pressure checks that know the stage", () => {
  // ASTM D5887 permeation as commonly run (shared/DOMAIN.md, common practice): cell about 550 kPa, influent about
  // 530 kPa, effluent about 515 kPa: the cell only about 20 kPa above the influent line, which is the method.
  async function atPermeation() {
    const { technician, cell, assignInput } = await setUp();
    const run = await assignSpecimenToCell({ actor: technician, input: assignInput(cell.id) });
    const daysAgo = (d: number) => new Date(Date.now() - d * DAY).toISOString();
    const base = { runId: run.id, pressureUnit: "KPA" };
    await recordStage({ actor: technician, input: { ...base, version: 1, kind: "SATURATION", cellPressure: "345", influentPressure: "310", effluentPressure: "310", startedAt: daysAgo(5) } });
    await recordStage({ actor: technician, input: { ...base, version: 2, kind: "EQUILIBRATION", cellPressure: "550", influentPressure: "515", effluentPressure: "515", startedAt: daysAgo(4) } });
    const permeation = (cell: string, influent: string, effluent: string, startedDaysAgo = 2) => ({ ...base, version: 3, kind: "PERMEATION", cellPressure: cell, influentPressure: influent, effluentPressure: effluent, startedAt: daysAgo(startedDaysAgo) });
    return { technician, run, permeation };
  }

  it("the method's permeation pressures after a two-day hold are no departure and no deviation; psi entry too", async () => {
    const { technician, run, permeation } = await atPermeation();
    // 80 / 77 / 75 psi × 6.894757 kPa/psi (NIST SP 811) = 551.6 / 530.9 / 517.1 kPa: within ±10 kPa of the method.
    const saved = await recordStage({ actor: technician, input: { ...permeation("80", "77", "75"), pressureUnit: "PSI" } });
    expect(saved.marginWarning).toBeNull();
    const stage = await db().runStage.findFirstOrThrow({ where: { runId: run.id, kind: "PERMEATION" } });
    expect(stage).toMatchObject({ marginAcknowledged: false, departureNote: null });
    const { runDeviations } = await import("@/lib/runs/deviations");
    const stages = await db().runStage.findMany({ where: { runId: run.id } });
    expect(runDeviations({ terminationKind: null, terminationReason: null, calibrationOverrideReason: null, stages, checklist: [], correctedReadings: 0 })).toEqual([]);
  });

  it("a real departure needs acknowledging and becomes a deviation: pressures off the method, the cell too close to the influent line, a short hold", async () => {
    const { technician, run, permeation } = await atPermeation();
    const off = await failure(recordStage({ actor: technician, input: permeation("566", "531", "517") }));
    expect(off.message).toBe("The method prescribes permeation at cell 550 kPa (± 10 kPa); cell 566 kPa is outside it.");
    expect(off.details).toMatchObject({ marginWarning: true, rules: ["permeation-pressure"] });
    const close = await failure(recordStage({ actor: technician, input: permeation("545", "538", "515") }));
    expect(close.message).toMatch(/The cell pressure is 7 kPa above the influent line, less than the 10 kPa the method requires in permeation/);
    const short = await failure(recordStage({ actor: technician, input: permeation("550", "530", "515", 3.5) }));
    expect(short.message).toBe("The equilibration hold lasted 12 h, less than the 48 h the method asks for.");
    expect(await db().runStage.count({ where: { runId: run.id, kind: "PERMEATION" } })).toBe(0);

    await recordStage({ actor: technician, input: { ...permeation("566", "531", "517"), acknowledgeMargin: true } });
    const stages = await db().runStage.findMany({ where: { runId: run.id }, orderBy: { sequence: "asc" } });
    expect(stages[2]).toMatchObject({ marginAcknowledged: true, departureNote: "The method prescribes permeation at cell 550 kPa (± 10 kPa); cell 566 kPa is outside it." });
    const { runDeviations } = await import("@/lib/runs/deviations");
    expect(runDeviations({ terminationKind: null, terminationReason: null, calibrationOverrideReason: null, stages, checklist: [], correctedReadings: 0 })).toEqual([
      "Stage 3 (permeation) departed from the method, acknowledged by the technician: The method prescribes permeation at cell 550 kPa (± 10 kPa); cell 566 kPa is outside it.",
    ]);
  });

  it("a pressure above a rating is refused even when acknowledged", async () => {
    const { technician, run, permeation } = await atPermeation();
    // The test transducer is rated to 700 kPa.
    const refused = await failure(recordStage({ actor: technician, input: { ...permeation("720", "530", "515"), acknowledgeMargin: true } }));
    expect(refused.message).toMatch(/^Refused: .* is rated to 700 kPa; 720 kPa would exceed it\. Never exceed an instrument's rated pressure\.$/);
    expect(await db().runStage.count({ where: { runId: run.id, kind: "PERMEATION" } })).toBe(0);
  });
});
