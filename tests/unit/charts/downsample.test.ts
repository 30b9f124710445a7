import { describe, expect, it } from "vitest";
// @ts-expect-error: the reference package ships no types; its one function takes [x, y] pairs.
import { processData } from "downsample-lttb";
import { downsampleRows, largestTriangleThreeBuckets } from "@/lib/charts/downsample";

// Reference: downsample-lttb 0.0.1 (npm), Steinarsson's own LTTB code (2013 thesis) as a Node module.
const reference = (xs: number[], ys: number[], threshold: number): number[][] => processData(xs.map((x, i) => [x, ys[i]]), threshold) as number[][];

function noisySeries(n: number, seed: number) {
  let s = seed;
  const random = () => ((s = (s * 1_103_515_245 + 12_345) % 2 ** 31) / 2 ** 31);
  const xs = Array.from({ length: n }, (_, i) => i * 300 + random() * 10);
  const ys = xs.map((x, i) => Math.sin(x / 5000) * 1e-9 + random() * 2e-10 + (i === Math.floor(n / 3) ? 5e-9 : 0));
  return { xs, ys };
}

describe("largest-triangle-three-buckets (Steinarsson 2013)", () => {
  it("keeps the same points as the reference implementation", () => {
    for (const [n, threshold, seed] of [[10_000, 500, 1], [2_345, 100, 7], [50, 10, 3], [1_000, 999, 11]] as const) {
      const { xs, ys } = noisySeries(n, seed);
      const mine = largestTriangleThreeBuckets(xs, ys, threshold).map((i) => [xs[i], ys[i]]);
      expect(mine).toEqual(reference(xs, ys, threshold));
    }
  });

  it("keeps the first, the last and a lone spike", () => {
    const { xs, ys } = noisySeries(100_000, 5);
    const kept = largestTriangleThreeBuckets(xs, ys, 1_000);
    expect(kept).toHaveLength(1_000);
    expect(kept[0]).toBe(0);
    expect(kept.at(-1)).toBe(99_999);
    expect(kept).toContain(Math.floor(100_000 / 3));
  });

  it("returns every point when there are no more than asked for, and the ends below three", () => {
    expect(largestTriangleThreeBuckets([1, 2, 3], [1, 2, 3], 10)).toEqual([0, 1, 2]);
    expect(largestTriangleThreeBuckets([1, 2, 3, 4], [1, 2, 3, 4], 2)).toEqual([0, 3]);
    expect(largestTriangleThreeBuckets([], [], 10)).toEqual([]);
  });
});

describe("downsampleRows: several series on one x", () => {
  it("stays within the budget and keeps each series' own extremes", () => {
    const rows = Array.from({ length: 20_000 }, (_, i) => ({ hours: i / 10, a: i === 5_000 ? 100 : Math.sin(i / 300), b: i === 15_000 ? -100 : Math.cos(i / 300) }));
    const kept = downsampleRows(rows, "hours", ["a", "b"], 1_000);
    expect(kept.length).toBeLessThanOrEqual(1_000);
    expect(kept.length).toBeGreaterThan(900);
    expect(kept.some((r) => r.a === 100)).toBe(true);
    expect(kept.some((r) => r.b === -100)).toBe(true);
    expect(kept.map((r) => r.hours)).toEqual([...kept.map((r) => r.hours)].sort((x, y) => x - y));
  });

  it("skips gaps (NaN) of one series without losing the other's points", () => {
    const rows = Array.from({ length: 5_000 }, (_, i) => ({ hours: i, a: i % 2 ? Number.NaN : i, b: i * 2 }));
    const kept = downsampleRows(rows, "hours", ["a", "b"], 400);
    expect(kept.length).toBeLessThanOrEqual(400);
    expect(kept[0]?.hours).toBe(0);
    expect(kept.at(-1)?.hours).toBe(4_999);
  });

  it("leaves a short series as it is", () => {
    const rows = [{ hours: 0, a: 1 }, { hours: 1, a: 2 }];
    expect(downsampleRows(rows, "hours", ["a"], 1_000)).toEqual(rows);
  });
});
