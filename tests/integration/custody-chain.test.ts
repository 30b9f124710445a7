import { describe, expect, it } from "vitest";
import { acknowledgeShipment } from "@/lib/server/intake/acknowledge-shipment";
import { correctReceipt } from "@/lib/server/intake/correct-receipt";
import { logShipment } from "@/lib/server/intake/log-shipment";
import { cutCoupon } from "@/lib/server/samples/cut-coupon";
import { disposeRetained } from "@/lib/server/samples/dispose-retained";
import { moveItem } from "@/lib/server/samples/move-item";
import { prepareSpecimen } from "@/lib/server/samples/prepare-specimen";
import { retainItem } from "@/lib/server/samples/retain-item";
import { failure } from "../support/refusals";
import { db, makeProject, makeStorageLocation, makeUser, unique } from "../support/factories";


const rollRow = (rollNumber: string) => ({ rollNumber, lotNumber: "L-1", product: "Test GCL", manufacturer: "Test maker", sampleLengthMm: "1000", sampleWidthMm: "1200", machineDirectionMarked: "yes" });

async function setUp() {
  const [clerk, technician, project, shelf, bench] = await Promise.all([makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN"), makeProject(), makeStorageLocation(), makeStorageLocation()]);
  const shipmentInput = (rolls: unknown[]) => ({
    clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "Test carrier", receivedAt: new Date(Date.now() - 3_600_000).toISOString(),
    conditionNotes: "Dry, wrapped", storageLocationId: shelf.id, rolls,
  });
  return { clerk, technician, project, shelf, bench, shipmentInput };
}

describe("intake: a shipment and its rolls, all or nothing", () => {
  it("logs three rolls with lab numbers and a received-then-stored ledger naming the clerk", async () => {
    const { clerk, shipmentInput, shelf } = await setUp();
    const shipment = await logShipment({ actor: clerk, input: shipmentInput([rollRow(unique("A")), rollRow(unique("B")), rollRow(unique("C"))]) });
    expect(shipment.labNumber).toMatch(/^S\d{2}-\d{5}$/);
    expect(shipment.rolls).toHaveLength(3);
    for (const roll of shipment.rolls) {
      const stored = await db().roll.findUniqueOrThrow({ where: { id: roll.id } });
      expect(stored).toMatchObject({ state: "STORED", storageLocationId: shelf.id, sampleLengthMm: 1000, machineDirectionMarked: true });
      const events = await db().custodyEvent.findMany({ where: { rollId: roll.id }, orderBy: { occurredAt: "asc" } });
      expect(events.map((e) => [e.action, e.fromState, e.toState, e.actorId])).toEqual([["RECEIVED", null, "RECEIVED", clerk.id], ["STORED", "RECEIVED", "STORED", clerk.id]]);
    }
  });

  it("saves nothing when one row is bad, and names the row and field", async () => {
    const { clerk, shipmentInput, project } = await setUp();
    const error = await failure(logShipment({ actor: clerk, input: shipmentInput([rollRow(unique("ok")), { ...rollRow(unique("bad")), lotNumber: "" }]) }));
    expect(error.code).toBe("INVALID_INPUT");
    expect(error.fieldErrors["rolls.1.lotNumber"]).toBe("Enter the lot number.");
    expect(await db().roll.count({ where: { projectId: project.id } })).toBe(0);
    expect(await db().shipment.count({ where: { projectId: project.id } })).toBe(0);
  });

  it("refuses a roll number already logged for the project, pointing at the existing roll", async () => {
    const { clerk, shipmentInput } = await setUp();
    const rollNumber = unique("dup");
    const first = await logShipment({ actor: clerk, input: shipmentInput([rollRow(rollNumber)]) });
    const error = await failure(logShipment({ actor: clerk, input: shipmentInput([rollRow(unique("new")), rollRow(rollNumber)]) }));
    expect(error.fieldErrors["rolls.1.rollNumber"]).toBe(`Roll ${rollNumber} is already logged for this project as ${first.rolls[0]!.labNumber}.`);
    const twice = await failure(logShipment({ actor: clerk, input: shipmentInput([rollRow("same"), rollRow("same")]) }));
    expect(twice.fieldErrors["rolls.1.rollNumber"]).toMatch(/appears twice/);
  });

  it("lets only the intake side log shipments", async () => {
    const { technician, shipmentInput } = await setUp();
    expect((await failure(logShipment({ actor: technician, input: shipmentInput([rollRow("x")]) }))).code).toBe("FORBIDDEN");
  });
});

describe("cutting coupons and preparing specimens through the state machine", () => {
  it("records the cut on the roll and the coupon, and the specimen with its checklist", async () => {
    const { clerk, technician, shipmentInput, bench } = await setUp();
    const { rolls: [roll] } = await logShipment({ actor: clerk, input: shipmentInput([rollRow(unique("R"))]) });
    const coupon = await cutCoupon({ actor: technician, input: { rollId: roll!.id, rollVersion: 1, positionInSample: "centre", lengthMm: "300", widthMm: "300", cutAt: new Date().toISOString(), storageLocationId: bench.id } });
    expect((await db().roll.findUniqueOrThrow({ where: { id: roll!.id } })).state).toBe("CUT");
    const checklist = { "die-cut": true, "edges-sealed": true, "no-bridging-fibres": false, "surfaces-saturated": true, "deaired-water": true };
    const input = { couponId: coupon.id, dieDiameterMm: "100", initialThicknessMm: "6,8", initialMassG: "46.2", moistureContentPct: "", intendedMethodCode: "D5887", preparedAt: new Date().toISOString(), storageLocationId: bench.id };

    const missing = await failure(prepareSpecimen({ actor: technician, input: { ...input, checklist: { "die-cut": true } } }));
    expect(missing.fieldErrors).toHaveProperty(["checklist.edges-sealed"], "Answer yes or no.");

    const specimen = await prepareSpecimen({ actor: technician, input: { ...input, checklist } });
    const stored = await db().specimen.findUniqueOrThrow({ where: { id: specimen.id }, include: { checklist: true } });
    expect(stored).toMatchObject({ state: "PREPARED", initialThicknessMm: 6.8, moistureContentPct: null, preparedById: technician.id });
    expect(stored.checklist.find((i) => i.itemKey === "no-bridging-fibres")?.answer).toBe(false);
    expect(stored.checklist).toHaveLength(5);
    const couponEvents = await db().custodyEvent.findMany({ where: { couponId: coupon.id }, orderBy: { occurredAt: "asc" } });
    expect(couponEvents.map((e) => [e.action, e.actorId])).toEqual([["CUT", technician.id], ["PREPARED", technician.id]]);
  });

  it("refuses an illegal transition with what is allowed, and changes nothing", async () => {
    const { clerk, technician, shipmentInput, bench } = await setUp();
    const { rolls: [roll] } = await logShipment({ actor: clerk, input: shipmentInput([rollRow(unique("R"))]) });
    const before = await db().custodyEvent.count({ where: { rollId: roll!.id } });
    const error = await failure(disposeRetained({ actor: technician, input: { items: [{ kind: "roll", id: roll!.id }], note: "tried too early" } }));
    expect(error.code).toBe("ILLEGAL_TRANSITION");
    expect(error.message).toMatch(/is not on retention/);
    const retain = await failure(moveItem({ actor: clerk, input: { kind: "roll", id: roll!.id, version: 99, toLocationId: bench.id } }));
    expect(retain.code).toBe("CONFLICT");
    expect(await db().custodyEvent.count({ where: { rollId: roll!.id } })).toBe(before);
    expect((await db().roll.findUniqueOrThrow({ where: { id: roll!.id } })).state).toBe("STORED");

    const cut = await cutCoupon({ actor: technician, input: { rollId: roll!.id, rollVersion: 1, positionInSample: "edge", lengthMm: "300", widthMm: "300", cutAt: new Date().toISOString(), storageLocationId: bench.id } });
    await retainItem({ actor: technician, input: { kind: "coupon", id: cut.id, version: 1 } });
    const prepareRetained = await failure(prepareSpecimen({ actor: technician, input: { couponId: cut.id, dieDiameterMm: "100", initialThicknessMm: "7", initialMassG: "45", intendedMethodCode: "D5887", preparedAt: new Date().toISOString(), storageLocationId: bench.id, checklist: { "die-cut": true, "edges-sealed": true, "no-bridging-fibres": true, "surfaces-saturated": true, "deaired-water": true } } }));
    expect(prepareRetained.code).toBe("ILLEGAL_TRANSITION");
    expect(prepareRetained.message).toMatch(/A coupon that is retained cannot prepare a specimen from; from here it can only move, dispose of\./);
  });

  it("keeps clerks away from cutting, the technician's work", async () => {
    const { clerk, shipmentInput, bench } = await setUp();
    const { rolls: [roll] } = await logShipment({ actor: clerk, input: shipmentInput([rollRow(unique("R"))]) });
    const error = await failure(cutCoupon({ actor: clerk, input: { rollId: roll!.id, rollVersion: 1, positionInSample: "x", lengthMm: "1", widthMm: "1", cutAt: new Date().toISOString(), storageLocationId: bench.id } }));
    expect(error.code).toBe("FORBIDDEN");
  });
});

describe("moves, retention and disposal", () => {
  it("moves with a from-to event, retains, refuses early disposal, then disposes of the batch once due", async () => {
    const { clerk, shipmentInput, shelf, bench } = await setUp();
    const { rolls } = await logShipment({ actor: clerk, input: shipmentInput([rollRow(unique("R")), rollRow(unique("S"))]) });
    await moveItem({ actor: clerk, input: { kind: "roll", id: rolls[0]!.id, version: 1, toLocationId: bench.id, note: "to the humid room" } });
    const moved = await db().custodyEvent.findFirstOrThrow({ where: { rollId: rolls[0]!.id, action: "MOVED" } });
    expect(moved).toMatchObject({ fromLocationId: shelf.id, toLocationId: bench.id, fromState: "STORED", toState: "STORED", actorId: clerk.id, note: "to the humid room" });

    const now = new Date();
    await retainItem({ actor: clerk, input: { kind: "roll", id: rolls[0]!.id, version: 2, retainDays: 30 }, now });
    await retainItem({ actor: clerk, input: { kind: "roll", id: rolls[1]!.id, version: 1, retainDays: 60 }, now });
    const items = rolls.map((r) => ({ kind: "roll" as const, id: r.id }));
    const early = await failure(disposeRetained({ actor: clerk, input: { items, note: "shredded and binned" }, now: new Date(now.getTime() + 45 * 86_400_000) }));
    expect(early.message).toMatch(/Nothing was disposed of: R\d{2}-\d{5} is retained until/);
    expect(await db().roll.count({ where: { id: { in: rolls.map((r) => r.id) }, state: "DISPOSED" } })).toBe(0);

    const result = await disposeRetained({ actor: clerk, input: { items, note: "shredded and binned" }, now: new Date(now.getTime() + 61 * 86_400_000) });
    expect(result.disposed).toHaveLength(2);
    expect(await db().custodyEvent.count({ where: { rollId: { in: rolls.map((r) => r.id) }, action: "DISPOSED", actorId: clerk.id } })).toBe(2);
    expect((await failure(moveItem({ actor: clerk, input: { kind: "roll", id: rolls[0]!.id, version: 4, toLocationId: shelf.id } }))).message).toMatch(/nothing more can happen to it/);
  });
});

describe("receipt corrections", () => {
  it("change a receipt only through a correction with a reason, kept with the old value and audited", async () => {
    const { clerk, technician, shipmentInput } = await setUp();
    const shipment = await logShipment({ actor: clerk, input: shipmentInput([rollRow(unique("R"))]) });
    await acknowledgeShipment({ actor: clerk, input: { shipmentId: shipment.id, version: 1 } });
    expect((await failure(acknowledgeShipment({ actor: clerk, input: { shipmentId: shipment.id, version: 2 } }))).code).toBe("ILLEGAL_TRANSITION");

    const roll = shipment.rolls[0]!;
    const correction = { target: "roll", id: roll.id, field: "lotNumber", value: "L-2", reason: "Lot misread from the roll label", version: 1 };
    expect((await failure(correctReceipt({ actor: technician, input: correction }))).code).toBe("FORBIDDEN");
    expect((await failure(correctReceipt({ actor: clerk, input: { ...correction, reason: "oops" } }))).fieldErrors).toHaveProperty("reason");
    expect((await failure(correctReceipt({ actor: clerk, input: { ...correction, field: "state" } }))).code).toBe("INVALID_INPUT");
    expect((await failure(correctReceipt({ actor: clerk, input: { ...correction, field: "sampleLengthMm", value: "-3" } }))).fieldErrors.value).toMatch(/more than 0/);

    await correctReceipt({ actor: clerk, input: correction });
    expect((await db().roll.findUniqueOrThrow({ where: { id: roll.id } })).lotNumber).toBe("L-2");
    expect(await db().correction.findFirst({ where: { entityId: roll.id } })).toMatchObject({ field: "lotNumber", oldValue: "L-1", newValue: "L-2", reason: "Lot misread from the roll label", actorId: clerk.id });
    const audit = await db().auditLog.findFirstOrThrow({ where: { tableName: "Roll", rowId: roll.id, operation: "UPDATE" }, orderBy: { id: "desc" } });
    expect(audit).toMatchObject({ actorId: clerk.id, before: expect.objectContaining({ lotNumber: "L-1" }), after: expect.objectContaining({ lotNumber: "L-2" }) });
    expect((await failure(correctReceipt({ actor: clerk, input: { ...correction, value: "L-3" } }))).code).toBe("CONFLICT");

    await correctReceipt({ actor: clerk, input: { target: "shipment", id: shipment.id, field: "conditionNotes", value: "Dry, wrapped; one corner torn", reason: "Tear found when unwrapping", version: 2 } });
    expect((await db().shipment.findUniqueOrThrow({ where: { id: shipment.id } })).conditionNotes).toBe("Dry, wrapped; one corner torn");
  });
});
