/** The results a run reports from its verdict, early ends with their uncertainty too. Pure. */
import type { TestMethod } from "../hydraulics/types";
import type { RunVerdict } from "../evaluation/run-evaluation-context";
import { resultsFromEvaluation, type RunResult } from "./results-from-evaluation";

/**
 * resultsFromEvaluation with the uncertainty inputs taken from the verdict, so that a run ended early
 * carries its expanded uncertainty like one that met its criteria. Throws as resultsFromEvaluation does.
 */
export function resultsOfVerdict(verdict: RunVerdict, method: TestMethod, options: { earlyEnd: boolean }): RunResult[] {
  if (!verdict.evaluation) throw new Error(verdict.reason ?? "The run has no evaluation.");
  const sources = verdict.uncertaintySources;
  return resultsFromEvaluation(verdict.evaluation, method, {
    allowEarlyEnd: options.earlyEnd,
    ...(sources.ok && { earlyEndUncertainty: { declared: sources.declared, diameterMm: verdict.specimen.diameterMm, thicknessMm: verdict.specimen.thicknessMm } }),
  });
}
