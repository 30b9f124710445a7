import "server-only";
import type { UnitSystem } from "@/lib/format/result-numbers";
import type { Tx } from "../db/transaction";
import type { Db } from "../db/client";

/** What a revision says (or will say): the newest content version, or for a revision without one, all its results. */
export type DraftContent = {
  /** 0 when the revision has no content version yet. */
  version: number;
  resultIds: string[];
  /** Approved index-test results included (IndexTestResult ids). */
  indexResultIds: string[];
  specificationId: string | null;
  remarks: string;
  signatoryId: string | null;
  unitSystem: UnitSystem;
};

/**
 * The content of a revision: its newest CertificateDraftContent row. A revision drafted before content
 * versions existed includes every result on it and the project's newest specification.
 */
export async function readDraftContent(db: Tx | Db, revisionId: string): Promise<DraftContent> {
  const latest = await db.certificateDraftContent.findFirst({ where: { revisionId }, orderBy: { version: "desc" } });
  if (latest) {
    return { version: latest.version, resultIds: latest.resultIds, indexResultIds: latest.indexResultIds, specificationId: latest.specificationId, remarks: latest.remarks, signatoryId: latest.signatoryId, unitSystem: latest.unitSystem };
  }
  const revision = await db.certificateRevision.findUniqueOrThrow({ where: { id: revisionId }, select: { results: { select: { resultId: true } }, indexResults: { select: { indexTestResultId: true } }, certificate: { select: { projectId: true } } } });
  const specification = await db.specification.findFirst({ where: { projectId: revision.certificate.projectId, isTemplate: false }, orderBy: [{ createdAt: "desc" }, { id: "desc" }], select: { id: true } });
  return { version: 0, resultIds: revision.results.map((r) => r.resultId), indexResultIds: revision.indexResults.map((r) => r.indexTestResultId), specificationId: specification?.id ?? null, remarks: "", signatoryId: null, unitSystem: "SI" };
}
