import { describe, expect, it } from "vitest";
import { withActor } from "@/lib/server/db/transaction";
import { getHomeQueues } from "@/lib/server/queues/get-home-queues";
import { approveRun } from "@/lib/server/review/approve-run";
import { abandonRun } from "@/lib/server/runs/abandon-run";
import { db, makeUser } from "../support/factories";
import { makePermeatingRun } from "../support/run-fixtures";

const SYSTEM = { id: "system:test" };

/** A run ended and submitted, its specimen out of the cell as termination leaves it (invented readings meeting D5887). */
async function makeSubmittedRun(technicianId: string, projectId?: string) {
  const { run, project } = await makePermeatingRun(technicianId, projectId ? { projectId } : {});
  const stepMl = 2e-9 * ((Math.PI * 0.1 ** 2) / 4) * 21_600 * 1e6;
  return withActor(SYSTEM, async (tx) => {
    const submitted = await tx.run.update({ where: { id: run.id }, data: { state: "SUBMITTED", terminatedAt: new Date(), terminationKind: "CRITERIA_MET", postTestThicknessMm: 5.9, submittedAt: new Date() }, include: { specimen: { include: { coupon: true } } } });
    await tx.specimen.update({ where: { id: run.specimenId }, data: { state: "TESTED" } });
    await tx.reading.createMany({
      data: Array.from({ length: 8 }, (_, i) => ({ runId: run.id, sequence: i + 1, takenAt: new Date(), elapsedS: i * 21_600, inflowCumulativeMl: i * stepMl, outflowCumulativeMl: i * stepMl * 0.98, headPa: 14_000, temperatureC: 20, recordedById: technicianId })),
    });
    return { run: submitted, project, rollId: submitted.specimen.coupon.rollId };
  });
}

const rollState = async (id: string) => (await db().roll.findUniqueOrThrow({ where: { id } })).state;

describe("a roll reaches tested", () => {
  it("when a run on its only specimen is approved: a custody event by the approver, and the client's home counts it as tested", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const { run, project, rollId } = await makeSubmittedRun(technician.id);
    expect(await rollState(rollId)).toBe("UNDER_TEST");

    await approveRun({ actor: qa, input: { runId: run.id, version: 1 } });
    expect(await rollState(rollId)).toBe("TESTED");
    const event = await db().custodyEvent.findFirstOrThrow({ where: { rollId, action: "TESTED" } });
    expect(event).toMatchObject({ fromState: "UNDER_TEST", toState: "TESTED", actorId: qa.id, note: `Run ${run.labNumber} approved` });
    const audit = await db().auditLog.findFirstOrThrow({ where: { tableName: "Roll", rowId: rollId, operation: "UPDATE" }, orderBy: { id: "desc" } });
    expect(audit.actorId).toBe(qa.id);

    const client = await makeUser("CLIENT_USER", { clientOrganizationId: project.clientOrganizationId });
    const { projects } = await getHomeQueues(client);
    expect(projects?.find((p) => p.id === project.id)).toMatchObject({ rollCount: 1, rollsUnderTest: 0, rollsTested: 1 });
  });

  it("only once no other specimen of the roll is still in a cell; abandoning that last one then settles it", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const { run, project, rollId } = await makeSubmittedRun(technician.id);
    // A second specimen of the same roll, still permeating.
    const other = await makePermeatingRun(technician.id, { projectId: project.id });
    const otherSpecimen = await db().specimen.findUniqueOrThrow({ where: { id: other.run.specimenId } });
    await withActor(SYSTEM, (tx) => tx.coupon.update({ where: { id: otherSpecimen.couponId }, data: { rollId } }));

    await approveRun({ actor: qa, input: { runId: run.id, version: 1 } });
    expect(await rollState(rollId)).toBe("UNDER_TEST");
    expect(await db().custodyEvent.count({ where: { rollId, action: "TESTED" } })).toBe(0);

    await abandonRun({ actor: technician, input: { runId: other.run.id, version: other.run.version, reason: "Membrane leak", specimenFate: "disposal" } });
    expect(await rollState(rollId)).toBe("TESTED");
    expect(await db().custodyEvent.findFirstOrThrow({ where: { rollId, action: "TESTED" } })).toMatchObject({ actorId: technician.id, fromState: "UNDER_TEST" });
  });

  it("not when its only run is abandoned unapproved", async () => {
    const technician = await makeUser("TECHNICIAN");
    const { run } = await makePermeatingRun(technician.id);
    const specimen = await db().specimen.findUniqueOrThrow({ where: { id: run.specimenId }, include: { coupon: true } });
    await abandonRun({ actor: technician, input: { runId: run.id, version: run.version, reason: "Blocked line", specimenFate: "disposal" } });
    expect(await rollState(specimen.coupon.rollId)).toBe("UNDER_TEST");
  });
});
