import "server-only";
import type { RevisionStatus } from "@/lib/generated/prisma/client";
import { certificatePdfFileName } from "@/lib/certificates/revision-standing";
import { AppError } from "@/lib/errors/app-error";
import { formatDate } from "@/lib/format/dates";
import { certificatePdfRequestSchema } from "@/lib/validation/portal";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { parseOrThrow } from "../validation/parse";
import { organizationScope } from "./organization-scope";

export type CertificatePdf = { fileName: string; pdf: Buffer; status: RevisionStatus; revision: number };

/**
 * The stored PDF of one certificate revision (`revision` omitted: the latest that is not a draft). A client
 * user gets only their own organisation's (portal.view); staff with certificate.view get any. A draft, a
 * revision that does not exist, another organisation's certificate, or a revision without a stored PDF is
 * NOT_FOUND. A revoked revision is GONE for a client (it must not circulate as if valid); the laboratory's
 * staff still get the file. The file name says when a revision is superseded or revoked.
 */
export async function getCertificatePdf(options: { actor: CurrentUser; number: string; revision?: number | string | null }): Promise<CertificatePdf> {
  const { actor } = options;
  requirePermission(actor, actor.role === "CLIENT_USER" ? "portal.view" : "certificate.view");
  const { number, revision } = parseOrThrow(certificatePdfRequestSchema, { number: options.number, revision: options.revision });
  const found = await getDb().certificateRevision.findFirst({
    where: {
      status: { not: "DRAFT" },
      ...(revision !== undefined ? { revision } : {}),
      certificate: { number, ...organizationScope(actor) },
    },
    orderBy: { revision: "desc" },
    select: { revision: true, status: true, pdf: true, revokedAt: true },
  });
  const named = revision !== undefined ? `certificate ${number} revision ${revision}` : `certificate ${number}`;
  // The query leaves drafts out; saying so again narrows the status to an issued one.
  if (!found || found.status === "DRAFT") throw new AppError("NOT_FOUND", `There is no issued ${named} that you may see.`);
  if (found.status === "REVOKED" && actor.role === "CLIENT_USER")
    throw new AppError(
      "GONE",
      `Certificate ${number} revision ${found.revision} was revoked${found.revokedAt ? ` on ${formatDate(found.revokedAt)}` : ""}: the laboratory has withdrawn it and its results must not be relied on, so it is no longer offered for download. Ask the laboratory which certificate stands.`,
    );
  if (!found.pdf)
    throw new AppError("NOT_FOUND", `No PDF is stored for certificate ${number} revision ${found.revision}; ask the laboratory for a copy.`);
  return { fileName: certificatePdfFileName(number, found.revision, found.status), pdf: Buffer.from(found.pdf), status: found.status, revision: found.revision };
}
