import fc from "fast-check";
import { createRequire } from "node:module";
import { linearRegression } from "simple-statistics";
import { describe, expect, it } from "vitest";
import {
  leastSquaresSlopeTest,
  lnGamma,
  regularizedIncompleteBeta,
  studentTCdf,
  studentTQuantile,
  studentTTwoSidedP,
} from "../../../lib/hydraulics";

// jstat ships no type declarations; load it through require and type the two functions used.
interface JStat {
  studentt: { cdf(t: number, df: number): number; inv(p: number, df: number): number };
  ibeta(x: number, a: number, b: number): number;
}
const { jStat } = createRequire(import.meta.url)("jstat") as { jStat: JStat };

describe("special functions", () => {
  it("lnGamma matches known values", () => {
    // Gamma(5) = 24, Gamma(0.5) = sqrt(pi), Gamma(10.5) = 1133278.3889487856 (tabulated).
    expect(lnGamma(5)).toBeCloseTo(Math.log(24), 12);
    expect(lnGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 12);
    expect(lnGamma(10.5)).toBeCloseTo(Math.log(1133278.3889487856), 10);
  });

  it("incomplete beta matches jstat and closed forms", () => {
    // jstat's continued fraction stops near 1e-10 relative, so it is compared at 1e-9.
    for (const [x, a, b] of [[0.3, 2, 0.5], [0.9, 1.5, 0.5], [0.05, 10, 0.5], [0.5, 3, 4]] as const) {
      expect(Math.abs(regularizedIncompleteBeta(x, a, b) - jStat.ibeta(x, a, b))).toBeLessThan(1e-9);
    }
    // Closed forms: I_x(1, 1) = x; I_x(a, 1) = x^a; I_x(1, b) = 1 - (1 - x)^b.
    expect(regularizedIncompleteBeta(0.37, 1, 1)).toBeCloseTo(0.37, 14);
    expect(regularizedIncompleteBeta(0.6, 3, 1)).toBeCloseTo(0.216, 14);
    expect(regularizedIncompleteBeta(0.2, 1, 4)).toBeCloseTo(1 - 0.8 ** 4, 14);
  });
});

describe("Student t distribution against jstat (independent reference)", () => {
  it("CDF over a grid of t and df", () => {
    // jstat's t CDF carries errors up to about 2e-8 (it gives 0.50000002 at t = 0, df = 1), so the
    // comparison is at 1e-7; the closed forms below check ours to 1e-13.
    for (const df of [1, 2, 3, 5, 10, 30, 200]) {
      for (const t of [-6, -2.5, -1, -0.1, 0, 0.3, 1.7, 3.2, 12]) {
        expect(Math.abs(studentTCdf(t, df) - jStat.studentt.cdf(t, df))).toBeLessThan(1e-7);
      }
    }
  });

  it("closed forms for df = 1 (Cauchy) and df = 2", () => {
    // df 1: F(t) = 1/2 + atan(t)/pi, so F(-1) = 0.25 exactly. df 2: F(t) = 1/2 + t / (2 sqrt(2 + t^2)).
    for (const t of [-7, -1, -0.2, 0, 0.5, 2, 30]) {
      expect(studentTCdf(t, 1)).toBeCloseTo(0.5 + Math.atan(t) / Math.PI, 13);
      expect(studentTCdf(t, 2)).toBeCloseTo(0.5 + t / (2 * Math.sqrt(2 + t * t)), 13);
    }
  });

  it("textbook critical values", () => {
    // Two-sided 5 % critical values of t (any statistics table): df 2 -> 4.303, df 10 -> 2.228.
    expect(studentTQuantile(0.975, 2)).toBeCloseTo(4.302652729, 6);
    expect(studentTQuantile(0.975, 10)).toBeCloseTo(2.228138852, 6);
    expect(Math.abs(studentTQuantile(0.975, 10) - jStat.studentt.inv(0.975, 10))).toBeLessThan(1e-7);
    // The two-sided p at the critical value is 0.05.
    expect(studentTTwoSidedP(4.302652729, 2)).toBeCloseTo(0.05, 8);
  });

  it("property: CDF agrees with jstat for random t and df", () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }), fc.integer({ min: 1, max: 500 }), (t, df) => {
        expect(Math.abs(studentTCdf(t, df) - jStat.studentt.cdf(t, df))).toBeLessThan(1e-7);
      }),
    );
  });
});

describe("least-squares slope test", () => {
  it("worked example", () => {
    // x = 1,2,3,4,5; y = 2.1, 3.9, 6.2, 7.8, 10.1. mean x = 3, mean y = 6.02.
    // Sxx = 4+1+0+1+4 = 10; Sxy = (-2)(-3.92)+(-1)(-2.12)+0+(1)(1.78)+(2)(4.08) = 7.84+2.12+1.78+8.16 = 19.9
    // slope = 19.9/10 = 1.99; intercept = 6.02 - 1.99×3 = 0.05.
    // residuals: 2.1-2.04=0.06, 3.9-4.03=-0.13, 6.2-6.02=0.18, 7.8-8.01=-0.21, 10.1-10.0=0.10
    // SSE = 0.0036+0.0169+0.0324+0.0441+0.01 = 0.107; se = sqrt(0.107/3/10) = 0.059722; t = 33.321.
    const x = [1, 2, 3, 4, 5];
    const y = [2.1, 3.9, 6.2, 7.8, 10.1];
    const r = leastSquaresSlopeTest(x, y);
    expect(r.slope).toBeCloseTo(1.99, 12);
    expect(r.intercept).toBeCloseTo(0.05, 12);
    expect(r.slopeStandardError).toBeCloseTo(0.0597216, 6);
    expect(r.t).toBeCloseTo(33.3213, 3);
    expect(r.degreesOfFreedom).toBe(3);
    // p from jstat: 2 × (1 - F(t; 3)).
    expect(r.pValue).toBeCloseTo(2 * (1 - jStat.studentt.cdf(r.t as number, 3)), 10);
    // simple-statistics agrees on the line.
    const ss = linearRegression(x.map((xi, i) => [xi, y[i] as number]));
    expect(r.slope).toBeCloseTo(ss.m, 12);
    expect(r.intercept).toBeCloseTo(ss.b, 12);
  });

  it("slope agrees with simple-statistics on elapsed seconds with large offsets", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 1e-9, max: 2e-9, noNaN: true }), { minLength: 3, maxLength: 30 }),
        fc.integer({ min: 0, max: 5_000_000 }),
        (ys, t0) => {
          const xs = ys.map((_, i) => t0 + i * 3600);
          const ours = leastSquaresSlopeTest(xs, ys);
          const ref = linearRegression(xs.map((x, i) => [x, ys[i] as number]));
          expect(Math.abs(ours.slope - ref.m)).toBeLessThanOrEqual(1e-9 * Math.max(Math.abs(ref.m), 1e-21) + 1e-24);
        },
      ),
    );
  });

  it("flat data has p = 1, an exact line has p = 0, two points have no test", () => {
    expect(leastSquaresSlopeTest([0, 1, 2, 3], [5, 5, 5, 5]).pValue).toBe(1);
    expect(leastSquaresSlopeTest([0, 1, 2, 3], [1, 2, 3, 4]).pValue).toBe(0);
    const two = leastSquaresSlopeTest([0, 1], [1, 3]);
    expect(two.slope).toBe(2);
    expect(two.pValue).toBeNull();
  });
});
