import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Certificates with their latest revision, newest first. */
export async function listCertificates(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "certificate.view");
  return getDb().certificate.findMany({
    orderBy: { createdAt: "desc" },
    take: 50,
    select: {
      id: true, number: true, createdAt: true,
      project: { select: { name: true } }, clientOrganization: { select: { name: true } },
      revisions: { orderBy: { revision: "desc" }, take: 1, select: { revision: true, status: true, issuedAt: true } },
    },
  });
}
