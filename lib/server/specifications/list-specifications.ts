import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { limitOrder, limitSelect } from "./limit-select";

const specificationSelect = { id: true, name: true, createdAt: true, updatedAt: true, limits: { orderBy: limitOrder, select: limitSelect } } as const;

/**
 * The specification library: the lab's templates, and every project with its own specifications
 * (newest first; the newest is the one certificates use) and their limits. Projects without one are
 * listed too, so the QA manager sees which still need one.
 */
export async function listSpecifications(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "certificate.view");
  const db = getDb();
  const [templates, projects] = await Promise.all([
    db.specification.findMany({ where: { isTemplate: true }, orderBy: [{ name: "asc" }, { createdAt: "asc" }], select: specificationSelect }),
    db.project.findMany({
      orderBy: { code: "asc" },
      select: {
        id: true, code: true, name: true, siteName: true,
        clientOrganization: { select: { name: true } },
        specifications: { where: { isTemplate: false }, orderBy: [{ createdAt: "desc" }, { id: "desc" }], select: specificationSelect },
      },
    }),
  ]);
  return { templates, projects };
}
