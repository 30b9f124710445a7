/**
 * Sampling coverage of a project: for each property its specification tests at a frequency (one test per
 * so many m² delivered, and/or one per lot), how many tests the delivered area asks for, how many are
 * done, and which lots and rolls still lack one. A property with no frequency is tested on every roll.
 * Pure.
 */
import type { TestProperty } from "../results/property-units";

export type CoverageRoll = { id: string; labNumber: string; lotNumber: string; deliveredLengthM: number | null; deliveredWidthM: number | null };
export type CoverageLimit = { property: TestProperty; testingFrequencyAreaM2: number | null; testingFrequencyPerLot: boolean };
/** Which rolls have a test of the property, and how far it got. "open": recorded or running, not yet approved. */
export type CoverageTest = { rollId: string; property: TestProperty; stage: "approved" | "open" };

export type PropertyCoverage = {
  property: TestProperty;
  rule: "every roll" | "by area" | "by lot" | "by area and lot";
  deliveredAreaM2: number;
  /** Rolls with no delivered size: their area is not counted, and the page says so. */
  rollsWithoutSize: string[];
  testsRequired: number;
  testsApproved: number;
  testsOpen: number;
  covered: boolean;
  lotsLacking: string[];
  rollsLacking: string[];
};

/** "1 per 4,000 m² delivered and 1 per lot"; "every roll" when the specification sets no frequency. */
export function describeTestingFrequency(areaM2: number | null, perLot: boolean): string {
  const parts = [areaM2 !== null ? `1 per ${areaM2.toLocaleString("en-GB")} m² delivered` : null, perLot ? "1 per lot" : null].filter(Boolean);
  return parts.length === 0 ? "every roll" : parts.join(" and ");
}

/** Area of a delivered roll, m², or null when its size was not recorded. */
export function deliveredAreaM2(roll: Pick<CoverageRoll, "deliveredLengthM" | "deliveredWidthM">): number | null {
  return roll.deliveredLengthM !== null && roll.deliveredWidthM !== null ? roll.deliveredLengthM * roll.deliveredWidthM : null;
}

/** Coverage of each limited property over the project's rolls. */
export function samplingCoverage(rolls: readonly CoverageRoll[], limits: readonly CoverageLimit[], tests: readonly CoverageTest[]): PropertyCoverage[] {
  const area = rolls.reduce((sum, r) => sum + (deliveredAreaM2(r) ?? 0), 0);
  const rollsWithoutSize = rolls.filter((r) => deliveredAreaM2(r) === null).map((r) => r.labNumber);
  const lots = [...new Set(rolls.map((r) => r.lotNumber))].sort();
  return limits.map((limit) => {
    const mine = tests.filter((t) => t.property === limit.property);
    const testedRolls = new Set(mine.map((t) => t.rollId));
    const approvedRolls = new Set(mine.filter((t) => t.stage === "approved").map((t) => t.rollId));
    const testsApproved = approvedRolls.size;
    const testsOpen = [...testedRolls].filter((id) => !approvedRolls.has(id)).length;
    const byArea = limit.testingFrequencyAreaM2 !== null;
    const byLot = limit.testingFrequencyPerLot;
    const rule = byArea && byLot ? "by area and lot" : byArea ? "by area" : byLot ? "by lot" : "every roll";
    const lotsLacking = byLot ? lots.filter((lot) => !rolls.some((r) => r.lotNumber === lot && approvedRolls.has(r.id))) : [];
    let testsRequired: number;
    if (!byArea && !byLot) testsRequired = rolls.length;
    else {
      const forArea = byArea && rolls.length > 0 ? Math.max(1, Math.ceil(area / limit.testingFrequencyAreaM2! - 1e-9)) : 0;
      testsRequired = Math.max(forArea, byLot ? lots.length : 0);
    }
    const covered = testsApproved >= testsRequired && lotsLacking.length === 0;
    // Which untested rolls could make up the shortfall: every roll without an approved test when the
    // rule is every roll; otherwise the rolls of lacking lots, or any untested roll when the area is short.
    const untested = rolls.filter((r) => !approvedRolls.has(r.id));
    const rollsLacking =
      rule === "every roll" ? untested.map((r) => r.labNumber)
      : covered ? []
      : untested.filter((r) => lotsLacking.includes(r.lotNumber) || testsApproved < testsRequired).map((r) => r.labNumber);
    return { property: limit.property, rule, deliveredAreaM2: area, rollsWithoutSize, testsRequired, testsApproved, testsOpen, covered, lotsLacking, rollsLacking };
  });
}

/**
 * Whether one roll is asked for a test of the property: always when the specification tests every roll;
 * under a frequency, when its lot has no test yet, or the project's tests so far (approved or open) fall
 * short of the area delivered.
 */
export function rollNeedsTest(roll: CoverageRoll, coverage: PropertyCoverage, tests: readonly CoverageTest[], rolls: readonly CoverageRoll[]): boolean {
  const mine = tests.filter((t) => t.property === coverage.property);
  if (mine.some((t) => t.rollId === roll.id)) return false;
  if (coverage.rule === "every roll") return true;
  const lotTested = rolls.some((r) => r.lotNumber === roll.lotNumber && mine.some((t) => t.rollId === r.id));
  if ((coverage.rule === "by lot" || coverage.rule === "by area and lot") && !lotTested) return true;
  const taken = new Set(mine.map((t) => t.rollId)).size;
  return coverage.rule !== "by lot" && taken < coverage.testsRequired;
}
