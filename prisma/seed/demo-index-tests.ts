// The demo's index tests: computed by lib/index-tests exactly as recording one in the app computes it, at
// several stages (approved, awaiting review, not yet done), with one roll whose swell index fails its
// limit. Instruments are the demo's calibrated balance, oven, cylinder, filter press, frame and load cell.
import { evaluateIndexTest, type IndexObservations } from "@/lib/index-tests/evaluate-index-test";
import { INDEX_METHODS, type IndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { methodSettingsDefinition } from "@/lib/methods/registry";
import { readStoredSettings } from "@/lib/methods/settings-definition";
import type { Tx } from "@/lib/server/db/transaction";

type Ids = Record<string, string>;
type Coupon = { id: string; labNumber: string };
type Roll = { id: string; labNumber: string };

const INSTRUMENT_TAGS: Record<string, string> = { balanceId: "BAL-01", ovenId: "OVN-01", cylinderId: "GC-01", filterPressId: "FP-01", tensileFrameId: "TF-01", loadCellId: "LC-01" };

const strips = (forces: number[]) => forces.map((peakForceN) => ({ widthMm: 100, peakForceN }));
const peels = (forces: number[]) => forces.map((peelForceN) => ({ widthMm: 100, peelForceN }));
const squares = (masses: number[]) => masses.map((totalMassG) => ({ lengthMm: 200, widthMm: 200, totalMassG, geotextileMassG: 40 }));
const clayMoisture = { wetWithTareG: 38.4, dryWithTareG: 36.0, tareG: 16.0 };

export const DEMO_OBSERVATIONS = {
  swellGood: { methodCode: "D5890", dryClayMassG: 2.0, settledVolumeMl: 27.5, hydrationHours: 18, waterTemperatureC: 21 },
  swellLow: { methodCode: "D5890", dryClayMassG: 2.0, settledVolumeMl: 22.0, hydrationHours: 17, waterTemperatureC: 21 },
  swellThird: { methodCode: "D5890", dryClayMassG: 2.0, settledVolumeMl: 26.0, hydrationHours: 16.5, waterTemperatureC: 20 },
  fluid: { methodCode: "D5891", clayMassG: 22.5, waterVolumeMl: 350, pressureKPa: 690, filtrationMinutes: 30, filtrateVolumeMl: 16.4 },
  fluidSecond: { methodCode: "D5891", clayMassG: 22.5, waterVolumeMl: 350, pressureKPa: 690, filtrationMinutes: 30, filtrateVolumeMl: 17.1 },
  mass: { methodCode: "D5993", ...clayMoisture, specimens: squares([210, 214, 205]) },
  massSecond: { methodCode: "D5993", ...clayMoisture, specimens: squares([208, 206, 211]) },
  massThird: { methodCode: "D5993", ...clayMoisture, specimens: squares([212, 213, 209]) },
  tensile: { methodCode: "D6768", direction: "MD", specimens: strips([912, 887, 945, 901, 865]) },
  tensileSecond: { methodCode: "D6768", direction: "MD", specimens: strips([874, 902, 858, 931, 889]) },
  peel: { methodCode: "D6496", specimens: peels([61.0, 55.5, 58.3, 64.2, 57.0]) },
} as const satisfies Record<string, IndexObservations>;

export async function createIndexEquipment(add: (assetTag: string, kind: "BALANCE" | "OVEN" | "GRADUATED_CYLINDER" | "FILTER_PRESS" | "TENSILE_FRAME" | "LOAD_CELL", name: string, calibratedDaysAgo: number, values?: Record<string, number>) => Promise<void>) {
  await add("BAL-01", "BALANCE", "Analytical balance, 0.01 g", 80, { standardUncertainty: 0.01 });
  await add("OVN-01", "OVEN", "Drying oven, 110 °C", 140, { standardUncertainty: 2 });
  await add("GC-01", "GRADUATED_CYLINDER", "Graduated cylinder, 100 mL, class A", 200, { standardUncertainty: 0.3 });
  await add("FP-01", "FILTER_PRESS", "Filter press, 690 kPa", 110, { standardUncertainty: 5 });
  await add("TF-01", "TENSILE_FRAME", "Tensile testing frame, 10 kN", 160);
  await add("LC-01", "LOAD_CELL", "Load cell, 5 kN", 160, { standardUncertainty: 2 });
}

/**
 * Records one index test on a roll (and the coupon it used), reviewed `review` days ago when given. The
 * coupon's ledger records the test; the test takes the method's settings version 1 (as installed).
 */
export function demoIndexTester(ctx: {
  tx: Tx; ago: (days: number) => Date; equipment: Ids; qaId: string;
  custody: (item: { kind: "coupon"; id: string }, action: "TESTED", from: "CUT", to: "TESTED", actorId: string, at: Date, extra?: { note?: string }) => Promise<unknown>;
}) {
  return async (roll: Roll, observations: IndexObservations, tech: string, testedDaysAgo: number, options: { coupon?: Coupon; approvedDaysAgo?: number } = {}) => {
    const code = observations.methodCode as IndexMethodCode;
    const method = INDEX_METHODS[code];
    const settings = readStoredSettings(methodSettingsDefinition(code)!, {}) as Record<string, unknown> & { expandedUncertainty: number | null; coverageFactor: number };
    const evaluation = evaluateIndexTest(observations, settings);
    const main = evaluation.results[0]!;
    const testedAt = ctx.ago(testedDaysAgo);
    const approvedAt = options.approvedDaysAgo === undefined ? null : ctx.ago(options.approvedDaysAgo);
    const test = await ctx.tx.indexTest.create({
      data: {
        rollId: roll.id, couponId: options.coupon?.id ?? null, property: main.property, methodCode: code, value: main.value, unit: main.unit, testedAt, performedById: tech,
        observations: observations as object, evaluation: { ...evaluation, settingsVersion: 1 }, methodSettingsVersionId: `method-settings-${code}-v1`,
        state: approvedAt ? "APPROVED" : "SUBMITTED", approvedById: approvedAt ? ctx.qaId : null, approvedAt,
        results: { create: evaluation.results.map((r) => ({ property: r.property, value: r.value, unit: r.unit, standardDeviation: r.standardDeviation, specimenCount: r.specimenCount, expandedUncertainty: r.expandedUncertainty, coverageFactor: r.coverageFactor, createdAt: testedAt })) },
        equipment: { create: method.instruments.map((i) => ({ equipmentId: ctx.equipment[INSTRUMENT_TAGS[i.key]!]!, calibrationId: ctx.equipment[`${INSTRUMENT_TAGS[i.key]!}:cal`]!, role: i.label.toLowerCase() })) },
      },
    });
    if (approvedAt) await ctx.tx.indexTestReview.create({ data: { indexTestId: test.id, reviewerId: ctx.qaId, decision: "APPROVED", comments: "Observations complete; instruments in calibration.", createdAt: approvedAt } });
    if (options.coupon) {
      await ctx.custody({ kind: "coupon", id: options.coupon.id }, "TESTED", "CUT", "TESTED", tech, testedAt, { note: `${method.title} on roll ${roll.labNumber}` });
      await ctx.tx.coupon.update({ where: { id: options.coupon.id }, data: { state: "TESTED" } });
    }
    return test;
  };
}
