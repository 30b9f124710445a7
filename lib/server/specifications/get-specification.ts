import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { limitOrder, limitSelect } from "./limit-select";

/**
 * One specification with its limits and its project (null for a lab template). `inUse` says whether it
 * is the project's newest specification, the one a certificate issued now would apply.
 */
export async function getSpecification(options: { actor: CurrentUser; id: string }) {
  requirePermission(options.actor, "certificate.view");
  const db = getDb();
  const specification = await db.specification.findUnique({
    where: { id: options.id },
    select: {
      id: true, name: true, isTemplate: true, createdAt: true, updatedAt: true,
      project: { select: { id: true, code: true, name: true, clientOrganization: { select: { name: true } } } },
      limits: { orderBy: limitOrder, select: limitSelect },
    },
  });
  if (!specification) throw new AppError("NOT_FOUND");
  const newest = specification.project
    ? await db.specification.findFirst({ where: { projectId: specification.project.id, isTemplate: false }, orderBy: [{ createdAt: "desc" }, { id: "desc" }], select: { id: true } })
    : null;
  return { ...specification, inUse: newest?.id === specification.id };
}
