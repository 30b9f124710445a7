import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { toChartPoints } from "@/lib/runs/chart-points";
import { chartRangeProblem, chartSeries, chartSpan, type ChartSeries, type HoursRange } from "@/lib/runs/chart-series";
import type { RunVerdict } from "@/lib/evaluation/run-evaluation-context";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { loadCurrentReadingsOnce } from "../readings/load-current-readings";
import { evaluateRunRecords } from "./evaluate-run-records";

type ChartPoint = ReturnType<typeof toChartPoints>[number];

const pointsOfVerdicts = new WeakMap<RunVerdict, ChartPoint[]>();
const fullSeriesOfVerdicts = new WeakMap<RunVerdict, ChartSeries>();

/** A verdict's chart points, worked out once per verdict (a kept verdict keeps them too). */
function verdictChartPoints(verdict: RunVerdict): ChartPoint[] {
  let points = pointsOfVerdicts.get(verdict);
  if (!points) {
    points = verdict.evaluation ? toChartPoints(verdict.evaluation.intervals, verdict.inputReadings, verdict.poreVolume.ml) : [];
    pointsOfVerdicts.set(verdict, points);
  }
  return points;
}

/** The drawn series of a verdict (all of it, or the hours of `range`), downsampled for the browser. */
export function verdictChartSeries(verdict: RunVerdict, range?: HoursRange): ChartSeries | null {
  if (!verdict.evaluation) return null;
  if (range) return chartSeries(verdictChartPoints(verdict), range);
  let series = fullSeriesOfVerdicts.get(verdict);
  if (!series) {
    series = chartSeries(verdictChartPoints(verdict));
    fullSeriesOfVerdicts.set(verdict, series);
  }
  return series;
}

/**
 * A run's chart series for a zoom range (hours since permeation began): every interval in it when they are
 * few, a downsampled series when many. A range outside the run's points is refused with the span it has.
 * Its readings are read once, narrow, like the run page's.
 */
export async function getRunChartSeries(options: { actor: CurrentUser; labNumber: string; range?: HoursRange }): Promise<ChartSeries> {
  requirePermission(options.actor, "run.view");
  const run = await getDb().run.findUnique({ where: { labNumber: options.labNumber }, select: { id: true } });
  if (!run) throw new AppError("NOT_FOUND");
  const verdict = await evaluateRunRecords(getDb(), run.id, { readings: loadCurrentReadingsOnce(run.id) });
  // A run with nothing to draw yet has an empty series; a zoom range into it is refused below.
  const points = verdictChartPoints(verdict);
  if (options.range) {
    const problem = chartRangeProblem(chartSpan(points), options.range);
    if (problem) throw new AppError("INVALID_INPUT", problem, { fieldErrors: { range: problem } });
  }
  return verdictChartSeries(verdict, options.range) ?? chartSeries(points, options.range);
}
