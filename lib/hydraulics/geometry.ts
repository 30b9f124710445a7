/** Specimen geometry. Diameters and thicknesses arrive in mm; areas and volumes leave in SI. */
import { MM_M } from "./units";

/** Cross-section area of a circular specimen, m^2: A = pi d^2 / 4, d in mm. */
export function specimenAreaM2(diameterMm: number): number {
  const dM = diameterMm * MM_M;
  return (Math.PI * dM * dM) / 4;
}

/** Volume of a cylindrical specimen layer, m^3, from diameter and thickness in mm. */
export function specimenVolumeM3(diameterMm: number, thicknessMm: number): number {
  return specimenAreaM2(diameterMm) * thicknessMm * MM_M;
}
