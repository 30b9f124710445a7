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

/**
 * A correction of an issued certificate: a new draft revision with the reason, the same results, pointing
 * at the revision it will supersede once it is signed and issued. The issued one is never changed.
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
    return tx.certificateRevision.create({
      data: {
        certificateId: input.certificateId, revision: latest.revision + 1, status: "DRAFT", reason: input.reason, supersedesId: latest.id,
        verificationCode: newVerificationCode(randomBytes(12)), results: { create: latest.results.map((r) => ({ resultId: r.resultId })) },
      },
      select: { id: true, revision: true },
    });
  }).catch(async (error: unknown) => {
    // Two corrections at once: the unique revision number (and supersedes link) lets one through.
    if (!isUniqueViolation(error)) throw error;
    const number = (await getDb().certificate.findUnique({ where: { id: input.certificateId }, select: { number: true } }))?.number;
    throw explainCertificateCollision(error, number) ?? error;
  });
}
