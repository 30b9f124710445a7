/**
 * Downsampling of a line series for drawing: largest-triangle-three-buckets (LTTB), from S. Steinarsson,
 * "Downsampling Time Series for Visual Representation", MSc thesis, University of Iceland, 2013. The first
 * and last points are kept; the points between are split into `threshold - 2` buckets of equal count, and
 * from each bucket the point that makes the largest triangle with the point kept from the previous bucket and
 * the average of the next bucket is kept. Peaks, troughs and steps survive; flat stretches thin out. Pure.
 */
export function largestTriangleThreeBuckets(xs: ArrayLike<number>, ys: ArrayLike<number>, threshold: number): number[] {
  const n = Math.min(xs.length, ys.length);
  if (threshold >= n) return Array.from({ length: n }, (_, i) => i);
  if (threshold < 3) return n === 1 ? [0] : [0, n - 1];
  const kept = [0];
  const every = (n - 2) / (threshold - 2);
  let a = 0;
  for (let bucket = 0; bucket < threshold - 2; bucket++) {
    // The average of the next bucket (the last point for the last bucket) is the triangle's third corner.
    const nextStart = Math.floor((bucket + 1) * every) + 1;
    const nextEnd = Math.min(Math.floor((bucket + 2) * every) + 1, n);
    let avgX = 0;
    let avgY = 0;
    const nextCount = Math.max(1, nextEnd - nextStart);
    for (let i = nextStart; i < nextStart + nextCount && i < n; i++) {
      avgX += xs[i]!;
      avgY += ys[i]!;
    }
    avgX /= nextCount;
    avgY /= nextCount;
    const start = Math.floor(bucket * every) + 1;
    const end = Math.min(Math.floor((bucket + 1) * every) + 1, n - 1);
    let best = start;
    let bestArea = -1;
    for (let i = start; i < end; i++) {
      // Twice the triangle's area; only the comparison matters.
      const area = Math.abs((xs[a]! - avgX) * (ys[i]! - ys[a]!) - (xs[a]! - xs[i]!) * (avgY - ys[a]!));
      if (area > bestArea) {
        bestArea = area;
        best = i;
      }
    }
    kept.push(best);
    a = best;
  }
  kept.push(n - 1);
  return kept;
}

/**
 * The rows of `rows` to draw for several series sharing one x: LTTB on each series (its finite values only)
 * with an equal share of `maxPoints`, the union of what each keeps, in order. A gap (NaN) stays a gap when
 * every series is NaN there; the first and last rows are always kept.
 */
export function downsampleRows<T extends Record<string, number>>(rows: readonly T[], x: keyof T, keys: ReadonlyArray<keyof T>, maxPoints: number): T[] {
  if (rows.length <= maxPoints) return [...rows];
  const share = Math.max(3, Math.floor(maxPoints / Math.max(1, keys.length)));
  const keep = new Set<number>([0, rows.length - 1]);
  // Typed arrays, filled once per series: a data-logger run has 100,000 rows, and arrays of boxed numbers
  // per series cost more in allocation and garbage collection than the triangles themselves.
  const n = rows.length;
  const xs = new Float64Array(n);
  for (let i = 0; i < n; i++) xs[i] = rows[i]![x] as number;
  const fx = new Float64Array(n);
  const fy = new Float64Array(n);
  const at = new Int32Array(n);
  for (const key of keys) {
    let count = 0;
    for (let i = 0; i < n; i++) {
      const y = rows[i]![key] as number;
      if (!Number.isFinite(y) || !Number.isFinite(xs[i]!)) continue;
      fx[count] = xs[i]!;
      fy[count] = y;
      at[count++] = i;
    }
    for (const p of largestTriangleThreeBuckets(fx.subarray(0, count), fy.subarray(0, count), share)) keep.add(at[p]!);
  }
  return [...keep].sort((a, b) => a - b).map((i) => rows[i]!);
}
