import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { Prisma } from "@/lib/generated/prisma/client";
import { inSentence } from "@/lib/format/sentence-case";
import { TEST_PROPERTY_LABELS } from "@/lib/results/property-units";
import { setSpecificationLimitSchema } from "@/lib/validation/specifications";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";
import { limitSelect } from "./limit-select";

const duplicate = (property: keyof typeof TEST_PROPERTY_LABELS) =>
  new AppError("CONFLICT", `This specification already has a limit for ${inSentence(TEST_PROPERTY_LABELS[property])}.`, {
    fieldErrors: { property: "Already limited here; change that limit instead." },
  });

/**
 * Adds one limit to a specification (no limitId) or changes one (limitId); one limit per property.
 * The last write wins, without a version check: a limit is a handful of fields, and the audit trail
 * names who wrote each version. Changing a limit that an issued certificate applied is safe: each
 * certificate revision stores a frozen snapshot of the limit and the conformance it stated.
 */
export async function setSpecificationLimit(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "specification.manage");
  const input = parseOrThrow(setSpecificationLimitSchema, options.input);
  const data = {
    property: input.property,
    limitText: input.limitText,
    unit: input.unit,
    direction: input.direction,
    significantDigits: input.significantDigits,
    conformanceMethod: input.conformanceMethod,
    testMethodCode: input.testMethodCode ?? null,
    testingFrequencyAreaM2: input.testingFrequencyAreaM2 ?? null,
    testingFrequencyPerLot: input.testingFrequencyPerLot,
  };
  try {
    return await withActor(options.actor, async (tx) => {
      const specification = await tx.specification.findUnique({ where: { id: input.specificationId }, select: { id: true } });
      if (!specification) throw new AppError("NOT_FOUND", "That specification does not exist.");
      const same = await tx.specificationLimit.findUnique({ where: { specificationId_property: { specificationId: specification.id, property: input.property } }, select: { id: true } });
      if (same && same.id !== input.limitId) throw duplicate(input.property);
      if (!input.limitId) return tx.specificationLimit.create({ data: { ...data, specificationId: specification.id }, select: limitSelect });
      const updated = await tx.specificationLimit.updateMany({ where: { id: input.limitId, specificationId: specification.id }, data });
      if (updated.count !== 1) throw new AppError("NOT_FOUND", "That limit is not part of this specification.");
      // Touch the specification so its "updated" time shows when its limits last changed.
      await tx.specification.update({ where: { id: specification.id }, data: { updatedAt: new Date() } });
      return tx.specificationLimit.findUniqueOrThrow({ where: { id: input.limitId }, select: limitSelect });
    });
  } catch (error) {
    // Someone added the same property between our check and our write (unique specificationId + property).
    if (error instanceof Prisma.PrismaClientKnownRequestError && error.code === "P2002") throw duplicate(input.property);
    throw error;
  }
}
