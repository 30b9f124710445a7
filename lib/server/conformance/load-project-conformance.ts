import "server-only";
import { conformanceMatrix, type MatrixEntry, type MatrixLimit, type MatrixRow } from "@/lib/conformance/conformance-matrix";
import { rollNeedsTest, samplingCoverage, type CoverageTest, type PropertyCoverage } from "@/lib/conformance/sampling-coverage";
import { INDEX_METHODS, isIndexMethodCode } from "@/lib/index-tests/index-test-methods";
import type { TestProperty } from "@/lib/results/property-units";
import { getDb, type Db } from "../db/client";
import type { Tx } from "../db/transaction";
import { findProjectLimits } from "../specifications/find-project-limits";

export type ProjectConformance = {
  specificationName: string | null;
  limits: MatrixLimit[];
  rows: MatrixRow[];
  coverage: PropertyCoverage[];
  /** Per roll id, the index tests it is asked for and has no test of yet (the technician's queue). */
  waiting: Map<string, { property: TestProperty; methodCode: string; methodTitle: string }[]>;
};

// The properties a run in progress will give: D5887 reports index flux and k; the others k.
const RUN_PROPERTIES = (methodCode: string): TestProperty[] => (methodCode === "D5887" ? ["INDEX_FLUX", "HYDRAULIC_CONDUCTIVITY"] : ["HYDRAULIC_CONDUCTIVITY"]);

/**
 * The conformance matrix and sampling coverage of one project's rolls (or one roll of it) against the
 * project's newest specification: approved results of runs and index tests, what is awaiting review,
 * returned or under way, and what is not tested yet. No permission check: a building block for operations
 * that made their own (the roll page, the project page, the portal, the technician's queue).
 */
export async function loadProjectConformance(options: { projectId: string; rollId?: string; specificationId?: string; tx?: Tx | Db }): Promise<ProjectConformance> {
  const db = options.tx ?? getDb();
  // A certificate draft may name one of the project's specifications; otherwise the newest applies.
  const spec = await findProjectLimits({ projectId: options.projectId, specificationId: options.specificationId, tx: db });
  const rolls = await db.roll.findMany({
    where: { projectId: options.projectId },
    orderBy: { labNumber: "asc" },
    select: {
      id: true, labNumber: true, rollNumber: true, lotNumber: true, deliveredLengthM: true, deliveredWidthM: true,
      indexTests: {
        where: { correctedBy: null },
        select: { id: true, methodCode: true, state: true, testedAt: true, approvedAt: true, results: { select: { property: true, value: true, unit: true, standardDeviation: true, expandedUncertainty: true } } },
      },
      coupons: { select: { specimens: { select: { runs: { where: { state: { not: "ABANDONED" } }, select: { labNumber: true, methodCode: true, state: true, assignedAt: true, results: { where: { approvedAt: { not: null } }, select: { property: true, value: true, unit: true, expandedUncertainty: true, approvedAt: true } } } } } } } },
    },
  });
  const entries: MatrixEntry[] = [];
  for (const roll of rolls) {
    for (const t of roll.indexTests) {
      const title = isIndexMethodCode(t.methodCode) ? INDEX_METHODS[t.methodCode].title : t.methodCode;
      const stage = t.state === "APPROVED" ? "approved" : t.state === "SUBMITTED" ? "submitted" : "returned";
      for (const r of t.results)
        entries.push({ rollId: roll.id, property: r.property, stage, value: stage === "approved" ? r.value : null, unit: r.unit, standardDeviation: r.standardDeviation, expandedUncertainty: r.expandedUncertainty, source: title, at: t.approvedAt ?? t.testedAt });
    }
    for (const run of roll.coupons.flatMap((c) => c.specimens.flatMap((s) => s.runs))) {
      if (run.state === "APPROVED") {
        for (const r of run.results) entries.push({ rollId: roll.id, property: r.property, stage: "approved", value: r.value, unit: r.unit, expandedUncertainty: r.expandedUncertainty, source: run.labNumber, at: r.approvedAt! });
        continue;
      }
      const stage = run.state === "SUBMITTED" ? "submitted" : run.state === "RETURNED" ? "returned" : "in-progress";
      for (const property of RUN_PROPERTIES(run.methodCode)) entries.push({ rollId: roll.id, property, stage, value: null, unit: null, source: run.labNumber, at: run.assignedAt });
    }
  }
  const limits: MatrixLimit[] = (spec?.limits ?? []).map((l) => ({ property: l.property, limitText: l.limitText, unit: l.unit, direction: l.direction, conformanceMethod: l.conformanceMethod, testMethodCode: l.testMethodCode, testingFrequencyAreaM2: l.testingFrequencyAreaM2 ?? null, testingFrequencyPerLot: l.testingFrequencyPerLot ?? false }));
  const coverageLimits = (spec?.limits ?? []).map((l) => ({ property: l.property, testingFrequencyAreaM2: l.testingFrequencyAreaM2 ?? null, testingFrequencyPerLot: l.testingFrequencyPerLot ?? false }));
  const tests: CoverageTest[] = entries.map((e) => ({ rollId: e.rollId, property: e.property, stage: e.stage === "approved" ? "approved" : "open" }));
  const coverage = samplingCoverage(rolls, coverageLimits, tests);
  const byProperty = new Map(coverage.map((c) => [c.property, c]));
  const required = (rollId: string, property: TestProperty) => {
    const c = byProperty.get(property);
    const roll = rolls.find((r) => r.id === rollId)!;
    return !c || rollNeedsTest(roll, c, tests, rolls);
  };
  const shown = options.rollId ? rolls.filter((r) => r.id === options.rollId) : rolls;
  const rows = conformanceMatrix(shown, limits, entries, required);
  const waiting = new Map<string, { property: TestProperty; methodCode: string; methodTitle: string }[]>();
  for (const row of rows) {
    const list = row.cells
      .filter((c) => c.status === "not tested" || c.status === "returned")
      .map((c) => ({ property: c.property, method: Object.values(INDEX_METHODS).find((m) => m.properties.includes(c.property)) }))
      .filter((x): x is { property: TestProperty; method: (typeof INDEX_METHODS)[keyof typeof INDEX_METHODS] } => x.method !== undefined)
      .map((x) => ({ property: x.property, methodCode: x.method.code, methodTitle: x.method.title }));
    if (list.length) waiting.set(row.roll.id, list);
  }
  return { specificationName: spec?.specificationName ?? null, limits, rows, coverage, waiting };
}
