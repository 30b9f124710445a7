import "server-only";
import { readBurettePanel, readLeakageCheck } from "@/lib/equipment/calibration-values";
import { evaluateRunContext, type RunEvaluationContext, type RunVerdict } from "@/lib/evaluation/run-evaluation-context";
import type { TestMethod } from "@/lib/hydraulics";
import type { Db } from "../db/client";
import type { Tx } from "../db/transaction";
import { loadSettingsInUse } from "../methods/settings-in-use";
import { loadCurrentReadings, type CurrentReadingRow } from "../readings/load-current-readings";
import { BURETTE_PANEL_ROLE } from "../readings/reading-context";

type Source = Pick<Db, "reading" | "run" | "methodSettingsVersion" | "calibration" | "$queryRaw"> | Tx;

/** A run's records as the pure evaluation builder takes them (lib/evaluation/run-evaluation-context.ts). */
export async function loadRunEvaluationContext(db: Source, runId: string, options: { readings?: Promise<CurrentReadingRow[]> } = {}): Promise<RunEvaluationContext> {
  const run = await db.run.findUniqueOrThrow({
    where: { id: runId },
    select: {
      methodCode: true, assignedAt: true, postTestThicknessMm: true, cellId: true, methodSettingsVersionId: true, settingsChoiceReason: true,
      settingsChosenBy: { select: { name: true } },
      cell: { select: { assetTag: true } },
      specimen: { select: { dieDiameterMm: true, initialThicknessMm: true, moistureContentPct: true, bentoniteDryMassG: true, bentoniteMassPerAreaKgPerM2: true, specificGravity: true } },
      equipment: { select: { role: true, equipment: { select: { assetTag: true, kind: true } }, calibration: { select: { reference: true, values: true } } } },
    },
  });
  const [readings, settings, cellCalibrations] = await Promise.all([
    options.readings ?? loadCurrentReadings(db, runId),
    loadSettingsInUse(db, run),
    db.calibration.findMany({ where: { equipmentId: run.cellId }, orderBy: [{ calibratedAt: "desc" }, { createdAt: "desc" }], select: { values: true } }),
  ]);
  const panel = run.equipment.find((e) => e.role === BURETTE_PANEL_ROLE);
  const leakage = cellCalibrations.map((c) => readLeakageCheck(c.values)).find((c) => c !== null) ?? null;
  return {
    methodCode: run.methodCode as TestMethod,
    specimen: run.specimen,
    postTestThicknessMm: run.postTestThicknessMm,
    readings,
    burettePanel: readBurettePanel(panel?.calibration?.values),
    settings,
    instruments: run.equipment.map((e) => ({ role: e.role, assetTag: e.equipment.assetTag, kind: e.equipment.kind, calibrationReference: e.calibration?.reference ?? null, values: e.calibration?.values ?? null })),
    cellLeakage: leakage ? { cell: run.cell.assetTag, check: leakage } : null,
  };
}

// On globalThis, like the readings they belong to (current-readings-cache.ts): pages and route handlers share them.
const globalForVerdicts = globalThis as unknown as { seeplineVerdicts?: WeakMap<readonly CurrentReadingRow[], Map<string, RunVerdict>> };
const verdictsOfReadings = (globalForVerdicts.seeplineVerdicts ??= new WeakMap());

/**
 * The hydraulics library's verdict on a run's current readings, or why there is none yet, with how it was
 * computed. The gradient uses the post-test bentonite layer thickness once it is measured, the initial
 * specimen thickness before. Readings passed in from the page's loader are the same array while the run's
 * readings are unchanged, so the verdict on them is kept with them, per set of the other records it used
 * (evaluating 100,000 readings takes the better part of a second).
 */
export async function evaluateRunRecords(db: Source, runId: string, options: { readings?: Promise<CurrentReadingRow[]> } = {}): Promise<RunVerdict> {
  const context = await loadRunEvaluationContext(db, runId, options);
  if (!options.readings) return evaluateRunContext(context);
  const readings = context.readings as readonly CurrentReadingRow[];
  const records = JSON.stringify({ ...context, readings: null });
  const known = verdictsOfReadings.get(readings) ?? new Map<string, RunVerdict>();
  const kept = known.get(records);
  if (kept) return kept;
  const verdict = evaluateRunContext(context);
  if (known.size >= 4) known.clear();
  known.set(records, verdict);
  verdictsOfReadings.set(readings, known);
  return verdict;
}
