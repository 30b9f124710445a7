import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** Equipment with its latest calibration, by asset tag. */
export async function listEquipment(options: { actor: CurrentUser }) {
  requirePermission(options.actor, "equipment.view");
  const rows = await getDb().equipment.findMany({
    orderBy: { assetTag: "asc" },
    select: {
      id: true, assetTag: true, kind: true, name: true, status: true, ratedMaxPressurePa: true,
      calibrations: { orderBy: { calibratedAt: "desc" }, take: 1, select: { calibratedAt: true, dueAt: true, reference: true } },
    },
  });
  return rows.map(({ calibrations, ...e }) => ({ ...e, lastCalibration: calibrations[0] ?? null }));
}
