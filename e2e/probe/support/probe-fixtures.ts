import { randomBytes } from "node:crypto";
import { inject } from "vitest";
import { createDb, type Db } from "@/lib/server/db/client";
import { withActor } from "@/lib/server/db/transaction";

/*
 * Records for the race probes, written straight into the app's database as its runtime role (the rights
 * the app has), each with unique invented identifiers so that nothing depends on the demo's own records.
 */
const SYSTEM = { id: "system:probe" };
const DAY = 86_400_000;
let client: Db | null = null;
const db = () => (client ??= createDb(inject("appDatabaseUrl")));
const write = <T>(work: Parameters<typeof withActor<T>>[1]) => withActor(SYSTEM, work, { db: db() });

export const tag = (prefix: string) => `${prefix}-${randomBytes(4).toString("hex").toUpperCase()}`;

async function projectOf(organizationCode: string) {
  return db().project.findFirstOrThrow({ where: { clientOrganization: { code: organizationCode } }, select: { id: true, clientOrganizationId: true } });
}

/** A calibrated instrument in service (a burette panel with its two burette areas). */
export async function makeInstrument(kind: "PERMEAMETER_CELL" | "BURETTE_PANEL" | "PRESSURE_TRANSDUCER", recordedById: string) {
  return write(async (tx) => {
    const equipment = await tx.equipment.create({ data: { assetTag: tag(kind.slice(0, 4)), kind, name: `Probe ${kind}`, ratedMaxPressurePa: 1_000_000 } });
    const calibratedAt = new Date(Date.now() - 30 * DAY);
    const values = kind === "BURETTE_PANEL" ? { inflowBuretteAreaM2: 3.14e-5, outflowBuretteAreaM2: 3.12e-5 } : {};
    await tx.calibration.create({ data: { equipmentId: equipment.id, calibratedAt, dueAt: new Date(calibratedAt.getTime() + 365 * DAY), reference: tag("CAL"), performedBy: "Probe metrology", values, recordedById } });
    return equipment;
  });
}

/** A roll, coupon and specimen of a demo client's project; the specimen prepared (ready to mount) or tested. */
export async function makeSpecimen(technicianId: string, state: "PREPARED" | "TESTED" = "PREPARED") {
  const project = await projectOf("MWA");
  return write(async (tx) => {
    const shipment = await tx.shipment.create({ data: { labNumber: tag("S"), clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "Probe carrier", receivedAt: new Date(Date.now() - 3 * DAY), receivedById: technicianId } });
    const roll = await tx.roll.create({ data: { labNumber: tag("R"), shipmentId: shipment.id, projectId: project.id, rollNumber: tag("roll"), lotNumber: "L", product: "Probe GCL", manufacturer: "Probe maker", state: "CUT" } });
    const coupon = await tx.coupon.create({ data: { labNumber: tag("C"), rollId: roll.id, positionInSample: "centre", lengthMm: 300, widthMm: 300, cutById: technicianId, cutAt: new Date(Date.now() - 2 * DAY) } });
    const specimen = await tx.specimen.create({ data: { labNumber: tag("P"), couponId: coupon.id, dieDiameterMm: 100, initialThicknessMm: 6, initialMassG: 45, intendedMethodCode: "D5887", preparedById: technicianId, preparedAt: new Date(Date.now() - DAY), state } });
    return { specimen, projectId: project.id };
  });
}

/** An approved result of a finished run: what a certificate carries. */
export async function makeApprovedResult(technicianId: string, approverId: string) {
  const { specimen, projectId } = await makeSpecimen(technicianId, "TESTED");
  const cell = await makeInstrument("PERMEAMETER_CELL", approverId);
  return write(async (tx) => {
    const run = await tx.run.create({ data: { labNumber: tag("T"), specimenId: specimen.id, cellId: cell.id, methodCode: "D5887", state: "APPROVED", performedById: technicianId, terminatedAt: new Date(), terminationKind: "CRITERIA_MET" } });
    const result = await tx.result.create({ data: { runId: run.id, property: "INDEX_FLUX", value: 2e-9, unit: "m3/m2/s", approvedById: approverId, approvedAt: new Date() } });
    return { projectId, resultId: result.id, runLabNumber: run.labNumber };
  });
}

/** A draft certificate revision holding the given results. */
export async function makeDraftCertificate(projectId: string, resultIds: string[]) {
  const project = await db().project.findUniqueOrThrow({ where: { id: projectId } });
  return write(async (tx) => {
    const certificate = await tx.certificate.create({ data: { number: tag("Q"), projectId, clientOrganizationId: project.clientOrganizationId } });
    const revision = await tx.certificateRevision.create({ data: { certificateId: certificate.id, revision: 1, status: "DRAFT", verificationCode: tag("V"), results: { create: resultIds.map((resultId) => ({ resultId })) } } });
    return { certificateId: certificate.id, number: certificate.number, revisionId: revision.id };
  });
}

/** An issued certificate (signed first, as the database asks), ready to be corrected by a revision. */
export async function makeIssuedCertificate(projectId: string, resultIds: string[], signerId: string) {
  const draft = await makeDraftCertificate(projectId, resultIds);
  await write(async (tx) => {
    await tx.signature.create({ data: { revisionId: draft.revisionId, signerId, signerRole: "QA_MANAGER", meaning: "Probe signature" } });
    await tx.certificateRevision.update({ where: { id: draft.revisionId }, data: { status: "ISSUED", issuedAt: new Date(), pdfSha256: "0".repeat(64) } });
  });
  return draft;
}

/** Runs holding a cell or a specimen now, and live certificates holding a result: what the races must leave at one. */
export async function countHolders(target: { cellId?: string; specimenId?: string; resultId?: string; certificateId?: string }) {
  const active = ["SET_UP", "SATURATING", "EQUILIBRATING", "PERMEATING"] as const;
  if (target.cellId) return db().run.count({ where: { cellId: target.cellId, state: { in: [...active] } } });
  if (target.specimenId) return db().run.count({ where: { specimenId: target.specimenId, state: { in: [...active] } } });
  if (target.resultId) return db().certificate.count({ where: { revisions: { some: { status: { in: ["DRAFT", "ISSUED"] }, results: { some: { resultId: target.resultId } } } } } });
  return db().certificateRevision.count({ where: { certificateId: target.certificateId, status: { in: ["DRAFT", "ISSUED"] } } });
}
