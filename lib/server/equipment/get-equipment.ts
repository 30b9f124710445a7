import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { calibrationStatus } from "@/lib/equipment/calibration-status";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

const runSelect = { id: true, labNumber: true, state: true, assignedAt: true, methodCode: true, specimen: { select: { labNumber: true } } } as const;

/**
 * One instrument by asset tag: its calibration history (latest first), its calibration status now, and
 * the runs that used it, as their cell or as another instrument (RunEquipment), newest first.
 */
export async function getEquipment(options: { actor: CurrentUser; assetTag: string; now?: Date }) {
  requirePermission(options.actor, "equipment.view");
  const now = options.now ?? new Date();
  const equipment = await getDb().equipment.findUnique({
    where: { assetTag: options.assetTag.trim().toUpperCase() },
    include: {
      calibrations: {
        orderBy: [{ calibratedAt: "desc" }, { createdAt: "desc" }],
        include: { recordedBy: { select: { name: true } } },
      },
      runsAsCell: { orderBy: { assignedAt: "desc" }, select: runSelect },
      runUses: { select: { role: true, calibrationId: true, run: { select: runSelect } } },
    },
  });
  if (!equipment) throw new AppError("NOT_FOUND");
  const { calibrations, runsAsCell, runUses, ...rest } = equipment;
  const runs = [
    ...runsAsCell.map((run) => ({ ...run, role: "cell", calibrationId: null as string | null })),
    ...runUses.map(({ run, role, calibrationId }) => ({ ...run, role, calibrationId })),
  ].sort((a, b) => b.assignedAt.getTime() - a.assignedAt.getTime());
  return {
    ...rest,
    calibrations,
    calibration: calibrationStatus({ assetTag: equipment.assetTag, inService: equipment.status === "IN_SERVICE", calibrations, now }),
    runs,
  };
}
