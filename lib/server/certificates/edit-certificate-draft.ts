import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { can } from "@/lib/policy/permissions";
import { editCertificateDraftSchema } from "@/lib/validation/certificates";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { isUniqueViolation } from "../db/database-fault";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { explainCertificateCollision, refuseResultsOnLiveCertificates } from "./certificate-collision";
import { readDraftContent } from "./draft-content";
import { checkIndexResultsForProject, refuseIndexResultsOnLiveCertificates } from "./index-results";

/**
 * A QA manager changes a draft revision: which of the project's approved results it includes, the
 * specification it is judged by (index-test results as well as runs'), the remarks, who is to sign it and the units it prints. Each save is a
 * new content version (nothing is deleted or rewritten); a result taken in for the first time joins the
 * revision's results, and the database refuses one another live certificate includes.
 */
export async function editCertificateDraft(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "certificate.issue");
  const input = parseOrThrow(editCertificateDraftSchema, options.input);
  const resultIds = [...new Set(input.resultIds)];
  return withActor(options.actor, async (tx) => {
    const revision = await tx.certificateRevision.findUnique({
      where: { id: input.revisionId },
      select: { id: true, revision: true, status: true, results: { select: { resultId: true } }, indexResults: { select: { indexTestResultId: true } }, certificate: { select: { id: true, number: true, projectId: true } } },
    });
    if (!revision) throw new AppError("NOT_FOUND");
    const { certificate } = revision;
    if (revision.status !== "DRAFT") throw new AppError("ILLEGAL_TRANSITION", `${certificate.number} revision ${revision.revision} is ${revision.status.toLowerCase()}; only a draft can be changed.`);
    const current = await readDraftContent(tx, revision.id);
    if (current.version !== input.baseVersion)
      throw new AppError("CONFLICT", `Someone saved a change to this draft a moment ago (version ${current.version}); reload the page to see it before changing it again.`);

    const results = await tx.result.findMany({ where: { id: { in: resultIds } }, select: { id: true, approvedAt: true, run: { select: { labNumber: true, specimen: { select: { coupon: { select: { roll: { select: { projectId: true } } } } } } } } } });
    if (results.length !== resultIds.length) throw new AppError("NOT_FOUND", "One of the chosen results does not exist.");
    const stray = results.find((r) => r.run.specimen.coupon.roll.projectId !== certificate.projectId);
    if (stray) throw new AppError("INVALID_INPUT", `The result of ${stray.run.labNumber} belongs to another project.`, { fieldErrors: { resultIds: "Only this project's results." } });
    const unapproved = results.find((r) => !r.approvedAt);
    if (unapproved) throw new AppError("INVALID_INPUT", `The result of ${unapproved.run.labNumber} is not approved yet.`, { fieldErrors: { resultIds: "Only approved results." } });

    const indexResultIds = await checkIndexResultsForProject(tx, input.indexResultIds, certificate.projectId);

    if (input.specificationId) {
      const specification = await tx.specification.findUnique({ where: { id: input.specificationId }, select: { projectId: true, isTemplate: true } });
      if (!specification || specification.projectId !== certificate.projectId || specification.isTemplate)
        throw new AppError("INVALID_INPUT", "Choose one of this project's specifications.", { fieldErrors: { specificationId: "Not a specification of this project." } });
    }
    if (input.signatoryId) {
      const signatory = await tx.user.findUnique({ where: { id: input.signatoryId }, select: { role: true, active: true } });
      if (!signatory || !can(signatory.role, "certificate.issue") || !signatory.active)
        throw new AppError("INVALID_INPUT", "The signatory must be an active QA manager.", { fieldErrors: { signatoryId: "Choose an active QA manager." } });
    }

    await refuseResultsOnLiveCertificates(tx, resultIds, certificate.id);
    const onRevision = new Set(revision.results.map((r) => r.resultId));
    const joining = resultIds.filter((id) => !onRevision.has(id));
    if (joining.length) await tx.certificateResult.createMany({ data: joining.map((resultId) => ({ revisionId: revision.id, resultId })) });
    await refuseIndexResultsOnLiveCertificates(tx, indexResultIds, certificate.id);
    const indexOnRevision = new Set(revision.indexResults.map((r) => r.indexTestResultId));
    const indexJoining = indexResultIds.filter((id) => !indexOnRevision.has(id));
    if (indexJoining.length) await tx.certificateIndexResult.createMany({ data: indexJoining.map((indexTestResultId) => ({ revisionId: revision.id, indexTestResultId })) });
    return tx.certificateDraftContent.create({
      data: {
        revisionId: revision.id, version: current.version + 1, resultIds, indexResultIds, specificationId: input.specificationId || null,
        remarks: input.remarks, signatoryId: input.signatoryId || null, unitSystem: input.unitSystem, createdById: options.actor.id,
      },
      select: { version: true },
    });
  }).catch((error: unknown) => {
    if (isUniqueViolation(error, "result_on_live_certificate")) throw explainCertificateCollision(error) ?? error;
    if (isUniqueViolation(error)) throw new AppError("CONFLICT", "Someone saved a change to this draft a moment ago; reload the page to see it.");
    throw error;
  });
}
