import "server-only";
import { calibrationStatus } from "@/lib/equipment/calibration-status";
import { holdsCell, RUN_STATES, type RunStateName } from "@/lib/runs/run-state-machine";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

const ACTIVE = RUN_STATES.filter((s) => holdsCell(s as RunStateName));

/** What the assignment form offers: waiting specimens, free cells and the other instruments, each with its calibration state. */
export async function getAssignmentOptions(options: { actor: CurrentUser; now?: Date }) {
  requirePermission(options.actor, "run.operate");
  const now = options.now ?? new Date();
  const db = getDb();
  const [specimens, equipment] = await Promise.all([
    db.specimen.findMany({ where: { state: "PREPARED" }, orderBy: { preparedAt: "asc" }, select: { id: true, labNumber: true, intendedMethodCode: true, coupon: { select: { roll: { select: { labNumber: true, project: { select: { name: true } } } } } } } }),
    db.equipment.findMany({
      where: { status: { not: "RETIRED" } },
      orderBy: { assetTag: "asc" },
      select: {
        id: true, assetTag: true, name: true, kind: true, status: true,
        calibrations: { orderBy: { calibratedAt: "desc" }, take: 3, select: { calibratedAt: true, dueAt: true, passed: true } },
        calibrationOverrides: { where: { validUntil: { gt: now } }, take: 1, select: { validUntil: true } },
        runsAsCell: { where: { state: { in: ACTIVE } }, take: 1, select: { labNumber: true } },
      },
    }),
  ]);
  const instruments = equipment.map((e) => ({
    id: e.id, assetTag: e.assetTag, name: e.name, kind: e.kind,
    calibration: calibrationStatus({ assetTag: e.assetTag, inService: e.status === "IN_SERVICE", calibrations: e.calibrations, now }),
    overrideUntil: e.calibrationOverrides[0]?.validUntil ?? null,
    busyWith: e.runsAsCell[0]?.labNumber ?? null,
  }));
  return { specimens, instruments };
}
