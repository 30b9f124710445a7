import "server-only";
import { randomBytes } from "node:crypto";
import { AppError } from "@/lib/errors/app-error";
import { newVerificationCode } from "@/lib/certificates/verification-code";
import { draftCertificateSchema } from "@/lib/validation/certificates";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { allocateLabNumber } from "../db/allocate-lab-number";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { explainCertificateCollision, refuseResultsOnLiveCertificates } from "./certificate-collision";
import { checkIndexResultsForProject, refuseIndexResultsOnLiveCertificates } from "./index-results";

/**
 * A QA manager gathers approved results of one project's rolls (runs' and index tests') into a new
 * certificate, as a draft with its own number.
 */
export async function createCertificateDraft(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "certificate.issue");
  const input = parseOrThrow(draftCertificateSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const project = await tx.project.findUnique({ where: { id: input.projectId }, select: { id: true, clientOrganizationId: true } });
    if (!project) throw new AppError("NOT_FOUND");
    const results = await tx.result.findMany({
      where: { id: { in: input.resultIds } },
      select: { id: true, approvedAt: true, run: { select: { labNumber: true, specimen: { select: { coupon: { select: { roll: { select: { projectId: true } } } } } } } } },
    });
    if (results.length !== new Set(input.resultIds).size) throw new AppError("NOT_FOUND", "One of the chosen results does not exist.");
    const stray = results.find((r) => r.run.specimen.coupon.roll.projectId !== project.id);
    if (stray) throw new AppError("INVALID_INPUT", `The result of ${stray.run.labNumber} belongs to another project.`);
    const unapproved = results.find((r) => !r.approvedAt);
    if (unapproved) throw new AppError("INVALID_INPUT", `The result of ${unapproved.run.labNumber} is not approved yet.`);
    // A trigger decides a race between two drafts taking the same result (explained below).
    await refuseResultsOnLiveCertificates(tx, input.resultIds);
    const indexResultIds = await checkIndexResultsForProject(tx, input.indexResultIds, project.id);
    await refuseIndexResultsOnLiveCertificates(tx, indexResultIds);
    const certificate = await tx.certificate.create({
      data: { number: await allocateLabNumber(tx, "certificate", options.now), projectId: project.id, clientOrganizationId: project.clientOrganizationId },
      select: { id: true, number: true },
    });
    const revision = await tx.certificateRevision.create({
      data: { certificateId: certificate.id, revision: 1, status: "DRAFT", verificationCode: newVerificationCode(randomBytes(12)), results: { create: results.map((r) => ({ resultId: r.id })) }, indexResults: { create: indexResultIds.map((indexTestResultId) => ({ indexTestResultId })) } },
      select: { id: true },
    });
    // The draft's first content: these results, judged by the project's newest specification, in the units its
    // limits are written in (a client whose specification states cm/s gets cm/s), SI otherwise.
    const specification = await tx.specification.findFirst({ where: { projectId: project.id, isTemplate: false }, orderBy: [{ createdAt: "desc" }, { id: "desc" }], select: { id: true, limits: { select: { unit: true } } } });
    const unitSystem = specification?.limits.some((l) => l.unit.trim().startsWith("cm")) ? "CENTIMETRE" : "SI";
    await tx.certificateDraftContent.create({
      data: { revisionId: revision.id, version: 1, resultIds: results.map((r) => r.id), indexResultIds, specificationId: specification?.id ?? null, unitSystem, createdById: options.actor.id },
    });
    return certificate;
  }).catch((error: unknown) => {
    throw explainCertificateCollision(error) ?? error;
  });
}
