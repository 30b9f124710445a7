import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { createProjectSpecificationSchema } from "@/lib/validation/specifications";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { readTemplateLimits } from "./read-template-limits";

/**
 * A new specification for a project: empty, or with a copy of a lab template's limits (a copy, so later
 * changes to the template never alter a project's specification). The newest specification of a project
 * is the one certificates apply (findProjectLimits).
 */
export async function createProjectSpecification(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "specification.manage");
  const input = parseOrThrow(createProjectSpecificationSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const project = await tx.project.findUnique({ where: { id: input.projectId }, select: { id: true } });
    if (!project) throw new AppError("NOT_FOUND", "That project does not exist.", { fieldErrors: { projectId: "Choose a project from the list." } });
    const limits = input.templateId ? await readTemplateLimits(tx, input.templateId, "templateId") : [];
    return tx.specification.create({
      data: { name: input.name, revision: input.revision, projectId: project.id, isTemplate: false, limits: { create: limits } },
      select: { id: true, name: true, projectId: true, _count: { select: { limits: true } } },
    });
  });
}
