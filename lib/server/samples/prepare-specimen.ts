import "server-only";
import { checklistFor } from "@/lib/custody/preparation-checklists";
import { AppError } from "@/lib/errors/app-error";
import { prepareSpecimenSchema } from "@/lib/validation/samples";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { allocateLabNumber } from "../db/allocate-lab-number";
import { withActor } from "../db/transaction";
import { applyCustodyAction } from "../custody/apply-custody-action";
import { recordNewItemEvent } from "../custody/record-new-item-event";
import { parseOrThrow } from "../validation/parse";

/**
 * The technician prepares a specimen from a coupon, answering every item of the method's preparation
 * checklist; the answers are kept with the specimen as recorded, yes or no.
 */
export async function prepareSpecimen(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "sample.cut");
  const input = parseOrThrow(prepareSpecimenSchema, options.input);
  const checklist = checklistFor(input.intendedMethodCode);
  const unanswered = checklist.filter((item) => typeof input.checklist[item.key] !== "boolean");
  if (unanswered.length > 0)
    throw new AppError("INVALID_INPUT", "Answer every item of the preparation checklist.", {
      fieldErrors: Object.fromEntries(unanswered.map((item) => [`checklist.${item.key}`, "Answer yes or no."])),
    });

  return withActor(options.actor, async (tx) => {
    const location = await tx.storageLocation.findUnique({ where: { id: input.storageLocationId }, select: { active: true } });
    if (!location?.active) throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { storageLocationId: "Choose a storage location in use." } });
    const labNumber = await allocateLabNumber(tx, "specimen", input.preparedAt);
    const coupon = await applyCustodyAction(tx, { actor: options.actor, kind: "coupon", id: input.couponId, action: "PREPARED", at: input.preparedAt, note: `Specimen ${labNumber}` });
    const specimen = await tx.specimen.create({
      data: {
        labNumber, couponId: input.couponId, dieDiameterMm: input.dieDiameterMm, initialThicknessMm: input.initialThicknessMm, initialMassG: input.initialMassG,
        moistureContentPct: input.moistureContentPct ?? null, bentoniteDryMassG: input.bentoniteDryMassG ?? null,
        bentoniteMassPerAreaKgPerM2: input.bentoniteMassPerAreaKgPerM2 ?? null, specificGravity: input.specificGravity ?? null, intendedMethodCode: input.intendedMethodCode, preparedById: options.actor.id, preparedAt: input.preparedAt,
        storageLocationId: input.storageLocationId,
        checklist: { create: checklist.map((item) => ({ itemKey: item.key, question: item.question, answer: input.checklist[item.key] === true })) },
      },
      select: { id: true, labNumber: true },
    });
    await recordNewItemEvent(tx, { actor: options.actor, kind: "specimen", id: specimen.id, action: "PREPARED", state: "PREPARED", locationId: input.storageLocationId, at: input.preparedAt, note: `From coupon ${coupon.labNumber}` });
    return specimen;
  });
}
