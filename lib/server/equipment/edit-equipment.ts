import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { enteredPressureToPa } from "@/lib/units/pressure-entry";
import { editEquipmentSchema } from "@/lib/validation/equipment-edit";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

const FIELDS = ["name", "serialNumber", "ratedMaxPressurePa"] as const;
const asText = (v: unknown) => (v === null || v === undefined ? "" : String(v));

/**
 * The administrator corrects an instrument's register entry (name, serial number, rated maximum). Each
 * changed field is kept as a correction with the old value, the new one and the reason; the asset tag and
 * kind never change. A change that changes nothing is refused.
 */
export async function editEquipment(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "equipment.manage");
  const input = parseOrThrow(editEquipmentSchema, options.input);
  const next = {
    name: input.name,
    serialNumber: input.serialNumber ?? null,
    ratedMaxPressurePa: input.ratedMaxPressure === undefined ? null : enteredPressureToPa(input.ratedMaxPressure, input.pressureUnit),
  };
  return withActor(options.actor, async (tx) => {
    const current = await tx.equipment.findUnique({ where: { id: input.equipmentId }, select: { assetTag: true, kind: true, name: true, serialNumber: true, ratedMaxPressurePa: true, version: true } });
    if (!current) throw new AppError("NOT_FOUND");
    if (current.version !== input.version) throw new AppError("CONFLICT");
    if ((current.kind === "PERMEAMETER_CELL" || current.kind === "PRESSURE_TRANSDUCER") && next.ratedMaxPressurePa === null)
      throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { ratedMaxPressure: "A cell or transducer keeps its rated maximum pressure; enter it from the maker's plate." } });
    // Pressures typed in psi come back with rounding in the last digits: compare to a millipascal.
    const changed = FIELDS.filter((f) => (f === "ratedMaxPressurePa" ? Math.abs((current[f] ?? -1) - (next[f] ?? -1)) > 1e-3 : asText(current[f]) !== asText(next[f])));
    if (changed.length === 0) throw new AppError("INVALID_INPUT", "Nothing was changed.", { fieldErrors: { name: "Change a value first." } });
    const updated = await tx.equipment.updateMany({ where: { id: input.equipmentId, version: input.version }, data: { ...next, version: { increment: 1 } } });
    if (updated.count === 0) throw new AppError("CONFLICT");
    await tx.correction.createMany({
      data: changed.map((field) => ({ entity: "Equipment", entityId: input.equipmentId, field, oldValue: asText(current[field]), newValue: asText(next[field]), reason: input.reason, actorId: options.actor.id })),
    });
    return { assetTag: current.assetTag, changed };
  });
}
