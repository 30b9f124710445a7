/**
 * Properties of liquid water at about 0.1 MPa, 0 to 40 °C: density, viscosity and the
 * viscosity ratio R_T used to correct hydraulic conductivity to 20 °C.
 */

/**
 * Density of air-free water at 101.325 kPa, kg/m^3, from Tanaka, Girard, Davis, Peuto & Bignell,
 * "Recommended table for the density of water between 0 °C and 40 °C based on recent experimental
 * reports", Metrologia 38 (2001) 301-309, eq. (1) with its Table 1 constants (valid 0–40 °C,
 * ITS-90). Gives 998.2067 kg/m^3 at 20 °C.
 */
export function waterDensityKgPerM3(temperatureC: number): number {
  const a1 = -3.983035; // °C
  const a2 = 301.797; // °C
  const a3 = 522528.9; // °C^2
  const a4 = 69.34881; // °C
  const a5 = 999.97495; // kg/m^3
  const t = temperatureC;
  return a5 * (1 - ((t + a1) * (t + a1) * (t + a2)) / (a3 * (t + a4)));
}

// IAPWS R12-08 (2008), "Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary
// Water Substance", eqs. (10)-(12) with Tables 1 and 2. Reducing constants:
const T_STAR_K = 647.096;
const RHO_STAR_KG_PER_M3 = 322.0;
const MU_STAR_PA_S = 1.0e-6;
const H0 = [1.67752, 2.20462, 0.6366564, -0.241605] as const;
// H1[i][j], i = 0..5 (powers of 1/Tbar - 1), j = 0..6 (powers of rhobar - 1).
const H1: readonly (readonly number[])[] = [
  [5.20094e-1, 2.22531e-1, -2.81378e-1, 1.61913e-1, -3.25372e-2, 0, 0],
  [8.50895e-2, 9.99115e-1, -9.06851e-1, 2.57399e-1, 0, 0, 0],
  [-1.08374, 1.88797, -7.72479e-1, 0, 0, 0, 0],
  [-2.89555e-1, 1.26613, -4.89837e-1, 0, 6.98452e-2, 0, -4.35673e-3],
  [0, 0, -2.5704e-1, 0, 0, 8.72102e-3, 0],
  [0, 1.20573e-1, 0, 0, 0, 0, -5.93264e-4],
];

/**
 * Dynamic viscosity of water, Pa s, by IAPWS R12-08 for given temperature (K) and density (kg/m^3).
 * The critical enhancement mu2 is taken as 1: it matters only near the critical point, far from
 * a permeameter.
 */
export function iapwsViscosityPaS(temperatureK: number, densityKgPerM3: number): number {
  const tBar = temperatureK / T_STAR_K;
  const rhoBar = densityKgPerM3 / RHO_STAR_KG_PER_M3;
  let denom = 0;
  for (let i = 0; i < H0.length; i++) denom += (H0[i] as number) / Math.pow(tBar, i);
  const mu0 = (100 * Math.sqrt(tBar)) / denom;
  const x = 1 / tBar - 1;
  const y = rhoBar - 1;
  let sum = 0;
  let xi = 1;
  for (let i = 0; i < H1.length; i++) {
    const row = H1[i] as readonly number[];
    let inner = 0;
    let yj = 1;
    for (let j = 0; j < row.length; j++) {
      inner += (row[j] as number) * yj;
      yj *= y;
    }
    sum += xi * inner;
    xi *= x;
  }
  const mu1 = Math.exp(rhoBar * sum);
  return mu0 * mu1 * MU_STAR_PA_S;
}

/** Viscosity of liquid water at 0.1 MPa, mPa s, at temperatureC (°C): IAPWS R12-08 with Tanaka density. */
export function waterViscosityMPaS(temperatureC: number): number {
  return iapwsViscosityPaS(temperatureC + 273.15, waterDensityKgPerM3(temperatureC)) * 1000;
}

/**
 * ASTM D5084 empirical viscosity ratio R_T = 2.2902 (0.9842^T) / T^0.1702, T in °C.
 * Meant for about 15 to 30 °C; note that it gives 1.00023, not exactly 1, at 20 °C.
 */
export function d5084ViscosityRatio(temperatureC: number): number {
  return (2.2902 * Math.pow(0.9842, temperatureC)) / Math.pow(temperatureC, 0.1702);
}

/** R_T = mu(T) / mu(20 °C) from IAPWS R12-08 viscosities (exactly 1 at 20 °C). */
export function iapwsViscosityRatio(temperatureC: number): number {
  return waterViscosityMPaS(temperatureC) / MU_20C_MPA_S;
}

const MU_20C_MPA_S = waterViscosityMPaS(20);

/**
 * How R_T is obtained.
 * - "D5084-in-range" (default): the D5084 equation from 15 to 30 °C, IAPWS 2008 ratio outside
 *   (at 10 °C the equation is about 1.2 % off).
 * - "D5084-equation": the equation at every temperature (a warning is given outside 15–30 °C).
 * - "IAPWS-2008": the IAPWS viscosity ratio everywhere.
 */
export type ViscosityRatioBasis = "D5084-in-range" | "D5084-equation" | "IAPWS-2008";

/** Which formula actually produced an R_T value. */
export type ViscosityRatioSource = "D5084-equation" | "IAPWS-2008";

export const D5084_EQUATION_RANGE_C = { min: 15, max: 30 } as const;

/** R_T (dimensionless) at temperatureC (°C), and which formula produced it. */
export function viscosityRatio(
  temperatureC: number,
  basis: ViscosityRatioBasis = "D5084-in-range",
): { ratio: number; source: ViscosityRatioSource } {
  const inRange =
    temperatureC >= D5084_EQUATION_RANGE_C.min && temperatureC <= D5084_EQUATION_RANGE_C.max;
  // The equation divides by T^0.1702, so it has no value at 0 °C: IAPWS there whatever the basis.
  if (basis === "IAPWS-2008" || (basis === "D5084-in-range" && !inRange) || temperatureC <= 0) {
    return { ratio: iapwsViscosityRatio(temperatureC), source: "IAPWS-2008" };
  }
  return { ratio: d5084ViscosityRatio(temperatureC), source: "D5084-equation" };
}
