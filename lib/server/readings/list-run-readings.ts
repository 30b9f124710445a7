import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { Prisma } from "@/lib/generated/prisma/client";
import { can } from "@/lib/policy/permissions";
import { runTransition, type RunStateName } from "@/lib/runs/run-state-machine";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { currentVolumesMl } from "@/lib/evaluation/current-volumes";
import { loadCurrentReadingsOnce, type CurrentReadingRow } from "./load-current-readings";
import { BURETTE_PANEL_ROLE, buretteAreasMm2 } from "./reading-context";

const READING_SELECT = {
  id: true, sequence: true, takenAt: true, elapsedS: true, inflowLevelMm: true, outflowLevelMm: true, inflowCumulativeMl: true, outflowCumulativeMl: true,
  headPa: true, influentPressurePa: true, effluentPressurePa: true, cellPressurePa: true, temperatureC: true,
  influentEcMsPerM: true, effluentEcMsPerM: true, influentPh: true, effluentPh: true, afterRefill: true,
  source: true, correctsId: true, correctionReason: true, createdAt: true,
  recordedBy: { select: { id: true, name: true } },
  correctedBy: { select: { id: true } },
} as const;
type ReadingRow = Prisma.ReadingGetPayload<{ select: typeof READING_SELECT }>;

// The volumes of a kept set of readings (current-readings-cache.ts) are worked out once per burette areas.
const globalForVolumes = globalThis as unknown as { seeplineVolumes?: WeakMap<readonly CurrentReadingRow[], { areas: string; volumes: Array<{ inflowMl: number; outflowMl: number }> }> };
const volumesOfReadings = (globalForVolumes.seeplineVolumes ??= new WeakMap());

function volumesOf(readings: CurrentReadingRow[], areasMm2: { inflow: number; outflow: number } | null) {
  const areas = JSON.stringify(areasMm2);
  const kept = volumesOfReadings.get(readings);
  if (kept?.areas === areas) return kept.volumes;
  const volumes = currentVolumesMl(readings, areasMm2);
  volumesOfReadings.set(readings, { areas, volumes });
  return volumes;
}

/** Readings shown a page at a time: a run logged every few minutes for weeks holds tens of thousands. */
export const READINGS_PAGE_SIZE = 100;


/**
 * A run's readings for the readings panel, one page of the current set (readings no other reading corrects,
 * by elapsed time; `page` counts from 1, the last page when absent) with raw levels and volumes counted from
 * the first current reading as lib/hydraulics gets them (so the volumes need every current reading's levels,
 * read as a few columns), and, per sequence number of the page's corrected readings, every version oldest first
 * with who recorded or corrected it, when and why. `canRecord` says whether this person may add or correct
 * readings now, and `whyNot` why not.
 */
export async function listRunReadings(options: { actor: CurrentUser; runId: string; page?: number; pageSize?: number }) {
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
  const currentAll = await loadCurrentReadingsOnce(run.id);

  const pageSize = options.pageSize ?? READINGS_PAGE_SIZE;
  const pageCount = Math.max(1, Math.ceil(currentAll.length / pageSize));
  const page = Math.min(Math.max(1, options.page ?? pageCount), pageCount);
  const slice = currentAll.slice((page - 1) * pageSize, page * pageSize);
  const lastCurrent = currentAll[currentAll.length - 1];
  const correctedSequences = slice.filter((r) => r.corrected).map((r) => r.sequence);
  const [shown, earlier] = await Promise.all([
    db.reading.findMany({ where: { id: { in: [...slice.map((r) => r.id), ...(lastCurrent ? [lastCurrent.id] : [])] } }, select: READING_SELECT }),
    correctedSequences.length ? db.reading.findMany({ where: { runId: run.id, sequence: { in: correctedSequences } }, orderBy: [{ sequence: "asc" }, { createdAt: "asc" }], select: READING_SELECT }) : [],
  ]);
  const byId = new Map(shown.map((r) => [r.id, r]));

  const panel = run.equipment[0];
  const areasMm2 = buretteAreasMm2(panel?.calibration?.values);
  const allVolumes = volumesOf(currentAll, areasMm2);
  const firstShown = (page - 1) * pageSize;
  const volumes = new Map(slice.map((r, i) => [r.id, allVolumes[firstShown + i]!]));
  if (lastCurrent) volumes.set(lastCurrent.id, allVolumes[currentAll.length - 1]!);
  const base = currentAll[0];
  const withVolumes = <R extends ReadingRow>(r: R) => ({
    ...r,
    /** Cumulative inflow since the first current reading, mL, carried across refills (what lib/hydraulics gets). */
    inflowMl: volumes.get(r.id)?.inflowMl ?? (base ? r.inflowCumulativeMl - base.inflowCumulativeMl : r.inflowCumulativeMl),
    outflowMl: volumes.get(r.id)?.outflowMl ?? (base ? r.outflowCumulativeMl - base.outflowCumulativeMl : r.outflowCumulativeMl),
    corrected: r.correctsId !== null,
  });
  const current = slice.map((r) => withVolumes(byId.get(r.id)!));
  const history = new Map<number, Array<ReturnType<typeof withVolumes>>>();
  for (const r of earlier) history.set(r.sequence, [...(history.get(r.sequence) ?? []), withVolumes(r)]);
  const last = lastCurrent ? withVolumes(byId.get(lastCurrent.id)!) : undefined;

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
    current,
    last,
    window: { page, pageCount, pageSize, total: currentAll.length, first: (page - 1) * pageSize + 1 },
    history: [...history.entries()].map(([sequence, versions]) => ({ sequence, versions })),
    canRecord: whyNot === null,
    whyNot,
  };
}
export type RunReadings = Awaited<ReturnType<typeof listRunReadings>>;
export type RunReadingView = RunReadings["current"][number];
