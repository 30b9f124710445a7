import "server-only";
import { evaluateRun, type EvaluateRunOptions, type RunEvaluation, type RunInput, type TestMethod } from "@/lib/hydraulics";
import type { Tx } from "../db/transaction";
import type { Db } from "../db/client";
import { toHydraulicsReadings } from "../readings/to-hydraulics-input";

type Source = Pick<Db, "reading" | "run">;

/**
 * The hydraulics library's verdict on a run's current readings, or why there is none yet. The gradient
 * uses the post-test bentonite layer thickness once it is measured, the initial specimen thickness before.
 */
export async function evaluateRunRecords(db: Source | Tx, runId: string, options: EvaluateRunOptions = {}): Promise<{ evaluation: RunEvaluation | null; reason: string | null; thicknessBasis: "post-test" | "initial"; inputReadings: RunInput["readings"] }> {
  const run = await db.run.findUniqueOrThrow({
    where: { id: runId },
    select: { methodCode: true, postTestThicknessMm: true, specimen: { select: { dieDiameterMm: true, initialThicknessMm: true } } },
  });
  const readings = await db.reading.findMany({ where: { runId, correctedBy: null }, orderBy: { elapsedS: "asc" } });
  const thicknessBasis = run.postTestThicknessMm ? "post-test" : "initial";
  const inputReadings = toHydraulicsReadings(readings);
  if (readings.length < 2) return { evaluation: null, reason: "At least two readings are needed before anything can be calculated.", thicknessBasis, inputReadings };
  try {
    const evaluation = evaluateRun({
      method: run.methodCode as TestMethod,
      specimen: { diameterMm: run.specimen.dieDiameterMm, thicknessMm: run.postTestThicknessMm ?? run.specimen.initialThicknessMm },
      readings: inputReadings,
    }, options);
    return { evaluation, reason: null, thicknessBasis, inputReadings };
  } catch (error) {
    // The library names the offending field; the readings page shows it so the technician can correct it.
    return { evaluation: null, reason: error instanceof Error ? error.message : String(error), thicknessBasis, inputReadings };
  }
}
