import "server-only";
import type { RevisionStatus } from "@/lib/generated/prisma/client";
import { AppError } from "@/lib/errors/app-error";
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
 * NOT_FOUND.
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
    select: { revision: true, status: true, pdf: true },
  });
  const named = revision !== undefined ? `certificate ${number} revision ${revision}` : `certificate ${number}`;
  if (!found) throw new AppError("NOT_FOUND", `There is no issued ${named} that you may see.`);
  if (!found.pdf)
    throw new AppError("NOT_FOUND", `No PDF is stored for certificate ${number} revision ${found.revision}; ask the laboratory for a copy.`);
  return { fileName: `${number}-rev${found.revision}.pdf`, pdf: Buffer.from(found.pdf), status: found.status, revision: found.revision };
}
