import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Choices for the intake form: active clients with their active projects, and storage places in use. */
export async function getIntakeOptions(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "shipment.create");
  const db = getDb();
  const [clients, locations] = await Promise.all([
    db.clientOrganization.findMany({ where: { active: true }, orderBy: { name: "asc" }, select: { id: true, name: true, projects: { where: { active: true }, orderBy: { name: "asc" }, select: { id: true, name: true, code: true } } } }),
    db.storageLocation.findMany({ where: { active: true }, orderBy: { code: "asc" }, select: { id: true, code: true, name: true } }),
  ]);
  return { clients, locations };
}
