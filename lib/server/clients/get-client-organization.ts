import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** One client by code: its details, contacts (with their portal accounts), projects with their specification, and the lab's templates. */
export async function getClientOrganization(options: { actor: CurrentUser; code: string }) {
  requirePermission(options.actor, "client.manage");
  const db = getDb();
  const org = await db.clientOrganization.findUnique({
    where: { code: options.code.trim().toUpperCase() },
    select: {
      id: true, code: true, name: true, address: true, active: true, version: true, createdAt: true,
      contacts: { orderBy: [{ active: "desc" }, { name: "asc" }], select: { id: true, name: true, email: true, phone: true, jobTitle: true, active: true, version: true, user: { select: { id: true, active: true } } } },
      projects: {
        orderBy: [{ active: "desc" }, { code: "asc" }],
        select: {
          id: true, code: true, name: true, siteName: true, siteLocation: true, active: true, version: true,
          specifications: { orderBy: { createdAt: "desc" }, take: 1, select: { id: true, name: true, _count: { select: { limits: true } } } },
          _count: { select: { shipments: true } },
        },
      },
      users: { where: { clientContact: { is: null } }, orderBy: { name: "asc" }, select: { id: true, name: true, email: true, active: true } },
    },
  });
  if (!org) throw new AppError("NOT_FOUND");
  const templates = await db.specification.findMany({ where: { isTemplate: true }, orderBy: { name: "asc" }, select: { id: true, name: true } });
  return { ...org, templates };
}
