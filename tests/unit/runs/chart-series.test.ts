import { describe, expect, it } from "vitest";
import { chartRangeProblem, chartSeries, columnsToPoints, MAX_CHART_POINTS, type ChartPoint } from "@/lib/runs/chart-series";
import { readHoursRange } from "@/lib/validation/chart-range";

// A made-up run: one interval every 6 minutes for 10,000 h (100,000 points), flux drifting, one spike.
const points: ChartPoint[] = Array.from({ length: 100_000 }, (_, i) => ({
  hours: i / 10, inflowFlux: 1e-9 + (i === 70_000 ? 5e-9 : 0) + Math.sin(i / 1000) * 1e-10, outflowFlux: 1e-9, ratio: i % 2 ? 1 : Number.NaN,
  k20: 3e-11, inflowMl: i * 0.01, outflowMl: i * 0.0099, poreVolumes: Number.NaN,
}));

describe("the run charts' series", () => {
  it("sends at most a few thousand points of a 100,000-point run, with its ends and its spike", () => {
    const series = chartSeries(points);
    expect(series.pointsInRange).toBe(100_000);
    expect(series.drawn).toBeLessThanOrEqual(MAX_CHART_POINTS);
    expect(series.columns.hours[0]).toBe(0);
    expect(series.columns.hours.at(-1)).toBe(9999.9);
    expect(Math.max(...series.columns.inflowFlux.map(Number))).toBeCloseTo(points[70_000]!.inflowFlux, 12);
    // JSON of the columns stays small enough for a page (about 100 KB).
    expect(JSON.stringify(series.columns).length).toBeLessThan(110_000);
    // A gap travels as null and comes back as NaN.
    expect(series.columns.poreVolumes.every((v) => v === null)).toBe(true);
    expect(Number.isNaN(columnsToPoints(series.columns)[0]!.poreVolumes)).toBe(true);
  });

  it("gives every point of a zoom range that holds few, and the range shown", () => {
    const series = chartSeries(points, { fromHours: 100, toHours: 150 });
    expect(series.pointsInRange).toBe(501);
    expect(series.drawn).toBe(501);
    expect(series.shown).toEqual({ fromHours: 100, toHours: 150 });
    expect(series.span).toEqual({ fromHours: 0, toHours: 9999.9 });
  });

  it("refuses a zoom range outside the run, backwards or not a number, with what to do", () => {
    const span = { fromHours: 0, toHours: 9999.9 };
    expect(chartRangeProblem(span, { fromHours: 20_000, toHours: 30_000 })).toBe("This run's points span 0.0 h to 9999.9 h; choose a range inside it.");
    expect(chartRangeProblem(span, { fromHours: 50, toHours: 10 })).toBe("The range must end after it starts.");
    expect(chartRangeProblem(span, { fromHours: 9000, toHours: 12_000 })).toBeNull();
    expect(() => readHoursRange(new URLSearchParams("fromHours=abc&toHours=3"))).toThrow("Give hours as a number.");
    expect(() => readHoursRange(new URLSearchParams("fromHours=5&toHours=3"))).toThrow("The range must end after it starts.");
    expect(readHoursRange(new URLSearchParams("fromHours=1.5&toHours=3"))).toEqual({ fromHours: 1.5, toHours: 3 });
    expect(readHoursRange(new URLSearchParams(""))).toBeUndefined();
  });
});
