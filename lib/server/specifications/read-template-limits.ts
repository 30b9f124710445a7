import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { Prisma } from "@/lib/generated/prisma/client";
import type { Tx } from "../db/transaction";

/**
 * The limits of a lab template, to copy into a project's own specification (a copy, so later changes to
 * the template never alter a project's specification). Refuses anything but a template, on `field`.
 */
export async function readTemplateLimits(tx: Tx, templateId: string, field: string): Promise<Prisma.SpecificationLimitCreateWithoutSpecificationInput[]> {
  const template = await tx.specification.findUnique({
    where: { id: templateId },
    select: { isTemplate: true, limits: { select: { property: true, limitText: true, unit: true, direction: true, significantDigits: true, conformanceMethod: true, testMethodCode: true, testingFrequencyAreaM2: true, testingFrequencyPerLot: true } } },
  });
  if (!template?.isTemplate) throw new AppError("INVALID_INPUT", "Choose one of the lab's templates.", { fieldErrors: { [field]: "Choose one of the lab's templates, or none." } });
  return template.limits;
}
