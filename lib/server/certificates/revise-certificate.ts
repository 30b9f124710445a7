import "server-only";
import { randomBytes } from "node:crypto";
import { AppError } from "@/lib/errors/app-error";
import { newVerificationCode } from "@/lib/certificates/verification-code";
import { reviseCertificateSchema } from "@/lib/validation/certificates";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { isUniqueViolation } from "../db/database-fault";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { explainCertificateCollision } from "./certificate-collision";
import { readDraftContent } from "./draft-content";

/**
 * A correction of an issued certificate: a new draft revision with the reason, starting from the issued
 * revision's content (results, specification, remarks, units), pointing at the revision it will supersede
 * once it is signed and issued. The draft can then be changed; the issued one never is.
 */
export async function reviseCertificate(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "certificate.issue");
  const input = parseOrThrow(reviseCertificateSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const revisions = await tx.certificateRevision.findMany({ where: { certificateId: input.certificateId }, orderBy: { revision: "desc" }, include: { results: true, certificate: { select: { number: true } } } });
    const latest = revisions[0];
    if (!latest) throw new AppError("NOT_FOUND");
    if (latest.status === "DRAFT") throw new AppError("ILLEGAL_TRANSITION", `${latest.certificate.number} revision ${latest.revision} is still a draft: issue or change that one.`);
    if (latest.status !== "ISSUED") throw new AppError("ILLEGAL_TRANSITION", `Revision ${latest.revision} is ${latest.status.toLowerCase()}; only the issued revision can be corrected.`);
    // The new draft starts as the issued revision reads; the QA manager then changes what needs correcting.
    const content = await readDraftContent(tx, latest.id);
    const created = await tx.certificateRevision.create({
      data: {
        certificateId: input.certificateId, revision: latest.revision + 1, status: "DRAFT", reason: input.reason, supersedesId: latest.id,
        verificationCode: newVerificationCode(randomBytes(12)), results: { create: content.resultIds.map((resultId) => ({ resultId })) },
        indexResults: { create: content.indexResultIds.map((indexTestResultId) => ({ indexTestResultId })) },
      },
      select: { id: true, revision: true },
    });
    await tx.certificateDraftContent.create({
      data: { revisionId: created.id, version: 1, resultIds: content.resultIds, indexResultIds: content.indexResultIds, specificationId: content.specificationId, remarks: content.remarks, signatoryId: content.signatoryId, unitSystem: content.unitSystem, createdById: options.actor.id },
    });
    return created;
  }).catch(async (error: unknown) => {
    // Two corrections at once: the unique revision number (and supersedes link) lets one through.
    if (!isUniqueViolation(error)) throw error;
    const number = (await getDb().certificate.findUnique({ where: { id: input.certificateId }, select: { number: true } }))?.number;
    throw explainCertificateCollision(error, number) ?? error;
  });
}
