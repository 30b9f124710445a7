/**
 * Expanded measurement uncertainty (coverage factor k = 2) of reported flux and k20 by first-order
 * propagation (GUM, JCGM 100:2008, eq. 10) of declared, uncorrelated standard uncertainties.
 *
 * Model over the window of intervals that gave the reported values, treated as one interval
 * (exact for the mean of equal-length intervals):
 *   q   = Q / (A T)                 A = pi d^2 / 4
 *   k20 = q L / h × R_T(T)          h = dp / gamma_w (+ burette levels)
 * so the relative standard uncertainties add in quadrature:
 *   u_r(q)^2   = (2 u_d / d)^2 + (u_Q / Q)^2 + (u_T / T)^2
 *   u_r(k20)^2 = u_r(q)^2 + (u_L / L)^2 + (u_h / h)^2 + (dlnR_T/dT · u_temp)^2
 * with u_Q = u_v (mean of two burette differences, four independent readings: sqrt(4 u_v^2) / 2)
 * and u_T = sqrt(2) u_t (difference of two time stamps).
 */
import type { DeclaredUncertainties, ExpandedUncertainty } from "./types";
import { viscosityRatio } from "./water";
import type { ViscosityRatioBasis } from "./water";

/** Standard uncertainty from the half-width a of a rectangular distribution: a / sqrt(3). */
export function standardUncertaintyFromRectangular(halfWidth: number): number {
  return halfWidth / Math.sqrt(3);
}

/** Standard uncertainty from an expanded uncertainty U stated with coverage factor k: U / k. */
export function standardUncertaintyFromExpanded(expanded: number, coverageFactor = 2): number {
  return expanded / coverageFactor;
}

const FIELDS = ["diameterMm", "thicknessMm", "volumeMl", "timeS", "pressureKPa", "temperatureC"] as const;

/** Throws naming the field when a declared uncertainty is negative or not finite. */
export function validateDeclaredUncertainties(d: DeclaredUncertainties): void {
  for (const f of FIELDS) {
    const v = d[f];
    if (typeof v !== "number" || !Number.isFinite(v) || v < 0) {
      throw new Error(`options.uncertainty.${f} must be a finite number ≥ 0, got ${String(v)}`);
    }
  }
}

/**
 * Expanded uncertainties (k = 2) of flux (m^3/m^2/s) and k20 (m/s) for a window with total mean
 * volume volumeMl (mL), duration durationS (s), mean head headM (m), mean temperature (°C).
 */
export function expandedUncertainty(args: {
  fluxM3PerM2PerS: number;
  k20MPerS: number;
  diameterMm: number;
  thicknessMm: number;
  volumeMl: number;
  durationS: number;
  headM: number;
  unitWeightKNPerM3: number;
  temperatureC: number;
  declared: DeclaredUncertainties;
  viscosityRatioBasis?: ViscosityRatioBasis;
}): ExpandedUncertainty {
  const d = args.declared;
  for (const f of ["diameterMm", "thicknessMm", "volumeMl", "durationS", "headM", "unitWeightKNPerM3"] as const) {
    const v = args[f];
    if (!(Number.isFinite(v) && v > 0)) throw new Error(`${f} must be a positive finite number for the uncertainty, got ${String(v)}`);
  }
  // Numerical derivative of ln R_T with the formula that produced R_T at this temperature: under
  // the default basis the two sides of 15 °C or 30 °C would otherwise come from different formulas,
  // whose 0.15 % offset over a 0.1 °C step would distort the slope by about half.
  const dT = 0.05; // °C
  const source = viscosityRatio(args.temperatureC, args.viscosityRatioBasis).source;
  const r = (t: number) => viscosityRatio(t, source).ratio;
  // The D5084 equation has no value at 0 °C, so use a forward difference close to it.
  const lower = source === "D5084-equation" && args.temperatureC - dT <= 0 ? args.temperatureC : args.temperatureC - dT;
  const upper = args.temperatureC + dT;
  const dLnRdT = (Math.log(r(upper)) - Math.log(r(lower))) / (upper - lower);
  const budget = {
    diameterMm: (2 * d.diameterMm) / args.diameterMm,
    thicknessMm: d.thicknessMm / args.thicknessMm,
    volumeMl: d.volumeMl / args.volumeMl,
    timeS: (Math.SQRT2 * d.timeS) / args.durationS,
    pressureKPa: d.pressureKPa / args.unitWeightKNPerM3 / args.headM,
    temperatureC: Math.abs(dLnRdT) * d.temperatureC,
  };
  const fluxRelStd = Math.hypot(budget.diameterMm, budget.volumeMl, budget.timeS);
  const k20RelStd = Math.hypot(fluxRelStd, budget.thicknessMm, budget.pressureKPa, budget.temperatureC);
  return {
    coverageFactor: 2,
    fluxM3PerM2PerS: 2 * fluxRelStd * Math.abs(args.fluxM3PerM2PerS),
    k20MPerS: 2 * k20RelStd * Math.abs(args.k20MPerS),
    fluxRelative: 2 * fluxRelStd,
    k20Relative: 2 * k20RelStd,
    budget,
  };
}
