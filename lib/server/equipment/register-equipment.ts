import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { Prisma } from "@/lib/generated/prisma/client";
import { enteredPressureToPa } from "@/lib/units/pressure-entry";
import { registerEquipmentSchema } from "@/lib/validation/equipment";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

const duplicate = (assetTag: string) =>
  new AppError("CONFLICT", `Asset tag ${assetTag} is already in the register.`, { fieldErrors: { assetTag: "Already in use; asset tags are never reused." } });

/** The administrator adds an instrument to the register; the rated maximum is converted to Pa from the entry unit. */
export async function registerEquipment(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "equipment.manage");
  const input = parseOrThrow(registerEquipmentSchema, options.input);
  try {
    return await withActor(options.actor, async (tx) => {
      if (await tx.equipment.findUnique({ where: { assetTag: input.assetTag }, select: { id: true } })) throw duplicate(input.assetTag);
      return tx.equipment.create({
        data: {
          assetTag: input.assetTag,
          kind: input.kind,
          name: input.name,
          serialNumber: input.serialNumber || null,
          ratedMaxPressurePa: input.ratedMaxPressure === undefined ? null : enteredPressureToPa(input.ratedMaxPressure, input.pressureUnit),
          status: input.status,
        },
        select: { id: true, assetTag: true, kind: true, version: true },
      });
    });
  } catch (error) {
    // Someone registered the same tag between our check and our insert.
    if (error instanceof Prisma.PrismaClientKnownRequestError && error.code === "P2002") throw duplicate(input.assetTag);
    throw error;
  }
}
