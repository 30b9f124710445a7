import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { calibrationValuesToStore } from "@/lib/equipment/calibration-values";
import { calibrationValueErrors, recordCalibrationSchema } from "@/lib/validation/equipment";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * The administrator records a calibration certificate. For a burette panel both burette areas are
 * required (entered in mm², stored in m² in Calibration.values), checked against the kind on record, with
 * each burette's zero above the common datum and the scale's calibrated range when given; a measuring
 * instrument may carry its standard uncertainty, a cell its apparatus leakage check.
 * Calibrations are never changed afterwards; a correction is a new calibration record.
 */
export async function recordCalibration(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "equipment.manage");
  const input = parseOrThrow(recordCalibrationSchema, options.input);
  return withActor(options.actor, async (tx) => {
    const equipment = await tx.equipment.findUnique({ where: { id: input.equipmentId }, select: { id: true, assetTag: true, kind: true, status: true } });
    if (!equipment) throw new AppError("NOT_FOUND");
    if (equipment.status === "RETIRED")
      throw new AppError("ILLEGAL_TRANSITION", `${equipment.assetTag} is retired; put it back in service before recording a calibration.`);
    const fieldErrors = calibrationValueErrors(equipment.kind, input);
    if (Object.keys(fieldErrors).length > 0) throw new AppError("INVALID_INPUT", `A burette panel's calibration must give both burette areas.`, { fieldErrors });
    const values = calibrationValuesToStore(equipment.kind, input);
    return tx.calibration.create({
      data: {
        equipmentId: equipment.id,
        calibratedAt: input.calibratedAt,
        dueAt: input.dueAt,
        reference: input.reference,
        performedBy: input.performedBy,
        passed: input.passed,
        values,
        recordedById: options.actor.id,
      },
      select: { id: true, equipmentId: true, calibratedAt: true, dueAt: true, passed: true, values: true },
    });
  });
}
