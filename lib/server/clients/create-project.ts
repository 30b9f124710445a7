import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { projectSchema } from "@/lib/validation/clients";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { readTemplateLimits } from "../specifications/read-template-limits";

/**
 * A new project (with its site) of an active client; with a template, the project starts with its own
 * specification copied from it. A project without a client is refused.
 */
export async function createProject(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "client.manage");
  const input = parseOrThrow(projectSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const org = await tx.clientOrganization.findUnique({ where: { id: input.clientOrganizationId }, select: { id: true, active: true, name: true } });
    if (!org) throw new AppError("INVALID_INPUT", "A project needs a client: choose the client organisation.", { fieldErrors: { clientOrganizationId: "Choose the client organisation." } });
    if (!org.active) throw new AppError("INVALID_INPUT", `${org.name} is deactivated; reactivate it before adding projects.`, { fieldErrors: { clientOrganizationId: "This client is deactivated." } });
    const taken = await tx.project.findUnique({ where: { code: input.code }, select: { name: true } });
    if (taken) throw new AppError("CONFLICT", `The code ${input.code} already belongs to the project ${taken.name}.`, { fieldErrors: { code: "Already in use; project codes are never reused." } });
    const limits = input.specificationTemplateId ? await readTemplateLimits(tx, input.specificationTemplateId, "specificationTemplateId") : null;
    const project = await tx.project.create({
      data: { code: input.code, name: input.name, siteName: input.siteName, siteLocation: input.siteLocation ?? null, clientOrganizationId: org.id },
      select: { id: true, code: true, name: true },
    });
    if (limits) await tx.specification.create({ data: { name: `${project.code} liner specification`, projectId: project.id, limits: { create: limits } } });
    return project;
  });
}
