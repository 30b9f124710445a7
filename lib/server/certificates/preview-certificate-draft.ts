import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { publicBaseUrl } from "../public-address";
import { buildCertificateSnapshot } from "./build-certificate-snapshot";
import { renderCertificatePdf } from "./render-certificate-pdf";

/** Printed across every page of a preview, so a preview can never pass for an issued certificate. */
export const DRAFT_WATERMARK = "DRAFT · NOT ISSUED";

/**
 * A draft revision exactly as it would be issued now (same snapshot builder, same document, same printer),
 * with the draft mark on every page. Nothing is written.
 */
export async function previewCertificateDraft(options: { actor: CurrentUser; number: string; revision: string | null }): Promise<{ fileName: string; pdf: Buffer }> {
  requirePermission(options.actor, "certificate.issue");
  const revisionNumber = Number(options.revision);
  if (!Number.isInteger(revisionNumber) || revisionNumber < 1) throw new AppError("NOT_FOUND");
  const db = getDb();
  const revision = await db.certificateRevision.findFirst({ where: { revision: revisionNumber, certificate: { number: options.number } }, select: { id: true, status: true } });
  if (!revision) throw new AppError("NOT_FOUND");
  if (revision.status !== "DRAFT") throw new AppError("ILLEGAL_TRANSITION", `Revision ${revisionNumber} is ${revision.status.toLowerCase()}: download its issued PDF instead of a preview.`);
  const snapshot = await db.$transaction(
    (tx) => buildCertificateSnapshot(tx, { revisionId: revision.id, signer: options.actor, meaning: "Reviewed and approved for issue", now: new Date(), baseUrl: publicBaseUrl() }),
    { timeout: 30_000 },
  );
  const pdf = await renderCertificatePdf(snapshot, { watermark: DRAFT_WATERMARK });
  return { fileName: `${options.number}-rev${revisionNumber}-DRAFT-preview.pdf`, pdf };
}
