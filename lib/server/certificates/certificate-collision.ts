import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { isUniqueViolation } from "../db/database-fault";
import type { Tx } from "../db/transaction";

/** Revision states in which a certificate is live: a result may be on one live certificate only. */
export const LIVE_REVISION_STATES = ["DRAFT", "ISSUED"] as const;

/** Refuses results that are already on a live certificate, naming the first such result and certificate. */
export async function refuseResultsOnLiveCertificates(tx: Tx, resultIds: string[], exceptCertificateId?: string): Promise<void> {
  const held = await tx.certificateResult.findFirst({
    where: { resultId: { in: resultIds }, revision: { status: { in: [...LIVE_REVISION_STATES] }, ...(exceptCertificateId ? { certificateId: { not: exceptCertificateId } } : {}) } },
    select: { result: { select: { run: { select: { labNumber: true } } } }, revision: { select: { certificate: { select: { number: true } } } } },
  });
  if (held)
    throw new AppError("CONFLICT", `The result of ${held.result.run.labNumber} is already on certificate ${held.revision.certificate.number}; correct that certificate by a revision instead.`, {
      details: { collidedWith: held.revision.certificate.number },
    });
}

/**
 * The sentence for a certificate write the database refused because someone else did the same at the
 * same moment: a result taken by another certificate, or the same revision drafted twice. Null otherwise.
 */
export function explainCertificateCollision(error: unknown, certificateNumber?: string): AppError | null {
  if (isUniqueViolation(error, "result_on_live_certificate")) {
    const number = /already on certificate (\S+)/.exec(JSON.stringify(error))?.[1]?.replace(/["\\]+$/, "");
    return new AppError("CONFLICT", `One of these results was put on certificate ${number ?? "another certificate"} a moment ago; reload the page.`, { details: { collidedWith: number } });
  }
  if (isUniqueViolation(error))
    return new AppError("CONFLICT", `Someone else drafted a revision of ${certificateNumber ?? "this certificate"} a moment ago; reload the page to see it.`, { details: { collidedWith: certificateNumber } });
  return null;
}
