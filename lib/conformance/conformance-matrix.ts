/**
 * One verdict per roll: for every property the specification lists, the roll's approved result, the limit,
 * the ASTM E29 decision and what is still pending. A failing result is marked and never hidden; a roll
 * conforms only when every listed property has an approved result that conforms. Pure.
 */
import { explainConformance, type SpecificationLimitInput } from "../results/conformance-summary";
import type { TestProperty } from "../results/property-units";

export type MatrixLimit = SpecificationLimitInput & { property: TestProperty; testMethodCode: string | null; testingFrequencyAreaM2?: number | null; testingFrequencyPerLot?: boolean };
export type MatrixRoll = { id: string; labNumber: string; rollNumber: string; lotNumber: string };
/** A result or a test in progress for a roll. `stage`: approved, awaiting review, returned for changes, or under way. */
export type MatrixEntry = {
  rollId: string;
  property: TestProperty;
  stage: "approved" | "submitted" | "returned" | "in-progress";
  value: number | null;
  unit: string | null;
  standardDeviation?: number | null;
  expandedUncertainty?: number | null;
  /** The run or test it comes from, for the link ("T-2026-0004", or an index test's method). */
  source: string;
  at: Date;
};

export type MatrixCell = {
  property: TestProperty;
  status: "conforms" | "fails" | "awaiting review" | "returned" | "in progress" | "not tested" | "not required";
  value: number | null;
  unit: string | null;
  standardDeviation: number | null;
  expandedUncertainty: number | null;
  /** The E29 decision in words, for an approved result. */
  decision: string | null;
  source: string | null;
};

export type MatrixRow = { roll: MatrixRoll; cells: MatrixCell[]; verdict: "conforms" | "fails" | "pending" };

const PENDING_ORDER: Record<MatrixEntry["stage"], number> = { approved: 0, submitted: 1, returned: 2, "in-progress": 3 };

/**
 * The matrix: one row per roll, one cell per limit. `required(rollId, property)` says whether the roll is
 * asked for that property at all (sampling frequency); a property it is not asked for and has no result
 * for reads "not required" and does not hold the verdict back.
 */
export function conformanceMatrix(
  rolls: readonly MatrixRoll[],
  limits: readonly MatrixLimit[],
  entries: readonly MatrixEntry[],
  required: (rollId: string, property: TestProperty) => boolean = () => true,
): MatrixRow[] {
  return rolls.map((roll) => {
    const cells = limits.map((limit): MatrixCell => {
      const mine = entries.filter((e) => e.rollId === roll.id && e.property === limit.property);
      const approved = mine.filter((e) => e.stage === "approved" && e.value !== null).sort((a, b) => b.at.getTime() - a.at.getTime())[0];
      if (approved) {
        const explained = explainConformance({ value: approved.value!, unit: approved.unit! }, limit);
        return {
          property: limit.property, status: explained.summary.conforms ? "conforms" : "fails", value: approved.value, unit: approved.unit,
          standardDeviation: approved.standardDeviation ?? null, expandedUncertainty: approved.expandedUncertainty ?? null,
          decision: explained.summary.statement, source: approved.source,
        };
      }
      const open = [...mine].sort((a, b) => PENDING_ORDER[a.stage] - PENDING_ORDER[b.stage])[0];
      const base = { property: limit.property, value: null, unit: null, standardDeviation: null, expandedUncertainty: null, decision: null };
      if (open) return { ...base, status: open.stage === "submitted" ? "awaiting review" : open.stage === "returned" ? "returned" : "in progress", source: open.source };
      return { ...base, status: required(roll.id, limit.property) ? "not tested" : "not required", source: null };
    });
    const verdict = cells.some((c) => c.status === "fails") ? "fails" : cells.every((c) => c.status === "conforms" || c.status === "not required") ? "conforms" : "pending";
    return { roll, cells, verdict };
  });
}
