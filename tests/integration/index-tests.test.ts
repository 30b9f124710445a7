import { describe, expect, it } from "vitest";
import { loadProjectConformance } from "@/lib/server/conformance/load-project-conformance";
import { recordIndexTest } from "@/lib/server/index-tests/record-index-test";
import { correctReceipt } from "@/lib/server/intake/correct-receipt";
import { reviewIndexTest } from "@/lib/server/index-tests/review-index-test";
import { cutCoupon } from "@/lib/server/samples/cut-coupon";
import { withActor } from "@/lib/server/db/transaction";
import { setSpecificationLimit } from "@/lib/server/specifications/set-specification-limit";
import { couponInput, daysAgo } from "../support/custody-chain";
import { db, makeUser } from "../support/factories";
import { makeIndexInstrument, makeIndexInstruments, OBSERVATIONS, receiveProjectRolls } from "../support/index-test-fixtures";
import { withOwner } from "../support/owner";
import { codeOf, failure } from "../support/refusals";

type Limit = { property: string; limitText: string; unit: string; direction: "MAXIMUM" | "MINIMUM"; testingFrequencyAreaM2?: string; testingFrequencyPerLot?: boolean };

async function specify(qa: Awaited<ReturnType<typeof makeUser>>, projectId: string, limits: Limit[]) {
  const spec = await withActor(qa, (tx) => tx.specification.create({ data: { name: "Liner specification", projectId } }));
  for (const l of limits) await setSpecificationLimit({ actor: qa, input: { specificationId: spec.id, conformanceMethod: "ROUNDING", ...l } });
  return spec;
}

async function people() {
  const [clerk, technician, qa] = await Promise.all([makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
  return { clerk, technician, qa };
}

const testInput = (rollId: string, instruments: Record<string, string>, observations: object, extra: Record<string, unknown> = {}) => ({
  rollId, methodCode: (observations as { methodCode: string }).methodCode, testedAt: daysAgo(1).toISOString(), instruments, observations, ...extra,
});

describe("the tests a roll needs follow from its project's specification", () => {
  it("lists the index tests each listed property asks for, and drops one once it is recorded", async () => {
    const { clerk, technician, qa } = await people();
    const { project, rolls } = await receiveProjectRolls(clerk, 5, [{ lot: "L1", lengthM: 45, widthM: 4.5 }]);
    await specify(qa, project.id, [
      { property: "SWELL_INDEX", limitText: "24", unit: "mL/2 g", direction: "MINIMUM" },
      { property: "FLUID_LOSS", limitText: "18", unit: "mL", direction: "MAXIMUM" },
      { property: "INDEX_FLUX", limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM" },
    ]);
    const roll = rolls[0]!;
    const before = await loadProjectConformance({ projectId: project.id });
    expect(before.waiting.get(roll.id)!.map((w) => w.methodCode)).toEqual(["D5890", "D5891"]);
    // The hydraulic property is in the matrix too, not tested yet; tensile is not listed, so not asked for.
    expect(before.rows[0]!.cells.map((c) => [c.property, c.status])).toEqual([["INDEX_FLUX", "not tested"], ["SWELL_INDEX", "not tested"], ["FLUID_LOSS", "not tested"]]);

    const instruments = await makeIndexInstruments();
    await recordIndexTest({ actor: technician, input: testInput(roll.id, { balanceId: instruments.balanceId, cylinderId: instruments.cylinderId }, OBSERVATIONS.D5890()) });
    const after = await loadProjectConformance({ projectId: project.id });
    expect(after.waiting.get(roll.id)!.map((w) => w.methodCode)).toEqual(["D5891"]);
    expect(after.rows[0]!.cells.find((c) => c.property === "SWELL_INDEX")!.status).toBe("awaiting review");
  });
});

describe("review of an index test", () => {
  it("a QA manager approves it; the result and its record are kept; the performer can never approve their own", async () => {
    const { clerk, technician, qa } = await people();
    const { project, rolls, location } = await receiveProjectRolls(clerk, 5, [{ lot: "L1" }]);
    await specify(qa, project.id, [{ property: "TENSILE_STRENGTH", limitText: "4", unit: "kN/m", direction: "MINIMUM" }]);
    const instruments = await makeIndexInstruments();
    const coupon = await cutCoupon({ actor: technician, input: { ...(await couponInput(rolls[0]!.id, location.id, daysAgo(3))), intendedMethodCode: "D6768" } });
    const { id } = await recordIndexTest({ actor: technician, input: testInput(rolls[0]!.id, { tensileFrameId: instruments.tensileFrameId, loadCellId: instruments.loadCellId }, OBSERVATIONS.D6768(), { couponId: coupon.id }) });
    // The coupon cut for it is marked tested in its ledger.
    expect((await db().coupon.findUniqueOrThrow({ where: { id: coupon.id } })).state).toBe("TESTED");
    const saved = await db().indexTest.findUniqueOrThrow({ where: { id }, include: { results: true, equipment: true } });
    // ASTM D6768 worked example (tests/unit/index-tests): mean 9.02 kN/m, sample sd 0.29766 kN/m over 5 strips.
    expect(saved.results[0]).toMatchObject({ property: "TENSILE_STRENGTH", unit: "kN/m", specimenCount: 5 });
    expect(saved.results[0]!.value).toBeCloseTo(9.02, 10);
    expect(saved.results[0]!.standardDeviation!).toBeCloseTo(0.297657, 5);
    expect(saved.equipment).toHaveLength(2);
    expect(saved.methodSettingsVersionId).toBe("method-settings-D6768-v1");

    // The technician later becomes a QA manager: still not the one to approve their own test.
    await withOwner(qa, (tx) => tx.user.update({ where: { id: technician.id }, data: { role: "QA_MANAGER" } }));
    const own = await failure(reviewIndexTest({ actor: { ...technician, role: "QA_MANAGER" }, input: { indexTestId: id, version: 1, decision: "APPROVED" } }));
    expect(own.code).toBe("FORBIDDEN");
    expect(own.message).toMatch(/You performed the Tensile strength \(ASTM D6768\)/);
    // The database refuses it too, whoever writes it.
    await expect(withOwner(qa, (tx) => tx.indexTestReview.create({ data: { indexTestId: id, reviewerId: technician.id, decision: "APPROVED" } }))).rejects.toThrow(/cannot be approved by the person who performed it/);

    await reviewIndexTest({ actor: qa, input: { indexTestId: id, version: 1, decision: "APPROVED" } });
    const matrix = await loadProjectConformance({ projectId: project.id });
    expect(matrix.rows[0]!.cells[0]).toMatchObject({ property: "TENSILE_STRENGTH", status: "conforms", unit: "kN/m" });
    expect(matrix.rows[0]!.verdict).toBe("conforms");
    // Observations are original records: not even the owner changes them.
    await expect(withOwner(qa, (tx) => tx.indexTest.update({ where: { id }, data: { value: 10 } }))).rejects.toThrow(/original records/);
  });

  it("a returned test is redone by a new test pointing at it; the returned one no longer counts", async () => {
    const { clerk, technician, qa } = await people();
    const { project, rolls } = await receiveProjectRolls(clerk, 5, [{ lot: "L1" }]);
    await specify(qa, project.id, [{ property: "FLUID_LOSS", limitText: "18", unit: "mL", direction: "MAXIMUM" }]);
    const i = await makeIndexInstruments();
    const inst = { balanceId: i.balanceId, filterPressId: i.filterPressId, cylinderId: i.cylinderId };
    const first = await recordIndexTest({ actor: technician, input: testInput(rolls[0]!.id, inst, OBSERVATIONS.D5891("19.0")) });
    expect(await codeOf(reviewIndexTest({ actor: qa, input: { indexTestId: first.id, version: 1, decision: "RETURNED", comments: "" } }))).toBe("INVALID_INPUT");
    await reviewIndexTest({ actor: qa, input: { indexTestId: first.id, version: 1, decision: "RETURNED", comments: "Filter paper was torn; repeat." } });
    expect((await loadProjectConformance({ projectId: project.id })).rows[0]!.cells[0]!.status).toBe("returned");
    const redo = await recordIndexTest({ actor: technician, input: testInput(rolls[0]!.id, inst, OBSERVATIONS.D5891("16.4"), { correctsId: first.id }) });
    await reviewIndexTest({ actor: qa, input: { indexTestId: redo.id, version: 1, decision: "APPROVED" } });
    const cell = (await loadProjectConformance({ projectId: project.id })).rows[0]!.cells[0]!;
    expect(cell).toMatchObject({ status: "conforms", value: 16.4 });
  });
});

describe("each method through the operation", () => {
  it("records mass per unit area (two results) and moisture content with the worked examples' numbers", async () => {
    const { clerk, technician } = await people();
    const { rolls, location } = await receiveProjectRolls(clerk, 5, [{ lot: "L1" }]);
    const i = await makeIndexInstruments();
    const squares = await cutCoupon({ actor: technician, input: { ...(await couponInput(rolls[0]!.id, location.id, daysAgo(3))), intendedMethodCode: "D5993" } });
    const mass = await recordIndexTest({ actor: technician, input: testInput(rolls[0]!.id, { balanceId: i.balanceId, ovenId: i.ovenId }, OBSERVATIONS.D5993(), { couponId: squares.id }) });
    const massResults = await db().indexTestResult.findMany({ where: { indexTestId: mass.id }, orderBy: { property: "asc" } });
    // ASTM D5993 worked example (tests/unit/index-tests): clay at 0 % = 170.0 g / 1.120 / 0.0400 m² = 3.7946 kg/m²; GCL 5.25 kg/m².
    expect(massResults.map((r) => [r.property, Number(r.value.toFixed(4)), r.specimenCount])).toEqual([["BENTONITE_MASS_PER_AREA", 3.7946, 3], ["GCL_MASS_PER_AREA", 5.25, 3]]);
    const moisture = await recordIndexTest({ actor: technician, input: testInput(rolls[0]!.id, { balanceId: i.balanceId, ovenId: i.ovenId }, OBSERVATIONS.D2216()) });
    // ASTM D2216 worked example: 5.20 g of water over 25.00 g of solids = 20.8 %.
    expect((await db().indexTest.findUniqueOrThrow({ where: { id: moisture.id } })).value).toBeCloseTo(20.8, 10);
    const peel = await recordIndexTest({ actor: technician, input: testInput(rolls[0]!.id, { tensileFrameId: i.tensileFrameId, loadCellId: i.loadCellId }, OBSERVATIONS.D6496(), { couponId: (await cutCoupon({ actor: technician, input: { ...(await couponInput(rolls[0]!.id, location.id, daysAgo(3))), intendedMethodCode: "D6496" } })).id }) });
    expect((await db().indexTest.findUniqueOrThrow({ where: { id: peel.id } })).value).toBeCloseTo(592, 9);
  });
});

describe("conformance matrix and sampling coverage of a project", () => {
  it("marks the failing roll, counts the tests against the area delivered and names the lots and rolls lacking a test", async () => {
    const { clerk, technician, qa } = await people();
    // Three rolls of 45 m × 4.5 m = 202.5 m² each, 607.5 m² in all; lots L1 (two rolls) and L2 (one).
    const { project, rolls } = await receiveProjectRolls(clerk, 5, [{ lot: "L1", lengthM: 45, widthM: 4.5 }, { lot: "L1", lengthM: 45, widthM: 4.5 }, { lot: "L2", lengthM: 45, widthM: 4.5 }]);
    await specify(qa, project.id, [
      { property: "SWELL_INDEX", limitText: "24", unit: "mL/2 g", direction: "MINIMUM", testingFrequencyPerLot: true },
      { property: "TENSILE_STRENGTH", limitText: "4", unit: "kN/m", direction: "MINIMUM", testingFrequencyAreaM2: "500" },
    ]);
    const i = await makeIndexInstruments();
    const [a, b, c] = rolls as [typeof rolls[0], typeof rolls[0], typeof rolls[0]];
    const swell = await recordIndexTest({ actor: technician, input: testInput(a.id, { balanceId: i.balanceId, cylinderId: i.cylinderId }, OBSERVATIONS.D5890("22.0")) });
    const tensile = await recordIndexTest({ actor: technician, input: testInput(b.id, { tensileFrameId: i.tensileFrameId, loadCellId: i.loadCellId }, OBSERVATIONS.D6768(), { couponId: (await cutCoupon({ actor: technician, input: await couponInput(b.id, (await db().roll.findUniqueOrThrow({ where: { id: b.id } })).storageLocationId!, daysAgo(3)) })).id }) });
    for (const t of [swell, tensile]) await reviewIndexTest({ actor: qa, input: { indexTestId: t.id, version: 1, decision: "APPROVED" } });

    const m = await loadProjectConformance({ projectId: project.id });
    const row = (id: string) => m.rows.find((r) => r.roll.id === id)!;
    // Roll A: 22.0 mL/2 g is below the minimum of 24 (E29 rounding to units: 22): fails, and shown.
    expect(row(a.id).verdict).toBe("fails");
    expect(row(a.id).cells[0]).toMatchObject({ property: "SWELL_INDEX", status: "fails", value: 22 });
    expect(row(a.id).cells[0]!.decision).toMatch(/does not conform/);
    // Roll B passes tensile; its swell index is not asked for (lot L1 has A's test), so it does not hold B back.
    expect(row(b.id).cells.map((x) => x.status)).toEqual(["not required", "conforms"]);
    expect(row(b.id).verdict).toBe("conforms");
    // Roll C (lot L2) still needs a swell index; tensile: 607.5 m² / 500 m² asks for 2 tests, 1 is done.
    expect(row(c.id).cells.map((x) => x.status)).toEqual(["not tested", "not tested"]);
    const swellCoverage = m.coverage.find((x) => x.property === "SWELL_INDEX")!;
    expect(swellCoverage).toMatchObject({ rule: "by lot", testsRequired: 2, testsApproved: 1, covered: false, lotsLacking: ["L2"] });
    const tensileCoverage = m.coverage.find((x) => x.property === "TENSILE_STRENGTH")!;
    expect(tensileCoverage.deliveredAreaM2).toBeCloseTo(607.5, 9);
    expect(tensileCoverage).toMatchObject({ rule: "by area", testsRequired: 2, testsApproved: 1, covered: false });
    expect(tensileCoverage.rollsLacking.sort()).toEqual([a.labNumber, c.labNumber].sort());
    expect(m.waiting.get(c.id)!.map((w) => w.methodCode)).toEqual(["D5890", "D6768"]);
  });
});

describe("a delivered size given later", () => {
  it("is a receipt correction with a reason, and the coverage counts the area from then on", async () => {
    const { clerk, qa } = await people();
    const { project, rolls } = await receiveProjectRolls(clerk, 5, [{ lot: "L1", lengthM: 45, widthM: 4.5 }, { lot: "L1" }]);
    await specify(qa, project.id, [{ property: "TENSILE_STRENGTH", limitText: "4", unit: "kN/m", direction: "MINIMUM", testingFrequencyAreaM2: "300" }]);
    const before = (await loadProjectConformance({ projectId: project.id })).coverage[0]!;
    expect(before).toMatchObject({ testsRequired: 1, rollsWithoutSize: [rolls[1]!.labNumber] });
    expect(before.deliveredAreaM2).toBeCloseTo(202.5, 9);
    const roll = rolls[1]!;
    expect((await failure(correctReceipt({ actor: clerk, input: { target: "roll", id: roll.id, field: "deliveredLengthM", value: "0", reason: "Roll length from the delivery note", version: 1 } }))).fieldErrors.value).toMatch(/more than 0/);
    await correctReceipt({ actor: clerk, input: { target: "roll", id: roll.id, field: "deliveredLengthM", value: "45", reason: "Roll length from the delivery note", version: 1 } });
    await correctReceipt({ actor: clerk, input: { target: "roll", id: roll.id, field: "deliveredWidthM", value: "4.5", reason: "Roll width from the delivery note", version: 2 } });
    // 2 × 202.5 m² = 405 m² at one tensile test per 300 m²: 2 tests.
    const after = (await loadProjectConformance({ projectId: project.id })).coverage[0]!;
    expect(after).toMatchObject({ testsRequired: 2, rollsWithoutSize: [] });
  });
});

describe("bad input is refused with a message naming the field, and nothing is saved", () => {
  it("dry above wet, tare above dry, a swell volume above the cylinder, too few tensile strips, a negative force, a frequency of zero, an instrument out of calibration", async () => {
    const { clerk, technician, qa } = await people();
    const { project, rolls, location } = await receiveProjectRolls(clerk, 5, [{ lot: "L1" }]);
    const spec = await specify(qa, project.id, []);
    const i = await makeIndexInstruments();
    const roll = rolls[0]!;
    const coupon = await cutCoupon({ actor: technician, input: { ...(await couponInput(roll.id, location.id, daysAgo(3))), intendedMethodCode: "D6768" } });
    const oven = { balanceId: i.balanceId, ovenId: i.ovenId };
    const strips = { tensileFrameId: i.tensileFrameId, loadCellId: i.loadCellId };
    const field = async (input: object) => (await failure(recordIndexTest({ actor: technician, input }))).fieldErrors;

    expect((await field(testInput(roll.id, oven, { ...OBSERVATIONS.D2216(), dryWithTareG: "46.00" })))["observations.dryWithTareG"]).toMatch(/dry mass \(46 g\) is above the wet mass \(45.3 g\)/);
    expect((await field(testInput(roll.id, oven, { ...OBSERVATIONS.D2216(), tareG: "41" })))["observations.tareG"]).toMatch(/container's mass \(41 g\) is not below the dry mass/);
    expect((await field(testInput(roll.id, { balanceId: i.balanceId, cylinderId: i.cylinderId }, OBSERVATIONS.D5890("104"))))["observations.settledVolumeMl"]).toBe("The settled volume cannot be above the cylinder's capacity of 100 mL; check the reading.");
    expect((await field(testInput(roll.id, strips, OBSERVATIONS.D6768(["912", "887", "945"]), { couponId: coupon.id })))["observations.specimens"]).toBe("ASTM D6768 as the lab runs it needs at least 5 specimens; enter 5 or more.");
    expect((await field(testInput(roll.id, strips, OBSERVATIONS.D6768(["912", "-887", "945", "901", "865"]), { couponId: coupon.id })))["observations.specimens.1.peakForceN"]).toBe("A force cannot be negative; enter the peak force the load cell read.");
    expect((await field(testInput(roll.id, strips, OBSERVATIONS.D6768()))).couponId).toMatch(/Choose the coupon of tensile strips/);
    const zero = await failure(setSpecificationLimit({ actor: qa, input: { specificationId: spec.id, property: "TENSILE_STRENGTH", limitText: "4", unit: "kN/m", direction: "MINIMUM", conformanceMethod: "ROUNDING", testingFrequencyAreaM2: "0" } }));
    expect(zero.fieldErrors.testingFrequencyAreaM2).toBe("The testing frequency must be more than 0 m² per test; leave it blank when the specification sets none.");
    // A balance whose calibration ran out is refused for a test.
    const stale = await makeIndexInstrument("BALANCE", { calibratedDaysAgo: 400 });
    const refused = await failure(recordIndexTest({ actor: technician, input: testInput(roll.id, { ...oven, balanceId: stale.id }, OBSERVATIONS.D2216()) }));
    expect(refused.code).toBe("ILLEGAL_TRANSITION");
    expect(refused.message).toMatch(/cannot be used for a test/);

    expect(await db().indexTest.count({ where: { rollId: roll.id } })).toBe(0);
    expect(await db().specificationLimit.count({ where: { specificationId: spec.id } })).toBe(0);
    expect((await db().coupon.findUniqueOrThrow({ where: { id: coupon.id } })).state).toBe("CUT");
  });
});
