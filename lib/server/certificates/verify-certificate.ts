import "server-only";
import { normaliseVerificationCode } from "@/lib/certificates/verification-code";
import { getDb } from "../db/client";

export type CertificateVerification = {
  status: "VALID" | "SUPERSEDED" | "REVOKED";
  number: string;
  revision: number;
  issuedAt: Date;
  /** Hex SHA-256 of the issued PDF, to compare with a holder's file; null if none was stored. */
  pdfSha256: string | null;
  /** For a superseded revision: the issued revision that replaces it (null if the record does not say). */
  supersededBy: { revision: number } | null;
  /** When a superseded or revoked revision stopped standing; null for a valid one. */
  since: Date | null;
};

/**
 * What the public verification page may say about a code: status, number, revision, issue date and PDF
 * digest, nothing about the client. Public on purpose (no actor, no permission): the code is the key.
 * Null for an unknown or malformed code, and for a draft revision, which is not a certificate yet.
 */
export async function verifyCertificate(code: string): Promise<CertificateVerification | null> {
  const verificationCode = normaliseVerificationCode(code);
  if (!verificationCode) return null;
  const row = await getDb().certificateRevision.findUnique({
    where: { verificationCode },
    select: {
      status: true, revision: true, issuedAt: true, pdfSha256: true, supersededAt: true, revokedAt: true,
      certificate: { select: { number: true } },
      supersededBy: { select: { revision: true, status: true } },
    },
  });
  if (!row || row.status === "DRAFT" || !row.issuedAt) return null;
  const replacement = row.supersededBy && row.supersededBy.status !== "DRAFT" ? { revision: row.supersededBy.revision } : null;
  return {
    status: row.status === "ISSUED" ? "VALID" : row.status,
    number: row.certificate.number,
    revision: row.revision,
    issuedAt: row.issuedAt,
    pdfSha256: row.pdfSha256,
    supersededBy: row.status === "SUPERSEDED" ? replacement : null,
    since: row.status === "SUPERSEDED" ? row.supersededAt : row.status === "REVOKED" ? row.revokedAt : null,
  };
}
