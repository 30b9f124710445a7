import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** A certificate for the lab's own pages: its revisions (newest first) with signatures and results (runs' and index tests'). */
export async function getCertificate(options: { actor: CurrentUser; number: string }) {
  requirePermission(options.actor, "certificate.view");
  const certificate = await getDb().certificate.findUnique({
    where: { number: options.number },
    include: {
      project: { select: { name: true, code: true } },
      clientOrganization: { select: { name: true } },
      revisions: {
        orderBy: { revision: "desc" },
        select: {
          id: true, revision: true, status: true, reason: true, verificationCode: true, pdfSha256: true, issuedAt: true, supersededAt: true, revokedAt: true,
          contents: { orderBy: { version: "desc" }, take: 1, select: { resultIds: true, indexResultIds: true } },
          signatures: { select: { signedAt: true, meaning: true, signerRole: true, signer: { select: { name: true } } } },
          results: { select: { result: { select: { id: true, property: true, value: true, unit: true, expandedUncertainty: true, run: { select: { labNumber: true, specimen: { select: { labNumber: true } } } } } } } },
          indexResults: { select: { indexTestResult: { select: { id: true, property: true, value: true, unit: true, indexTest: { select: { methodCode: true, roll: { select: { labNumber: true } } } } } } } },
        },
      },
    },
  });
  if (!certificate) throw new AppError("NOT_FOUND");
  return certificate;
}
