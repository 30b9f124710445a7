import { downsampleRows } from "../charts/downsample";

/** One drawn point of the run charts (elapsed hours; SI fluxes and k; mL; pore volumes). */
export type ChartPoint = { hours: number; inflowFlux: number; outflowFlux: number; ratio: number; k20: number; inflowMl: number; outflowMl: number; poreVolumes: number };
export const CHART_KEYS = ["hours", "inflowFlux", "outflowFlux", "ratio", "k20", "inflowMl", "outflowMl", "poreVolumes"] as const;
const DRAWN_KEYS = CHART_KEYS.slice(1);

/** Column per key: far smaller to send than one object per point. NaN (a gap) travels as null. */
export type ChartColumns = Record<(typeof CHART_KEYS)[number], Array<number | null>>;
export type HoursRange = { fromHours: number; toHours: number };
export type ChartSeries = { columns: ChartColumns; shown: HoursRange; span: HoursRange; pointsInRange: number; drawn: number };

/** At most this many points go to a browser for the charts of one range (a few thousand numbers a chart). */
export const MAX_CHART_POINTS = 1200;

const round = (v: number, digits: number) => (Number.isFinite(v) ? Number(v.toPrecision(digits)) : null);

/** The hours a run's points span, or null when there are none. */
export function chartSpan(points: readonly ChartPoint[]): HoursRange | null {
  return points.length ? { fromHours: points[0]!.hours, toHours: points[points.length - 1]!.hours } : null;
}

/**
 * Why a zoom range cannot be drawn, or null when it can: it must be a range (from before to), and overlap the
 * hours the run's points span. A range that reaches past either end is drawn for the part inside.
 */
export function chartRangeProblem(span: HoursRange | null, range: HoursRange): string | null {
  if (!Number.isFinite(range.fromHours) || !Number.isFinite(range.toHours)) return "Give the range as two numbers of hours since permeation began.";
  if (range.fromHours >= range.toHours) return "The range must end after it starts.";
  if (!span) return "This run has no chart points yet.";
  if (range.toHours < span.fromHours || range.fromHours > span.toHours)
    return `This run's points span ${span.fromHours.toFixed(1)} h to ${span.toHours.toFixed(1)} h; choose a range inside it.`;
  return null;
}

/**
 * The points of `range` (the whole run when absent), downsampled by largest-triangle-three-buckets on each
 * series to at most `maxPoints`, rounded to what a chart can show (six significant digits for hours, four
 * for values) and sent as columns. Every reading still counts in the criteria; this is only what is drawn.
 */
export function chartSeries(points: readonly ChartPoint[], range?: HoursRange, maxPoints = MAX_CHART_POINTS): ChartSeries {
  const span = chartSpan(points) ?? { fromHours: 0, toHours: 0 };
  const inRange = range ? points.filter((p) => p.hours >= range.fromHours && p.hours <= range.toHours) : [...points];
  const drawn = downsampleRows(inRange, "hours", DRAWN_KEYS, maxPoints);
  const columns = Object.fromEntries(CHART_KEYS.map((k) => [k, drawn.map((p) => round(p[k], k === "hours" ? 6 : 4))])) as ChartColumns;
  const shown = inRange.length ? { fromHours: inRange[0]!.hours, toHours: inRange[inRange.length - 1]!.hours } : range ?? span;
  return { columns, shown, span, pointsInRange: inRange.length, drawn: drawn.length };
}

/** The columns back as one object per point, gaps as NaN, for the chart library. */
export function columnsToPoints(columns: ChartColumns): ChartPoint[] {
  return columns.hours.map((_, i) => Object.fromEntries(CHART_KEYS.map((k) => [k, columns[k][i] ?? Number.NaN])) as ChartPoint);
}
