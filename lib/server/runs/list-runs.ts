import "server-only";
import type { RunState } from "@/lib/generated/prisma/client";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Runs, newest first, for a queue (the review queue); `mine` keeps the acting technician's own runs. No reading counts: they would read the whole Reading table. */
export async function listRuns(options: { actor: CurrentUser; states?: RunState[]; mine?: boolean; take?: number }) {
  requirePermission(options.actor, options.states?.includes("SUBMITTED") && options.states.length === 1 ? "run.review" : "run.view");
  return getDb().run.findMany({
    where: { ...(options.states ? { state: { in: options.states } } : {}), ...(options.mine ? { performedById: options.actor.id } : {}) },
    orderBy: { assignedAt: "desc" },
    take: options.take ?? 50,
    select: {
      id: true, labNumber: true, methodCode: true, state: true, assignedAt: true, submittedAt: true,
      cell: { select: { assetTag: true } }, specimen: { select: { labNumber: true } }, performedBy: { select: { name: true } },
    },
  });
}
