import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ReceiptAcknowledgement } from "@/components/documents/receipt-acknowledgement";
import { getLetterhead } from "@/lib/server/lab/get-letterhead";
import { correctReceipt } from "@/lib/server/intake/correct-receipt";
import { getShipmentReceipt } from "@/lib/server/intake/get-shipment-receipt";
import { assignSpecimenToCell } from "@/lib/server/runs/assign-specimen-to-cell";
import { recordStage } from "@/lib/server/runs/record-stage";
import { cutCoupon } from "@/lib/server/samples/cut-coupon";
import { prepareSpecimen } from "@/lib/server/samples/prepare-specimen";
import { failure } from "../support/refusals";
import { couponInput, daysAgo, makeReadySpecimen, receiveRolls, specimenInput } from "../support/custody-chain";
import { db, makeUser } from "../support/factories";
import { makeRunInstruments } from "../support/make-instrument";

// Times are written as the lab's time zone shows them: UTC here, as no test sets another zone for the lab.
const UTC_TIME = /\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC/;

describe("one order of events, enforced where each time is entered", () => {
  it("refuses a coupon cut before its roll was received, or in the future, naming the receipt; nothing is saved", async () => {
    const [clerk, technician] = await Promise.all([makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN")]);
    const { rolls, location, shipment } = await receiveRolls(clerk, 2);
    const roll = rolls[0]!;
    const early = await failure(cutCoupon({ actor: technician, input: await couponInput(roll.id, location.id, daysAgo(3)) }));
    expect(early.code).toBe("INVALID_INPUT");
    expect(early.fieldErrors.cutAt).toMatch(new RegExp(`^The cut time \\(${UTC_TIME.source}\\) is before roll ${roll.labNumber} was received with shipment ${shipment.labNumber} \\(${UTC_TIME.source}\\); it cannot be earlier than that\\.$`));
    const future = await failure(cutCoupon({ actor: technician, input: await couponInput(roll.id, location.id, new Date(Date.now() + 86_400_000)) }));
    expect(Object.values(future.fieldErrors).join(" ")).toMatch(/cannot be in the future|is in the future/);
    expect(await db().coupon.count({ where: { rollId: roll.id } })).toBe(0);
    expect(await db().custodyEvent.count({ where: { rollId: roll.id, action: "CUT" } })).toBe(0);
    expect((await db().roll.findUniqueOrThrow({ where: { id: roll.id } })).state).toBe("STORED");

    const coupon = await cutCoupon({ actor: technician, input: await couponInput(roll.id, location.id, daysAgo(1)) });
    expect(coupon.labNumber).toMatch(/^C\d{2}-\d{5}$/);
  });

  it("refuses a specimen prepared before its coupon was cut, a mount before preparation, and a stage before the mount", async () => {
    const [clerk, technician] = await Promise.all([makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN")]);
    const { rolls, location } = await receiveRolls(clerk, 6);
    const coupon = await cutCoupon({ actor: technician, input: await couponInput(rolls[0]!.id, location.id, daysAgo(5)) });
    const early = await failure(prepareSpecimen({ actor: technician, input: specimenInput(coupon.id, location.id, daysAgo(5.5)) }));
    expect(early.fieldErrors.preparedAt).toMatch(new RegExp(`is before coupon ${coupon.labNumber} was cut`));
    expect(await db().specimen.count({ where: { couponId: coupon.id } })).toBe(0);
    const specimen = await prepareSpecimen({ actor: technician, input: specimenInput(coupon.id, location.id, daysAgo(4)) });

    const { cell, panel, transducer } = await makeRunInstruments();
    const assign = (mountedAt: Date) => ({ specimenId: specimen.id, cellId: cell.id, burettePanelId: panel.id, transducerId: transducer.id, methodCode: "D5887", pressureUnit: "KPA", mountedAt: mountedAt.toISOString() });
    const mountedEarly = await failure(assignSpecimenToCell({ actor: technician, input: assign(daysAgo(4.5)) }));
    expect(mountedEarly.fieldErrors.mountedAt).toMatch(new RegExp(`^The mount time \\(.*\\) is before specimen ${specimen.labNumber} was prepared`));
    expect(await db().run.count({ where: { specimenId: specimen.id } })).toBe(0);
    expect((await db().specimen.findUniqueOrThrow({ where: { id: specimen.id } })).state).toBe("PREPARED");

    // The run starts at the mount time the technician entered, not when the form was sent.
    const mountedAt = daysAgo(3);
    const run = await assignSpecimenToCell({ actor: technician, input: assign(mountedAt) });
    expect((await db().run.findUniqueOrThrow({ where: { id: run.id } })).assignedAt).toEqual(mountedAt);
    expect((await db().custodyEvent.findFirstOrThrow({ where: { specimenId: specimen.id, action: "ASSIGNED" } })).occurredAt).toEqual(mountedAt);

    const stage = { runId: run.id, version: 1, kind: "SATURATION", pressureUnit: "KPA", cellPressure: "345", influentPressure: "310", effluentPressure: "310" };
    const beforeMount = await failure(recordStage({ actor: technician, input: { ...stage, startedAt: daysAgo(3.5).toISOString() } }));
    expect(beforeMount.fieldErrors.startedAt).toMatch(new RegExp(`is before the specimen was mounted in the cell for ${run.labNumber}`));
    await recordStage({ actor: technician, input: { ...stage, startedAt: daysAgo(2).toISOString() } });
    const beforePrevious = await failure(recordStage({ actor: technician, input: { ...stage, version: 2, kind: "EQUILIBRATION", startedAt: daysAgo(2.5).toISOString() } }));
    expect(beforePrevious.fieldErrors.startedAt).toMatch(/is before stage 1 started/);
    expect(await db().runStage.count({ where: { runId: run.id } })).toBe(1);
  });

  it("refuses a corrected receipt time after the first cut; a correction of the condition is a custody event of every roll and marks the receipt amended", async () => {
    const [clerk, technician] = await Promise.all([makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN")]);
    const { shipment, roll, coupon } = await makeReadySpecimen(clerk, technician, { received: 5, cut: 4, prepared: 3 });
    const current = await db().shipment.findUniqueOrThrow({ where: { id: shipment.id } });
    const late = await failure(correctReceipt({ actor: clerk, input: { target: "shipment", id: shipment.id, field: "receivedAt", value: daysAgo(3.5).toISOString().slice(0, 16), reason: "Date misread from the delivery note", version: current.version } }));
    expect(late.fieldErrors.value).toMatch(new RegExp(`^The corrected receipt time \\(.*\\) is after coupon ${coupon.labNumber} was cut from roll ${roll.labNumber} \\(.*\\); it cannot be later than that\\.$`));
    expect((await db().shipment.findUniqueOrThrow({ where: { id: shipment.id } })).receivedAt).toEqual(current.receivedAt);

    await correctReceipt({ actor: clerk, input: { target: "shipment", id: shipment.id, field: "conditionNotes", value: "Wrapped; outer film wet on arrival.", reason: "Driver's note read again", version: current.version } });
    const events = await db().custodyEvent.findMany({ where: { rollId: roll.id, action: "CORRECTED" } });
    expect(events).toHaveLength(1);
    expect(events[0]!.note).toBe(`shipment ${shipment.labNumber} conditionNotes: Wrapped, dry. → Wrapped; outer film wet on arrival. (Driver's note read again)`);
    const receipt = await getShipmentReceipt({ actor: clerk, labNumber: shipment.labNumber });
    expect(receipt.corrections).toEqual([expect.objectContaining({ item: "shipment", field: "conditionNotes", oldValue: "Wrapped, dry.", newValue: "Wrapped; outer film wet on arrival.", reason: "Driver's note read again" })]);
    // The receipt document says it was amended, and with what.
    const html = renderToStaticMarkup(createElement(ReceiptAcknowledgement, { receipt, lab: await getLetterhead() }));
    const text = html.replace(/<style[\s\S]*?<\/style>/g, "").replace(/<[^>]+>/g, " ").replace(/&#x27;/g, "'").replace(/\s+/g, " ");
    expect(html).toContain('data-testid="receipt-amended"');
    expect(text).toMatch(/Corrections When Record Field Was Now Reason By .* shipment Condition on arrival Wrapped, dry\. Wrapped; outer film wet on arrival\. Driver's note read again/);
  });
});
