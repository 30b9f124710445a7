import { describe, expect, it } from "vitest";
import { createCertificateDraft } from "@/lib/server/certificates/create-certificate-draft";
import { reviseCertificate } from "@/lib/server/certificates/revise-certificate";
import { isUniqueViolation } from "@/lib/server/db/database-fault";
import { withActor } from "@/lib/server/db/transaction";
import { logShipment } from "@/lib/server/intake/log-shipment";
import { assignSpecimenToCell } from "@/lib/server/runs/assign-specimen-to-cell";
import { failure } from "../support/refusals";
import { db, makeProject, makeStorageLocation, makeUser, unique } from "../support/factories";

const SYSTEM = { id: "system:test" };
const DAY = 86_400_000;

async function makeInstrument(kind: "PERMEAMETER_CELL" | "BURETTE_PANEL" | "PRESSURE_TRANSDUCER", recordedById: string) {
  return withActor(SYSTEM, async (tx) => {
    const equipment = await tx.equipment.create({ data: { assetTag: unique(kind.slice(0, 4)).toUpperCase(), kind, name: `Test ${kind}`, ratedMaxPressurePa: 1_000_000 } });
    const values = kind === "BURETTE_PANEL" ? { inflowBuretteAreaM2: 3.14e-5, outflowBuretteAreaM2: 3.12e-5 } : {};
    await tx.calibration.create({ data: { equipmentId: equipment.id, calibratedAt: new Date(Date.now() - 30 * DAY), dueAt: new Date(Date.now() + 300 * DAY), reference: unique("CAL"), performedBy: "Test metrology", values, recordedById } });
    return equipment;
  });
}

async function makeSpecimen(technicianId: string, state: "PREPARED" | "TESTED" = "PREPARED") {
  const project = await makeProject();
  return withActor(SYSTEM, async (tx) => {
    const shipment = await tx.shipment.create({ data: { labNumber: unique("S"), clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "x", receivedAt: new Date(), receivedById: technicianId } });
    const roll = await tx.roll.create({ data: { labNumber: unique("R"), shipmentId: shipment.id, projectId: project.id, rollNumber: unique("r"), lotNumber: "L", product: "GCL", manufacturer: "M", state: "CUT" } });
    const coupon = await tx.coupon.create({ data: { labNumber: unique("C"), rollId: roll.id, positionInSample: "centre", lengthMm: 300, widthMm: 300, cutById: technicianId, cutAt: new Date() } });
    const specimen = await tx.specimen.create({ data: { labNumber: unique("P"), couponId: coupon.id, dieDiameterMm: 100, initialThicknessMm: 6, initialMassG: 45, intendedMethodCode: "D5887", preparedById: technicianId, preparedAt: new Date(), state } });
    return { specimen, project };
  });
}

async function makeApprovedResult(technicianId: string, qaId: string) {
  const { specimen, project } = await makeSpecimen(technicianId, "TESTED");
  const cell = await makeInstrument("PERMEAMETER_CELL", qaId);
  return withActor(SYSTEM, async (tx) => {
    const run = await tx.run.create({ data: { labNumber: unique("T"), specimenId: specimen.id, cellId: cell.id, methodCode: "D5887", state: "APPROVED", performedById: technicianId } });
    const result = await tx.result.create({ data: { runId: run.id, property: "INDEX_FLUX", value: 2e-9, unit: "m3/m2/s", approvedById: qaId, approvedAt: new Date() } });
    return { result, project, run };
  });
}

describe("invariants kept by the database", () => {
  it("one active run per cell: two technicians at the same moment get one run, and the other the run that has the cell", async () => {
    const [tech1, tech2, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const [cell, panel, transducer] = await Promise.all([makeInstrument("PERMEAMETER_CELL", qa.id), makeInstrument("BURETTE_PANEL", qa.id), makeInstrument("PRESSURE_TRANSDUCER", qa.id)]);
    const [a, b] = await Promise.all([makeSpecimen(tech1.id), makeSpecimen(tech2.id)]);
    const input = (specimenId: string) => ({ specimenId, cellId: cell.id, burettePanelId: panel.id, transducerId: transducer.id, methodCode: "D5887", pressureUnit: "KPA", mountedAt: new Date().toISOString() });
    const outcomes = await Promise.allSettled([assignSpecimenToCell({ actor: tech1, input: input(a.specimen.id) }), assignSpecimenToCell({ actor: tech2, input: input(b.specimen.id) })]);
    const won = outcomes.filter((o) => o.status === "fulfilled");
    expect(won).toHaveLength(1);
    const winner = (won[0] as PromiseFulfilledResult<{ labNumber: string }>).value.labNumber;
    const lost = (outcomes.find((o) => o.status === "rejected") as PromiseRejectedResult).reason;
    expect(lost.code).toBe("CONFLICT");
    expect(lost.message).toContain(winner);
  });

  it("the unique indexes hold even against a write that skips the app's checks", async () => {
    const [tech, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const cell = await makeInstrument("PERMEAMETER_CELL", qa.id);
    const [a, b] = await Promise.all([makeSpecimen(tech.id), makeSpecimen(tech.id)]);
    const run = (specimenId: string, state: "PERMEATING" | "APPROVED") => withActor(SYSTEM, (tx) => tx.run.create({ data: { labNumber: unique("T"), specimenId, cellId: cell.id, methodCode: "D5887", state, performedById: tech.id } }));
    await run(a.specimen.id, "PERMEATING");
    expect(isUniqueViolation(await run(b.specimen.id, "PERMEATING").catch((e: unknown) => e), "run_one_active_per_cell")).toBe(true);
    await expect(run(b.specimen.id, "APPROVED")).resolves.toBeTruthy(); // a finished run no longer holds the cell
  });

  it("a result on one live certificate: a second draft is refused, naming the certificate, until the first is revoked", async () => {
    const [tech, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const { result, project, run } = await makeApprovedResult(tech.id, qa.id);
    const first = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [result.id] } });
    const refused = await failure(createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [result.id] } }));
    expect(refused.code).toBe("CONFLICT");
    expect(refused.message).toBe(`The result of ${run.labNumber} is already on certificate ${first.number}; correct that certificate by a revision instead.`);
    // Even a write that skips the check meets the trigger.
    const other = await withActor(SYSTEM, (tx) => tx.certificate.create({ data: { number: unique("Q"), projectId: project.id, clientOrganizationId: project.clientOrganizationId } }));
    const skipped = await withActor(SYSTEM, (tx) => tx.certificateRevision.create({ data: { certificateId: other.id, revision: 1, verificationCode: unique("V"), results: { create: [{ resultId: result.id }] } } })).catch((e: unknown) => e);
    expect(isUniqueViolation(skipped, `already on certificate ${first.number}`)).toBe(true);
    await withActor(SYSTEM, (tx) => tx.certificateRevision.updateMany({ where: { certificateId: first.id }, data: { status: "REVOKED", revokedAt: new Date() } }));
    await expect(createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [result.id] } })).resolves.toMatchObject({ number: expect.any(String) });
  });

  it("two drafts taking one result at the same moment: one certificate, the other told which", async () => {
    const [tech, qa1, qa2] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER"), makeUser("QA_MANAGER")]);
    const { result, project } = await makeApprovedResult(tech.id, qa1.id);
    const input = { projectId: project.id, resultIds: [result.id] };
    const outcomes = await Promise.allSettled([createCertificateDraft({ actor: qa1, input }), createCertificateDraft({ actor: qa2, input })]);
    expect(outcomes.filter((o) => o.status === "fulfilled")).toHaveLength(1);
    const winner = (outcomes.find((o) => o.status === "fulfilled") as PromiseFulfilledResult<{ number: string }>).value.number;
    const lost = (outcomes.find((o) => o.status === "rejected") as PromiseRejectedResult).reason;
    expect(lost.code).toBe("CONFLICT");
    expect(lost.message).toContain(winner);
    expect(await db().certificateResult.count({ where: { resultId: result.id } })).toBe(1);
  });

  it("two corrections of one issued certificate at the same moment: one new revision", async () => {
    const [tech, qa1, qa2] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER"), makeUser("QA_MANAGER")]);
    const { result, project } = await makeApprovedResult(tech.id, qa1.id);
    const draft = await createCertificateDraft({ actor: qa1, input: { projectId: project.id, resultIds: [result.id] } });
    await withActor(SYSTEM, async (tx) => {
      const revision = await tx.certificateRevision.findFirstOrThrow({ where: { certificateId: draft.id } });
      await tx.signature.create({ data: { revisionId: revision.id, signerId: qa1.id, signerRole: "QA_MANAGER", meaning: "Test" } });
      await tx.certificateRevision.update({ where: { id: revision.id }, data: { status: "ISSUED", issuedAt: new Date() } });
    });
    const input = { certificateId: draft.id, reason: "The client's address was wrong" };
    const outcomes = await Promise.allSettled([reviseCertificate({ actor: qa1, input }), reviseCertificate({ actor: qa2, input })]);
    expect(outcomes.filter((o) => o.status === "fulfilled")).toHaveLength(1);
    const lost = (outcomes.find((o) => o.status === "rejected") as PromiseRejectedResult).reason;
    expect(["CONFLICT", "ILLEGAL_TRANSITION"]).toContain(lost.code);
    expect(lost.message).toContain(draft.number);
    expect(await db().certificateRevision.count({ where: { certificateId: draft.id } })).toBe(2);
  });
});

describe("hostile input refused with a sentence, in one place", () => {
  it("refuses a NUL or a broken character in any field, and a day that does not exist, naming the field", async () => {
    const [clerk, project, shelf] = await Promise.all([makeUser("INTAKE_CLERK"), makeProject(), makeStorageLocation()]);
    const roll = { rollNumber: unique("r"), lotNumber: "L-1", product: "Test GCL", manufacturer: "Test maker", machineDirectionMarked: "yes" };
    const input = { clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "Test carrier", receivedAt: new Date(Date.now() - 3_600_000).toISOString(), conditionNotes: "", storageLocationId: shelf.id, rolls: [roll] };
    const nul = await failure(logShipment({ actor: clerk, input: { ...input, rolls: [{ ...roll, lotNumber: "L\u00001" }] } }));
    expect(nul.code).toBe("INVALID_INPUT");
    expect(nul.fieldErrors).toEqual({ "rolls.0.lotNumber": expect.stringMatching(/cannot be stored/) });
    const surrogate = await failure(logShipment({ actor: clerk, input: { ...input, deliveredBy: "Carrier \ud800" } }));
    expect(surrogate.fieldErrors).toHaveProperty("deliveredBy");
    const impossible = await failure(logShipment({ actor: clerk, input: { ...input, receivedAt: "2026-02-30T10:00" } }));
    expect(impossible.fieldErrors.receivedAt).toMatch(/real date/);
    const ancient = await failure(logShipment({ actor: clerk, input: { ...input, receivedAt: "0001-06-01T10:00" } }));
    expect(ancient.fieldErrors.receivedAt).toMatch(/cannot be before 2000/);
    for (const wrongShape of [null, [], "text", 1]) expect((await failure(logShipment({ actor: clerk, input: wrongShape }))).code).toBe("INVALID_INPUT");
  });
});
