/** A permeating run of its own (invented project, cell and burette panel) for tests of readings and their audit trail. */
import { allocateLabNumber } from "@/lib/server/db/allocate-lab-number";
import { withActor } from "@/lib/server/db/transaction";
import { makeProject, makeUser, unique } from "./factories";

const DAY = 86_400_000;
const HOUR = 3_600_000;
const SYSTEM = { id: "system:test" };

/** A run in `state` whose permeation began `startedDaysAgo` days ago, with a burette panel of 31.4 / 31.2 mm² (invented). */
export async function makeRun(options: { state?: "PERMEATING" | "EQUILIBRATING" | "TERMINATED"; startedDaysAgo?: number } = {}) {
  const [technician, other, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
  const project = await makeProject();
  const permeationStartedAt = new Date(Date.now() - (options.startedDaysAgo ?? 4) * DAY);
  const run = await withActor(SYSTEM, async (tx) => {
    const shipment = await tx.shipment.create({ data: { labNumber: await allocateLabNumber(tx, "shipment"), clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "x", receivedAt: new Date(), receivedById: technician.id } });
    const roll = await tx.roll.create({ data: { labNumber: await allocateLabNumber(tx, "roll"), shipmentId: shipment.id, projectId: project.id, rollNumber: unique("r"), lotNumber: "L", product: "GCL", manufacturer: "M", state: "CUT" } });
    const coupon = await tx.coupon.create({ data: { labNumber: await allocateLabNumber(tx, "coupon"), rollId: roll.id, positionInSample: "centre", lengthMm: 300, widthMm: 300, cutById: technician.id, cutAt: new Date() } });
    const specimen = await tx.specimen.create({ data: { labNumber: await allocateLabNumber(tx, "specimen"), couponId: coupon.id, dieDiameterMm: 100, initialThicknessMm: 6, initialMassG: 45, intendedMethodCode: "D5887", preparedById: technician.id, preparedAt: new Date(), state: "UNDER_TEST" } });
    const cell = await tx.equipment.create({ data: { assetTag: unique("CELL").toUpperCase(), kind: "PERMEAMETER_CELL", name: "Test cell", ratedMaxPressurePa: 1_000_000 } });
    const panel = await tx.equipment.create({ data: { assetTag: unique("BP").toUpperCase(), kind: "BURETTE_PANEL", name: "Test burette panel" } });
    const calibration = await tx.calibration.create({
      data: { equipmentId: panel.id, calibratedAt: new Date(Date.now() - 30 * DAY), dueAt: new Date(Date.now() + 300 * DAY), reference: unique("CAL"), performedBy: "Test metrology", values: { inflowBuretteAreaM2: 3.14e-5, outflowBuretteAreaM2: 3.12e-5 }, recordedById: technician.id },
    });
    const created = await tx.run.create({ data: { labNumber: await allocateLabNumber(tx, "run"), specimenId: specimen.id, cellId: cell.id, methodCode: "D5887", state: options.state ?? "PERMEATING", performedById: technician.id } });
    await tx.runEquipment.create({ data: { runId: created.id, equipmentId: panel.id, calibrationId: calibration.id, role: "burette panel" } });
    await tx.runStage.create({ data: { runId: created.id, sequence: 1, kind: "PERMEATION", cellPressurePa: 565_000, influentPressurePa: 530_000, effluentPressurePa: 516_000, startedAt: permeationStartedAt, recordedById: technician.id } });
    return created;
  });
  return { technician, other, qa, run, permeationStartedAt };
}

export const at = (start: Date, hours: number) => new Date(start.getTime() + hours * HOUR).toISOString();
export const gridRow = (takenAt: string, inflow: string, outflow: string, extra: Record<string, string> = {}) => ({
  takenAt, inflowLevelMm: inflow, outflowLevelMm: outflow, influentPressure: "530", effluentPressure: "516", cellPressure: "565", temperatureC: "20,1", ...extra,
});

