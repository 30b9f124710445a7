import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { runDeviations } from "@/lib/runs/deviations";
import { loadCurrentReadingsOnce } from "../readings/load-current-readings";
import { evaluateRunRecords } from "./evaluate-run-records";
import { findProjectLimits } from "../specifications/find-project-limits";
import type { PreviewLimits } from "@/lib/results/reported-results";

/** A run with its specimen, instruments, stages and reviews, its deviations, the verdict on its readings (lib/evaluation) and the project's limits. */
export async function getRun(options: { actor: CurrentUser; labNumber: string }) {
  requirePermission(options.actor, "run.view");
  const db = getDb();
  const run = await db.run.findUnique({
    where: { labNumber: options.labNumber },
    include: {
      specimen: { select: { id: true, labNumber: true, dieDiameterMm: true, initialThicknessMm: true, checklist: { select: { question: true, answer: true } }, coupon: { select: { labNumber: true, roll: { select: { labNumber: true, project: { select: { id: true, name: true, clientOrganization: { select: { name: true } } } } } } } } } },
      cell: { select: { assetTag: true, name: true, ratedMaxPressurePa: true } },
      method: { select: { code: true, title: true, defaults: true } },
      performedBy: { select: { id: true, name: true } },
      abandonedBy: { select: { name: true } },
      calibrationOverrideBy: { select: { name: true } },
      equipment: { select: { role: true, equipment: { select: { assetTag: true, name: true, ratedMaxPressurePa: true } }, calibration: { select: { reference: true, dueAt: true } } } },
      stages: { orderBy: { sequence: "asc" }, include: { recordedBy: { select: { name: true } } } },
      reviews: { orderBy: { createdAt: "asc" }, include: { reviewer: { select: { name: true } } } },
    },
  });
  if (!run) throw new AppError("NOT_FOUND");
  const [verdict, correctedReadings, projectLimits] = await Promise.all([
    evaluateRunRecords(db, run.id, { readings: loadCurrentReadingsOnce(run.id) }),
    db.reading.count({ where: { runId: run.id, correctsId: { not: null } } }),
    findProjectLimits({ projectId: run.specimen.coupon.roll.project.id }),
  ]);
  // What the result panel previews conformance against: the project's current specification.
  const limits: PreviewLimits = projectLimits ? { specificationName: projectLimits.specificationName, limits: projectLimits.limits } : null;
  const deviations = runDeviations({ ...run, checklist: run.specimen.checklist, correctedReadings, leakage: verdict.leakage?.flagged ? { statement: verdict.leakage.statement, acknowledgedBy: null } : null });
  return { run, deviations, verdict, limits };
}
