import "server-only";
import { calibrationStatus } from "@/lib/equipment/calibration-status";
import { holdsCell, RUN_STATES, type RunStateName } from "@/lib/runs/run-state-machine";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { evaluateRunRecords } from "./evaluate-run-records";

const ACTIVE = RUN_STATES.filter((s) => holdsCell(s as RunStateName));

/**
 * Every permeameter cell: what it holds since when and the projected end of that run (from the
 * hydraulics library, only where the readings support one), or that it is free and whether it may be used.
 */
export async function getCellBoard(options: { actor: CurrentUser; now?: Date }) {
  requirePermission(options.actor, "run.view");
  const now = options.now ?? new Date();
  const db = getDb();
  const cells = await db.equipment.findMany({
    where: { kind: "PERMEAMETER_CELL", status: { not: "RETIRED" } },
    orderBy: { assetTag: "asc" },
    select: {
      id: true, assetTag: true, name: true, status: true,
      calibrations: { orderBy: { calibratedAt: "desc" }, take: 3, select: { calibratedAt: true, dueAt: true, passed: true } },
      runsAsCell: {
        where: { state: { in: ACTIVE } }, take: 1, orderBy: { assignedAt: "desc" },
        select: { id: true, labNumber: true, state: true, methodCode: true, assignedAt: true, specimen: { select: { labNumber: true } }, performedBy: { select: { name: true } }, stages: { where: { kind: "PERMEATION" }, select: { startedAt: true } } },
      },
    },
  });
  return Promise.all(
    cells.map(async (cell) => {
      const run = cell.runsAsCell[0] ?? null;
      const calibration = calibrationStatus({ assetTag: cell.assetTag, inService: cell.status === "IN_SERVICE", calibrations: cell.calibrations, now });
      if (!run) return { id: cell.id, assetTag: cell.assetTag, name: cell.name, calibration, run: null };
      const permeationStart = run.stages[0]?.startedAt ?? null;
      const { evaluation } = run.state === "PERMEATING" ? await evaluateRunRecords(db, run.id) : { evaluation: null };
      const projectedAtS = evaluation?.projection.projectedAtS ?? null;
      const projectedEnd = evaluation?.termination.met ? now : permeationStart && projectedAtS !== null ? new Date(permeationStart.getTime() + projectedAtS * 1000) : null;
      return {
        id: cell.id, assetTag: cell.assetTag, name: cell.name, calibration,
        run: { ...run, criteriaMet: evaluation?.termination.met ?? false, projectedEnd, projectionReason: evaluation?.projection.reason ?? (run.state === "PERMEATING" ? "Not enough readings yet." : "Not permeating yet.") },
      };
    }),
  );
}
