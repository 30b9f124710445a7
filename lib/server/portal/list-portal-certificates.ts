import "server-only";
import type { RevisionStatus } from "@/lib/generated/prisma/client";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { organizationScope } from "./organization-scope";

// A client never sees a draft: only what the laboratory has issued, including what it later superseded or revoked.
const VISIBLE: RevisionStatus[] = ["ISSUED", "SUPERSEDED", "REVOKED"];

export type PortalCertificateRevision = {
  revision: number;
  status: RevisionStatus;
  reason: string;
  verificationCode: string;
  issuedAt: Date | null;
  supersededAt: Date | null;
  revokedAt: Date | null;
  /** The revision that replaced this one, when it is superseded. */
  supersededByRevision: number | null;
  /** Whether a PDF was stored at issue (the digest is stored with it). */
  hasPdf: boolean;
  /** The rolls (lab numbers) the revision reports on, from its frozen snapshot. */
  rolls: string[];
};

export type PortalCertificate = {
  number: string;
  project: { code: string; name: string };
  revisions: PortalCertificateRevision[];
};

/**
 * The actor's organisation's certificates, newest first, each with its non-draft revisions, newest
 * revision first. A client user sees only their own organisation's (portal.view); `projectCode` narrows
 * to one project.
 */
export async function listPortalCertificates(options: { actor: CurrentUser; projectCode?: string }): Promise<PortalCertificate[]> {
  const { actor } = options;
  requirePermission(actor, "portal.view");
  const certificates = await getDb().certificate.findMany({
    where: {
      ...organizationScope(actor),
      ...(options.projectCode ? { project: { code: options.projectCode } } : {}),
      revisions: { some: { status: { in: VISIBLE } } },
    },
    orderBy: { number: "desc" },
    select: {
      number: true,
      project: { select: { code: true, name: true } },
      revisions: {
        where: { status: { in: VISIBLE } },
        orderBy: { revision: "desc" },
        select: {
          revision: true, status: true, reason: true, verificationCode: true, issuedAt: true, supersededAt: true, revokedAt: true, pdfSha256: true, snapshot: true,
          supersededBy: { select: { revision: true, status: true } },
        },
      },
    },
  });
  return certificates.map((c) => ({
    number: c.number,
    project: c.project,
    revisions: c.revisions.map(({ pdfSha256, supersededBy, snapshot, ...r }) => ({
      ...r,
      hasPdf: pdfSha256 !== null,
      rolls: rollsOf(snapshot),
      supersededByRevision: r.status === "SUPERSEDED" ? supersedingRevision(r.revision, supersededBy, c.revisions) : null,
    })),
  }));
}

// The revision pointing back at this one, if it is not a draft; otherwise the next visible revision up.
function supersedingRevision(revision: number, link: { revision: number; status: RevisionStatus } | null, visible: Array<{ revision: number }>): number | null {
  if (link && link.status !== "DRAFT") return link.revision;
  const later = visible.map((v) => v.revision).filter((n) => n > revision);
  return later.length > 0 ? Math.min(...later) : null;
}

// The rolls a frozen snapshot reports on (its samples table); none for a revision without a snapshot.
function rollsOf(snapshot: unknown): string[] {
  const samples = (snapshot as { samples?: Array<{ rollLabNumber?: unknown }> } | null)?.samples;
  return Array.isArray(samples) ? samples.map((s) => s.rollLabNumber).filter((n): n is string => typeof n === "string") : [];
}
