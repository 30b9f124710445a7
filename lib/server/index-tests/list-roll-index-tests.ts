import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** A roll's index tests, newest first, with their main result and state. */
export async function listRollIndexTests(options: { actor: CurrentUser; rollId: string }) {
  requirePermission(options.actor, "sample.view");
  return getDb().indexTest.findMany({
    where: { rollId: options.rollId },
    orderBy: { testedAt: "desc" },
    select: { id: true, methodCode: true, property: true, value: true, unit: true, state: true, testedAt: true, performedBy: { select: { name: true } }, correctedBy: { select: { id: true } } },
  });
}
