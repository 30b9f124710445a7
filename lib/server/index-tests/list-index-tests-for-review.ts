import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Index tests awaiting QA review, oldest first. */
export async function listIndexTestsForReview(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "run.review");
  return getDb().indexTest.findMany({
    where: { state: "SUBMITTED" },
    orderBy: { testedAt: "asc" },
    take: 200,
    select: { id: true, methodCode: true, property: true, value: true, unit: true, testedAt: true, performedById: true, performedBy: { select: { name: true } }, roll: { select: { labNumber: true } } },
  });
}
