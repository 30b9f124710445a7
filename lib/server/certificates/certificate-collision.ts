import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { isUniqueViolation } from "../db/database-fault";
import type { Tx } from "../db/transaction";
import type { Db } from "../db/client";

/** Revision states in which a certificate is live: a result may be on one live certificate only. */
export const LIVE_REVISION_STATES = ["DRAFT", "ISSUED"] as const;

/**
 * Refuses results that another live certificate includes, naming the first such result and certificate. A
 * result on a draft revision that its newest content leaves out is not held (the database's rule too).
 */
export async function refuseResultsOnLiveCertificates(tx: Tx | Db, resultIds: string[], exceptCertificateId?: string): Promise<void> {
  const held = await tx.certificateResult.findMany({
    where: { resultId: { in: resultIds }, revision: { status: { in: [...LIVE_REVISION_STATES] }, ...(exceptCertificateId ? { certificateId: { not: exceptCertificateId } } : {}) } },
    select: {
      resultId: true,
      result: { select: { run: { select: { labNumber: true } } } },
      revision: { select: { certificate: { select: { number: true } }, contents: { orderBy: { version: "desc" }, take: 1, select: { resultIds: true } } } },
    },
  });
  const holding = held.find((h) => h.revision.contents.length === 0 || h.revision.contents[0]!.resultIds.includes(h.resultId));
  if (holding)
    throw new AppError("CONFLICT", `The result of ${holding.result.run.labNumber} is already on certificate ${holding.revision.certificate.number}; correct that certificate by a revision instead.`, {
      details: { collidedWith: holding.revision.certificate.number },
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
