/**
 * Least-squares slope with its t statistic and two-sided p-value, and the Student t distribution
 * it needs (via the regularized incomplete beta function; no statistics dependency in lib).
 */

// Lanczos approximation (g = 7, n = 9), accurate to about 1e-15 for positive arguments.
const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313,
  -176.61502916214059, 12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6,
  1.5056327351493116e-7,
] as const;

/** Natural log of the gamma function, x > 0. */
export function lnGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - lnGamma(1 - x);
  const z = x - 1;
  let a = LANCZOS[0];
  const t = z + 7.5;
  for (let i = 1; i < 9; i++) a += (LANCZOS[i] as number) / (z + i);
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(a);
}

// Continued fraction for the incomplete beta (modified Lentz), as in Numerical Recipes §6.4.
function betaContinuedFraction(a: number, b: number, x: number): number {
  const tiny = 1e-300;
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 300; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < 1e-15) break;
  }
  return h;
}

/** Regularized incomplete beta I_x(a, b), 0 ≤ x ≤ 1, a, b > 0. */
export function regularizedIncompleteBeta(x: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const lnFront =
    lnGamma(a + b) - lnGamma(a) - lnGamma(b) + a * Math.log(x) + b * Math.log(1 - x);
  const front = Math.exp(lnFront);
  // Use the symmetry I_x(a,b) = 1 - I_{1-x}(b,a) where the fraction converges faster.
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(a, b, x)) / a;
  return 1 - (front * betaContinuedFraction(b, a, 1 - x)) / b;
}

/** Cumulative distribution of Student's t with df degrees of freedom, P(T ≤ t). */
export function studentTCdf(t: number, df: number): number {
  if (Number.isNaN(t)) return Number.NaN;
  if (t === Infinity) return 1;
  if (t === -Infinity) return 0;
  const tail = 0.5 * regularizedIncompleteBeta(df / (df + t * t), df / 2, 0.5);
  return t > 0 ? 1 - tail : tail;
}

/** Two-sided p-value of a t statistic: P(|T| ≥ |t|). */
export function studentTTwoSidedP(t: number, df: number): number {
  if (!Number.isFinite(t)) return Number.isNaN(t) ? Number.NaN : 0;
  return regularizedIncompleteBeta(df / (df + t * t), df / 2, 0.5);
}

export interface SlopeTest {
  n: number;
  /** Units of y per unit of x. */
  slope: number;
  intercept: number;
  /** Standard error of the slope; 0 when the points lie exactly on a line. */
  slopeStandardError: number;
  /** slope / standard error; null with fewer than 3 points. */
  t: number | null;
  degreesOfFreedom: number;
  /** Two-sided p-value of slope = 0; null with fewer than 3 points. */
  pValue: number | null;
}

/**
 * Ordinary least-squares line y = intercept + slope x, with the t test of slope = 0
 * (df = n - 2). Centred sums keep it accurate for large x offsets such as elapsed seconds.
 */
export function leastSquaresSlopeTest(x: readonly number[], y: readonly number[]): SlopeTest {
  const n = Math.min(x.length, y.length);
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i] as number;
    my += y[i] as number;
  }
  mx /= n;
  my /= n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = (x[i] as number) - mx;
    const dy = (y[i] as number) - my;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  const slope = sxx > 0 ? sxy / sxx : 0;
  const intercept = my - slope * mx;
  const df = n - 2;
  if (df < 1 || sxx === 0) {
    return { n, slope, intercept, slopeStandardError: Number.NaN, t: null, degreesOfFreedom: df, pValue: null };
  }
  const sse = Math.max(0, syy - slope * sxy);
  const se = Math.sqrt(sse / df / sxx);
  // Rounding noise can leave sse a hair above zero for exact lines: treat relative 1e-24 as zero.
  const exact = sse <= 1e-24 * syy || syy === 0;
  let t: number;
  if (exact) t = slope === 0 ? 0 : slope > 0 ? Infinity : -Infinity;
  else t = slope / se;
  return {
    n,
    slope,
    intercept,
    slopeStandardError: exact ? 0 : se,
    t,
    degreesOfFreedom: df,
    pValue: studentTTwoSidedP(t, df),
  };
}

/** Quantile of Student's t: the t with P(T ≤ t) = p, by bisection on the CDF (60 halvings). */
export function studentTQuantile(p: number, df: number): number {
  if (!(p > 0 && p < 1)) throw new Error(`p must be between 0 and 1, got ${p}`);
  let lo = -1e6;
  let hi = 1e6;
  for (let i = 0; i < 200 && hi - lo > 1e-12 * Math.max(1, Math.abs(hi)); i++) {
    const mid = (lo + hi) / 2;
    if (studentTCdf(mid, df) < p) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
