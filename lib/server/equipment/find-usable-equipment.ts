import "server-only";
import { calibrationStatus, type CalibrationStatus } from "@/lib/equipment/calibration-status";
import type { EquipmentKind } from "@/lib/validation/equipment";
import { getDb } from "../db/client";
import type { Tx } from "../db/transaction";

export type EquipmentUsability = {
  assetTag: string;
  kind: EquipmentKind;
  ratedMaxPressurePa: number | null;
  status: CalibrationStatus;
  latestCalibrationId: string | null;
  /** Calibration.values of the latest calibration, e.g. { inflowBuretteAreaM2, outflowBuretteAreaM2 }; read with readBuretteAreasM2. */
  latestValues: unknown;
};

/**
 * Whether each instrument may be used for a new run, keyed by id; ids not in the register are absent
 * from the map. No permission check: it is a building block for operations that made their own (run
 * assignment). Pass `tx` to read inside that operation's transaction.
 */
export async function findEquipmentStatuses(options: { ids: readonly string[]; now: Date; tx?: Tx }): Promise<Map<string, EquipmentUsability>> {
  const db = options.tx ?? getDb();
  const rows = await db.equipment.findMany({
    where: { id: { in: [...new Set(options.ids)] } },
    select: {
      id: true, assetTag: true, kind: true, ratedMaxPressurePa: true, status: true,
      calibrations: { orderBy: [{ calibratedAt: "desc" }, { createdAt: "desc" }], take: 1, select: { id: true, calibratedAt: true, dueAt: true, passed: true, values: true } },
    },
  });
  return new Map(
    rows.map((row) => {
      const latest = row.calibrations[0] ?? null;
      return [row.id, {
        assetTag: row.assetTag,
        kind: row.kind,
        ratedMaxPressurePa: row.ratedMaxPressurePa,
        status: calibrationStatus({ assetTag: row.assetTag, inService: row.status === "IN_SERVICE", calibrations: row.calibrations, now: options.now }),
        latestCalibrationId: latest?.id ?? null,
        latestValues: latest?.values ?? null,
      }];
    }),
  );
}
