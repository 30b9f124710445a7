import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { INDEX_METHODS, isIndexMethodCode } from "@/lib/index-tests/index-test-methods";
import type { Db } from "../db/client";
import type { Tx } from "../db/transaction";
import { LIVE_REVISION_STATES } from "./certificate-collision";

/** How an index test is named in sentences: "the swell index (ASTM D5890) of R26-00012". */
export function indexTestName(test: { methodCode: string; roll: { labNumber: string } }): string {
  const title = isIndexMethodCode(test.methodCode) ? INDEX_METHODS[test.methodCode].title : `ASTM ${test.methodCode}`;
  return `the ${title.charAt(0).toLowerCase()}${title.slice(1)} of ${test.roll.labNumber}`;
}

/**
 * Refuses approved index-test results another live certificate includes (as the database's trigger does),
 * naming the first such result and certificate. A result on a draft whose newest content leaves it out is free.
 */
export async function refuseIndexResultsOnLiveCertificates(db: Tx | Db, indexResultIds: string[], exceptCertificateId?: string): Promise<void> {
  if (indexResultIds.length === 0) return;
  const held = await db.certificateIndexResult.findMany({
    where: { indexTestResultId: { in: indexResultIds }, revision: { status: { in: [...LIVE_REVISION_STATES] }, ...(exceptCertificateId ? { certificateId: { not: exceptCertificateId } } : {}) } },
    select: {
      indexTestResultId: true,
      indexTestResult: { select: { indexTest: { select: { methodCode: true, roll: { select: { labNumber: true } } } } } },
      revision: { select: { certificate: { select: { number: true } }, contents: { orderBy: { version: "desc" }, take: 1, select: { indexResultIds: true } } } },
    },
  });
  const holding = held.find((h) => h.revision.contents.length === 0 || h.revision.contents[0]!.indexResultIds.includes(h.indexTestResultId));
  if (holding)
    throw new AppError("CONFLICT", `The result of ${indexTestName(holding.indexTestResult.indexTest)} is already on certificate ${holding.revision.certificate.number}; correct that certificate by a revision instead.`, {
      details: { collidedWith: holding.revision.certificate.number },
    });
}

/**
 * Checks index-test results chosen for a project's certificate: each exists, belongs to one of the
 * project's rolls, and comes from an approved test that no later test corrects. Returns the ids.
 */
export async function checkIndexResultsForProject(tx: Tx, indexResultIds: string[], projectId: string): Promise<string[]> {
  const ids = [...new Set(indexResultIds)];
  if (ids.length === 0) return ids;
  const results = await tx.indexTestResult.findMany({
    where: { id: { in: ids } },
    select: { id: true, indexTest: { select: { methodCode: true, state: true, correctedBy: { select: { id: true } }, roll: { select: { labNumber: true, projectId: true } } } } },
  });
  if (results.length !== ids.length) throw new AppError("NOT_FOUND", "One of the chosen index-test results does not exist.");
  const stray = results.find((r) => r.indexTest.roll.projectId !== projectId);
  if (stray) throw new AppError("INVALID_INPUT", `The result of ${indexTestName(stray.indexTest)} belongs to another project.`, { fieldErrors: { indexResultIds: "Only this project's results." } });
  const unapproved = results.find((r) => r.indexTest.state !== "APPROVED" || r.indexTest.correctedBy);
  if (unapproved)
    throw new AppError("INVALID_INPUT", `The result of ${indexTestName(unapproved.indexTest)} is not an approved, current test.`, { fieldErrors: { indexResultIds: "Only approved index-test results." } });
  return ids;
}
