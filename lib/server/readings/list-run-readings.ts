import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { can } from "@/lib/policy/permissions";
import { runTransition, type RunStateName } from "@/lib/runs/run-state-machine";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { currentVolumesMl } from "@/lib/evaluation/current-volumes";
import { BURETTE_PANEL_ROLE, buretteAreasMm2 } from "./reading-context";

const READING_SELECT = {
  id: true, sequence: true, takenAt: true, elapsedS: true, inflowLevelMm: true, outflowLevelMm: true, inflowCumulativeMl: true, outflowCumulativeMl: true,
  headPa: true, influentPressurePa: true, effluentPressurePa: true, cellPressurePa: true, temperatureC: true,
  influentEcMsPerM: true, effluentEcMsPerM: true, influentPh: true, effluentPh: true, afterRefill: true,
  source: true, correctsId: true, correctionReason: true, createdAt: true,
  recordedBy: { select: { id: true, name: true } },
  correctedBy: { select: { id: true } },
} as const;

/**
 * A run's readings for the readings panel: the current set (readings no other reading corrects, by
 * elapsed time, with volumes counted from the first of them as lib/hydraulics gets them) and, per
 * sequence number, every version oldest first with who recorded or corrected it, when and why.
 * `canRecord` says whether this person may add or correct readings now, and `whyNot` why not.
 */
export async function listRunReadings(options: { actor: CurrentUser; runId: string }) {
  requirePermission(options.actor, "run.view");
  const db = getDb();
  const run = await db.run.findUnique({
    where: { id: options.runId },
    select: {
      id: true, labNumber: true, state: true, methodCode: true, performedById: true,
      stages: { where: { kind: "PERMEATION" }, orderBy: { sequence: "asc" }, take: 1, select: { startedAt: true } },
      equipment: { where: { role: BURETTE_PANEL_ROLE }, select: { equipment: { select: { assetTag: true } }, calibration: { select: { values: true, reference: true } } } },
    },
  });
  if (!run) throw new AppError("NOT_FOUND");
  const all = await db.reading.findMany({ where: { runId: run.id }, orderBy: [{ sequence: "asc" }, { createdAt: "asc" }], select: READING_SELECT });

  const current = all.filter((r) => !r.correctedBy).sort((a, b) => a.elapsedS - b.elapsedS);
  const panel = run.equipment[0];
  const areasMm2 = buretteAreasMm2(panel?.calibration?.values);
  const volumes = new Map(currentVolumesMl(current, areasMm2).map((v, i) => [current[i]!.id, v]));
  const base = current[0];
  const withVolumes = <R extends (typeof all)[number]>(r: R) => ({
    ...r,
    /** Cumulative inflow since the first current reading, mL, carried across refills (what lib/hydraulics gets). */
    inflowMl: volumes.get(r.id)?.inflowMl ?? (base ? r.inflowCumulativeMl - base.inflowCumulativeMl : r.inflowCumulativeMl),
    outflowMl: volumes.get(r.id)?.outflowMl ?? (base ? r.outflowCumulativeMl - base.outflowCumulativeMl : r.outflowCumulativeMl),
    corrected: r.correctsId !== null,
  });
  const history = new Map<number, Array<ReturnType<typeof withVolumes>>>();
  for (const r of all) history.set(r.sequence, [...(history.get(r.sequence) ?? []), withVolumes(r)]);

  const permeationStartedAt = run.stages[0]?.startedAt ?? null;
  const step = runTransition(run.state as RunStateName, "record-reading");
  const whyNot = !can(options.actor.role, "run.operate")
    ? "Your role reads readings only; the technician performing the run records them."
    : run.performedById !== options.actor.id
      ? `${run.labNumber} is another technician's run; only the person performing it records its readings.`
      : !step.ok
        ? step.message
        : !permeationStartedAt
          ? "Record the permeation stage first: elapsed time counts from its start."
          : !areasMm2
            ? `The burette panel${panel ? ` ${panel.equipment.assetTag}` : ""} has no calibrated burette areas, so levels cannot be turned into volumes.`
            : null;

  return {
    run: { id: run.id, labNumber: run.labNumber, state: run.state, methodCode: run.methodCode, permeationStartedAt, areasMm2, burettePanel: panel ? { assetTag: panel.equipment.assetTag, calibrationReference: panel.calibration?.reference ?? null } : null },
    current: current.map(withVolumes),
    history: [...history.entries()].map(([sequence, versions]) => ({ sequence, versions })),
    canRecord: whyNot === null,
    whyNot,
  };
}
export type RunReadings = Awaited<ReturnType<typeof listRunReadings>>;
export type RunReadingView = RunReadings["current"][number];
