import { describe, expect, it } from "vitest";
import { withActor } from "@/lib/server/db/transaction";
import { approveRun } from "@/lib/server/review/approve-run";
import { abandonRun } from "@/lib/server/runs/abandon-run";
import { assignSpecimenToCell } from "@/lib/server/runs/assign-specimen-to-cell";
import { getCellBoard } from "@/lib/server/runs/get-cell-board";
import { recordStage } from "@/lib/server/runs/record-stage";
import { submitRun } from "@/lib/server/runs/submit-run";
import { getItemHistory } from "@/lib/server/samples/get-item-history";
import { failure } from "../support/refusals";
import { daysAgo, makeReadySpecimen } from "../support/custody-chain";
import { db, makeUser } from "../support/factories";
import { makeRunInstruments } from "../support/make-instrument";

async function startedRun() {
  const [clerk, technician, other, qa] = await Promise.all([makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN"), makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
  const ready = await makeReadySpecimen(clerk, technician, { received: 6, cut: 5, prepared: 4 });
  const instruments = await makeRunInstruments();
  const assignInput = (specimenId: string) => ({
    specimenId, cellId: instruments.cell.id, burettePanelId: instruments.panel.id, transducerId: instruments.transducer.id, methodCode: "D5887", pressureUnit: "KPA", mountedAt: daysAgo(3).toISOString(),
  });
  const run = await assignSpecimenToCell({ actor: technician, input: assignInput(ready.specimen.id) });
  return { clerk, technician, other, qa, ...ready, ...instruments, run, assignInput };
}

describe("abandoning a run before approval", () => {
  it("frees the cell, keeps the run's record, returns the specimen to storage on retention; the run can never be submitted or reviewed", async () => {
    const { technician, other, qa, clerk, cell, run, specimen, location, assignInput } = await startedRun();
    await recordStage({ actor: technician, input: { runId: run.id, version: 1, kind: "SATURATION", pressureUnit: "KPA", cellPressure: "345", influentPressure: "310", effluentPressure: "310", startedAt: daysAgo(2).toISOString() } });
    const input = { runId: run.id, version: 2, reason: "Membrane leak found during saturation", specimenFate: "storage", storageLocationId: location.id };

    expect((await failure(abandonRun({ actor: other, input }))).code).toBe("FORBIDDEN");
    expect((await failure(abandonRun({ actor: qa, input }))).code).toBe("FORBIDDEN");
    const noReason = await failure(abandonRun({ actor: technician, input: { ...input, reason: "" } }));
    expect(noReason.fieldErrors.reason).toMatch(/Say why/);
    const noPlace = await failure(abandonRun({ actor: technician, input: { ...input, storageLocationId: "" } }));
    expect(noPlace.fieldErrors.storageLocationId).toBe("Choose where the specimen is kept.");
    expect((await db().run.findUniqueOrThrow({ where: { id: run.id } })).state).toBe("SATURATING");

    await abandonRun({ actor: technician, input });
    const stored = await db().run.findUniqueOrThrow({ where: { id: run.id }, include: { stages: true } });
    expect(stored).toMatchObject({ state: "ABANDONED", abandonedById: technician.id, abandonmentReason: "Membrane leak found during saturation" });
    expect(stored.stages).toHaveLength(1);
    expect(stored.stages[0]!.endedAt).toEqual(stored.abandonedAt);
    expect(await db().specimen.findUniqueOrThrow({ where: { id: specimen.id } })).toMatchObject({ state: "RETAINED", storageLocationId: location.id });
    const withdrawn = await db().custodyEvent.findFirstOrThrow({ where: { specimenId: specimen.id, action: "WITHDRAWN" } });
    expect(withdrawn).toMatchObject({ fromState: "ASSIGNED", toState: "RETAINED", toLocationId: location.id, actorId: technician.id });
    expect(withdrawn.note).toBe(`Run ${run.labNumber} abandoned: Membrane leak found during saturation`);

    // The cell is free: the board says so and another specimen can be mounted in it.
    const board = await getCellBoard({ actor: technician });
    expect(JSON.stringify(board)).not.toContain(run.labNumber);
    const next = await makeReadySpecimen(clerk, technician, { received: 6, cut: 5, prepared: 4 });
    const second = await assignSpecimenToCell({ actor: technician, input: assignInput(next.specimen.id) });
    expect((await db().run.findUniqueOrThrow({ where: { id: second.id } })).cellId).toBe(cell.id);

    // Nothing further: no submission, no second abandonment, and the database refuses a review or a result for it.
    expect((await failure(submitRun({ actor: technician, input: { runId: run.id, version: 3 } }))).code).toBe("ILLEGAL_TRANSITION");
    expect((await failure(abandonRun({ actor: technician, input: { ...input, version: 3 } }))).message).toMatch(/A run that is abandoned cannot abandon it; nothing more can be done to it\./);
    expect((await failure(approveRun({ actor: qa, input: { runId: run.id, version: 3, comments: "" } }))).code).toBe("ILLEGAL_TRANSITION");
    await expect(withActor(qa, (tx) => tx.review.create({ data: { runId: run.id, reviewerId: qa.id, decision: "APPROVED" } }))).rejects.toThrow(/was abandoned/);
    expect(await db().review.count({ where: { runId: run.id } })).toBe(0);
  });

  it("disposes of the specimen when the technician chooses so, from a run already permeating", async () => {
    const { technician, run, specimen, roll } = await startedRun();
    const stage = { runId: run.id, pressureUnit: "KPA", cellPressure: "552", influentPressure: "531", effluentPressure: "517" };
    await recordStage({ actor: technician, input: { ...stage, version: 1, kind: "SATURATION", cellPressure: "345", influentPressure: "310", effluentPressure: "310", startedAt: daysAgo(2.5).toISOString() } });
    await recordStage({ actor: technician, input: { ...stage, version: 2, kind: "EQUILIBRATION", influentPressure: "517", startedAt: daysAgo(2).toISOString() } });
    await recordStage({ actor: technician, input: { ...stage, version: 3, kind: "PERMEATION", cellPressure: "566", startedAt: daysAgo(1).toISOString(), acknowledgeMargin: true } });
    expect((await db().specimen.findUniqueOrThrow({ where: { id: specimen.id } })).state).toBe("UNDER_TEST");

    await abandonRun({ actor: technician, input: { runId: run.id, version: 4, reason: "Effluent line blocked; cannot be cleared", specimenFate: "disposal" } });
    expect((await db().run.findUniqueOrThrow({ where: { id: run.id } })).state).toBe("ABANDONED");
    // The ledger as shown: taken out and disposed of at the same moment, in the order they happened.
    const { events } = await getItemHistory({ actor: technician, kind: "specimen", id: specimen.id });
    expect(events.map((e) => e.action)).toEqual(["PREPARED", "ASSIGNED", "TEST_STARTED", "WITHDRAWN", "DISPOSED"]);
    expect(await db().specimen.findUniqueOrThrow({ where: { id: specimen.id } })).toMatchObject({ state: "DISPOSED", storageLocationId: null });
    // The roll keeps its own record; other specimens of it may still be tested.
    expect((await db().roll.findUniqueOrThrow({ where: { id: roll.id } })).state).toBe("UNDER_TEST");
  });
});
