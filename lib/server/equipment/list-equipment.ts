import "server-only";
import { calibrationStatus } from "@/lib/equipment/calibration-status";
import type { EquipmentKind } from "@/lib/validation/equipment";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/**
 * The register by asset tag, each with its latest calibration and whether it may be used for a new run
 * (`calibration`, from calibrationStatus). `kind` narrows the list; `now` is for tests.
 */
export async function listEquipment(options: { actor: CurrentUser; kind?: EquipmentKind; now?: Date }) {
  requirePermission(options.actor, "equipment.view");
  const now = options.now ?? new Date();
  const rows = await getDb().equipment.findMany({
    where: options.kind ? { kind: options.kind } : {},
    orderBy: { assetTag: "asc" },
    select: {
      id: true, assetTag: true, kind: true, name: true, status: true, ratedMaxPressurePa: true,
      // Latest by date; of two on one day, the one recorded last.
      calibrations: { orderBy: [{ calibratedAt: "desc" }, { createdAt: "desc" }], take: 1, select: { calibratedAt: true, dueAt: true, reference: true, passed: true } },
    },
  });
  return rows.map(({ calibrations, ...e }) => ({
    ...e,
    lastCalibration: calibrations[0] ?? null,
    calibration: calibrationStatus({ assetTag: e.assetTag, inService: e.status === "IN_SERVICE", calibrations, now }),
  }));
}
