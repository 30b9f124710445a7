import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** The lab's details as the administrator edits them (blank before the first set-up). */
export async function getLabDetails(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "lab.configure");
  const lab = await getDb().laboratory.findUnique({ where: { id: "lab" }, select: { name: true, address: true, accreditation: true, timeZone: true, updatedAt: true } });
  return lab ?? { name: "", address: "", accreditation: null, timeZone: "UTC", updatedAt: null };
}
