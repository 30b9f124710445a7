import "server-only";
import { inSentence } from "@/lib/format/sentence-case";
import { TEST_PROPERTY_LABELS, type TestProperty } from "@/lib/results/property-units";
import type { Db } from "../db/client";
import type { Tx } from "../db/transaction";
import { findProjectLimits } from "../specifications/find-project-limits";
import { indexTestName } from "./index-results";
import type { DraftContent } from "./draft-content";

/**
 * The sentence signing refuses a result with when the specification sets no limit for its property; the
 * draft editor and the new-certificate screen show the same words beside such a result beforehand.
 */
export function missingLimitMessage(specificationName: string, line: { property: TestProperty; of: string }): string {
  return `${specificationName} sets no limit for ${inSentence(TEST_PROPERTY_LABELS[line.property])} (the result of ${line.of}): choose a specification that does, or leave the result out.`;
}

/**
 * What stops a draft from being issued, one sentence each (none: it can be signed): no results included,
 * or a chosen specification without a limit for an included result's property.
 */
export async function draftProblems(db: Tx | Db, options: { projectId: string; content: DraftContent }): Promise<Array<{ field: "resultIds" | "specificationId"; message: string }>> {
  const { content } = options;
  if (content.resultIds.length + content.indexResultIds.length === 0) return [{ field: "resultIds", message: "The draft includes no results: include at least one approved result before signing." }];
  if (!content.specificationId) return [];
  const limits = await findProjectLimits({ projectId: options.projectId, specificationId: content.specificationId, tx: db });
  if (!limits) return [{ field: "specificationId", message: "The chosen specification no longer belongs to this project: choose another." }];
  const results = await db.result.findMany({ where: { id: { in: content.resultIds } }, select: { property: true, run: { select: { labNumber: true } } } });
  const indexResults = await db.indexTestResult.findMany({ where: { id: { in: content.indexResultIds } }, select: { property: true, indexTest: { select: { methodCode: true, roll: { select: { labNumber: true } } } } } });
  const lines = [
    ...results.map((r) => ({ property: r.property as TestProperty, of: r.run.labNumber })),
    ...indexResults.map((r) => ({ property: r.property as TestProperty, of: indexTestName(r.indexTest) })),
  ];
  return lines
    .filter((r) => !limits.get(r.property))
    .map((r) => ({ field: "specificationId" as const, message: missingLimitMessage(limits.specificationName, r) }));
}
