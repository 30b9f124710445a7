/** Issued certificate revisions for tests, made as the database allows: drafted, then issued in one update. */
import { createHash, randomBytes } from "node:crypto";
import { newVerificationCode, VERIFICATION_RANDOM_BYTES } from "@/lib/certificates/verification-code";
import type { Tx } from "@/lib/server/db/transaction";

export const TEST_PDF = new TextEncoder().encode("%PDF-1.4 test");
const DAY = 86_400_000;

/** A revision drafted with its results, then issued in one update (the database freezes it after that). */
export async function issueRevision(tx: Tx, certificateId: string, revision: number, options: { resultIds?: string[]; pdf?: boolean; supersedesId?: string; daysAgo: number }) {
  const draft = await tx.certificateRevision.create({
    data: {
      certificateId, revision, verificationCode: newVerificationCode(randomBytes(VERIFICATION_RANDOM_BYTES)), supersedesId: options.supersedesId ?? null, reason: options.supersedesId ? "Corrected specimen thickness" : "",
      results: { create: (options.resultIds ?? []).map((resultId) => ({ resultId })) },
    },
  });
  const withPdf = options.pdf === false ? {} : { pdf: TEST_PDF, pdfSha256: createHash("sha256").update(TEST_PDF).digest("hex") };
  return tx.certificateRevision.update({ where: { id: draft.id }, data: { status: "ISSUED", issuedAt: new Date(Date.now() - options.daysAgo * DAY), ...withPdf } });
}

