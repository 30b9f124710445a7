import "server-only";
import { createHash } from "node:crypto";
import { AppError } from "@/lib/errors/app-error";
import { issueCertificateSchema } from "@/lib/validation/certificates";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { verifyPassword } from "../auth/password";
import { checkPasswordThrottled } from "../auth/password-throttle";
import { getDb } from "../db/client";
import { withActor } from "../db/transaction";
import { publicBaseUrl } from "../public-address";
import { notifyCertificateIssued } from "../notices/notify-certificate-issued";
import { parseOrThrow } from "../validation/parse";
import { buildCertificateSnapshot } from "./build-certificate-snapshot";
import { renderCertificatePdf } from "./render-certificate-pdf";
import { draftProblems } from "./draft-problems";
import { readDraftContent } from "./draft-content";

/**
 * A QA manager signs and issues a draft revision: their password is asked again, the certificate's
 * content is frozen as a snapshot, its PDF rendered and its SHA-256 digest stored with a signature
 * record. A revision that supersedes an issued one marks that one superseded in the same transaction.
 */
export async function issueCertificate(options: { actor: CurrentUser; input: unknown; now?: Date; clientAddress?: string | null }) {
  requirePermission(options.actor, "certificate.issue");
  const input = parseOrThrow(issueCertificateSchema, options.input);
  const db = getDb();
  const signer = await db.user.findUniqueOrThrow({ where: { id: options.actor.id }, omit: { passwordHash: false } });
  // The signing password is throttled like a sign-in: guessing it here is no easier than at the door.
  const attempt = { email: signer.email, address: options.clientAddress ?? null };
  if (!(await checkPasswordThrottled(attempt, () => verifyPassword(input.password, signer.passwordHash))))
    throw new AppError("INVALID_INPUT", "That password is not right; nothing was signed.", { fieldErrors: { password: "Not your password." } });

  const draft = await db.certificateRevision.findUnique({ where: { id: input.revisionId }, select: { status: true, revision: true, certificate: { select: { number: true, projectId: true } } } });
  if (!draft) throw new AppError("NOT_FOUND");
  if (draft.status !== "DRAFT") throw new AppError("ILLEGAL_TRANSITION", `${draft.certificate.number} revision ${draft.revision} is already ${draft.status.toLowerCase()}.`);
  const content = await readDraftContent(db, input.revisionId);
  const problems = await draftProblems(db, { projectId: draft.certificate.projectId, content });
  if (problems.length) throw new AppError("INVALID_INPUT", `Nothing was signed. ${problems.map((p) => p.message).join(" ")}`);
  if (content.signatoryId && content.signatoryId !== options.actor.id)
    throw new AppError("FORBIDDEN", "The draft names another QA manager as its signatory; only they can sign it, or change the signatory first.");

  const now = options.now ?? new Date();
  const snapshot = await db.$transaction((tx) => buildCertificateSnapshot(tx, { revisionId: input.revisionId, signer: options.actor, meaning: input.meaning, now, baseUrl: publicBaseUrl() }), { timeout: 30_000 });
  // Rendering takes Chromium a moment, so it happens outside the writing transaction.
  const pdf = await renderCertificatePdf(snapshot);
  const pdfSha256 = createHash("sha256").update(pdf).digest("hex");

  const issued = await withActor(options.actor, async (tx) => {
    // Two signers at once: the second waits here for the first to commit, then sees the revision issued
    // and is told so, instead of meeting the database's refusal of a signature on an issued revision.
    await tx.$queryRaw`SELECT id FROM "CertificateRevision" WHERE id = ${input.revisionId} FOR UPDATE`;
    const revision = await tx.certificateRevision.findUniqueOrThrow({ where: { id: input.revisionId }, select: { status: true, supersedesId: true } });
    if (revision.status !== "DRAFT") throw new AppError("CONFLICT", `${snapshot.number} revision ${snapshot.revision} was issued by someone else a moment ago; reload the page.`);
    // What was rendered is what is signed: a change saved to the draft meanwhile stops the signing.
    if ((await readDraftContent(tx, input.revisionId)).version !== content.version)
      throw new AppError("CONFLICT", "The draft was changed while it was being signed; nothing was signed. Look at it again and sign.");
    if (revision.supersedesId) {
      const previous = await tx.certificateRevision.updateMany({ where: { id: revision.supersedesId, status: "ISSUED" }, data: { status: "SUPERSEDED", supersededAt: now } });
      if (previous.count !== 1) throw new AppError("CONFLICT", "The revision this one corrects is no longer the issued one; reload the page.");
    }
    // Signed while still a draft: the database accepts no signature on an issued revision.
    await tx.signature.create({ data: { revisionId: input.revisionId, signerId: options.actor.id, signerRole: options.actor.role, meaning: input.meaning, signedAt: now } });
    const issued = await tx.certificateRevision.updateMany({ where: { id: input.revisionId, status: "DRAFT" }, data: { status: "ISSUED", issuedAt: now, pdf: new Uint8Array(pdf), pdfSha256, snapshot } });
    if (issued.count !== 1) throw new AppError("CONFLICT", `${snapshot.number} revision ${snapshot.revision} was issued by someone else a moment ago; reload the page.`);
    return { number: snapshot.number, revision: snapshot.revision, pdfSha256, verificationCode: snapshot.verificationCode };
  }, { timeoutMs: 30_000 });
  // After the commit: the client's contacts are told (or the log, without SMTP settings); never fails the issue.
  await notifyCertificateIssued(input.revisionId);
  return issued;
}
