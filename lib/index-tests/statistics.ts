/**
 * The mean and sample standard deviation (n - 1 in the denominator) of the specimens of one index test, as
 * ASTM D6768 and D6496 report them. Pure.
 */
export type SpecimenStatistics = {
  count: number;
  mean: number;
  /** Sample standard deviation (Bessel's n - 1); null with a single specimen. */
  standardDeviation: number | null;
  /** Coefficient of variation in per cent of the mean; null when the deviation is. */
  coefficientOfVariationPct: number | null;
};

/** Mean and sample standard deviation of at least one finite value. */
export function specimenStatistics(values: readonly number[]): SpecimenStatistics {
  if (values.length === 0) throw new RangeError("At least one specimen value is needed.");
  for (const v of values) if (!Number.isFinite(v)) throw new RangeError(`A specimen value is not a finite number: ${v}.`);
  const n = values.length;
  const mean = values.reduce((s, v) => s + v, 0) / n;
  if (n === 1) return { count: 1, mean, standardDeviation: null, coefficientOfVariationPct: null };
  const sumSquares = values.reduce((s, v) => s + (v - mean) ** 2, 0);
  const standardDeviation = Math.sqrt(sumSquares / (n - 1));
  return { count: n, mean, standardDeviation, coefficientOfVariationPct: mean === 0 ? null : (standardDeviation / Math.abs(mean)) * 100 };
}
