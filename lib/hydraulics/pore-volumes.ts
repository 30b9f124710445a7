/**
 * Pore volumes of flow for D6766: cumulative flow divided by the pore volume of the bentonite
 * layer, with the porosity estimated when it was not measured.
 *
 * Where the defaults come from:
 * - Specific gravity of bentonite solids 2.75: from memory; values of about 2.7 to 2.8 are usual
 *   for sodium montmorillonite-rich bentonite. Use the lab's own value when it has one.
 * - Bentonite mass per unit area: no default is applied; GRI-GCL3 (as cited in public project
 *   specifications) sets a minimum of 3.66 kg/m^2 at 0 % moisture, exported below for reference
 *   only, because a porosity from a minimum would overstate the pore volume of a heavier product.
 * - Water density 1000 kg/m^3 for converting G_s to a solids density: common practice; the error
 *   is below 0.3 % between 0 and 40 °C.
 */
import { specimenVolumeM3 } from "./geometry";
import { MM_M } from "./units";

export const DEFAULT_BENTONITE_SPECIFIC_GRAVITY = 2.75;
export const GRI_GCL3_MIN_BENTONITE_MASS_PER_AREA_KG_PER_M2 = 3.66;
const WATER_DENSITY_FOR_GS_KG_PER_M3 = 1000;

/**
 * Porosity (0..1) of the bentonite layer: n = 1 - rho_d / (G_s rho_w), with the dry density
 * rho_d = (dry mass per area, kg/m^2) / (thickness, m).
 */
export function estimatePorosity(args: {
  bentoniteMassPerAreaKgPerM2: number;
  thicknessMm: number;
  specificGravity?: number;
}): number {
  const gs = args.specificGravity ?? DEFAULT_BENTONITE_SPECIFIC_GRAVITY;
  const dryDensityKgPerM3 = args.bentoniteMassPerAreaKgPerM2 / (args.thicknessMm * MM_M);
  return 1 - dryDensityKgPerM3 / (gs * WATER_DENSITY_FOR_GS_KG_PER_M3);
}

/** Pore volume of the specimen's bentonite layer, mL: n × A × L. */
export function poreVolumeMl(args: { diameterMm: number; thicknessMm: number; porosity: number }): number {
  return args.porosity * specimenVolumeM3(args.diameterMm, args.thicknessMm) * 1e6;
}

/** Pore volumes of flow (dimensionless): cumulative flow (mL) / pore volume (mL). */
export function poreVolumesOfFlow(cumulativeFlowMl: number, poreVolumeMlValue: number): number {
  return cumulativeFlowMl / poreVolumeMlValue;
}

/**
 * Porosity to use for a specimen: the measured one if given, else an estimate from mass per area,
 * or null with the reason when neither is available or the estimate is not physical.
 */
export function resolvePorosity(specimen: {
  thicknessMm: number;
  porosity?: number;
  bentoniteMassPerAreaKgPerM2?: number;
  specificGravity?: number;
}): { porosity: number; source: string } | { porosity: null; reason: string } {
  if (specimen.porosity !== undefined) return { porosity: specimen.porosity, source: "measured porosity" };
  if (specimen.bentoniteMassPerAreaKgPerM2 === undefined) {
    return {
      porosity: null,
      reason:
        "enter the specimen's measured porosity or its dry bentonite mass per unit area",
    };
  }
  const n = estimatePorosity({
    bentoniteMassPerAreaKgPerM2: specimen.bentoniteMassPerAreaKgPerM2,
    thicknessMm: specimen.thicknessMm,
    ...(specimen.specificGravity !== undefined ? { specificGravity: specimen.specificGravity } : {}),
  });
  if (!(n > 0 && n < 1)) {
    return {
      porosity: null,
      reason: `the porosity estimated from them, ${n.toFixed(3)}, is not between 0 and 1; check the bentonite mass per unit area, thickness and specific gravity`,
    };
  }
  const gs = specimen.specificGravity ?? DEFAULT_BENTONITE_SPECIFIC_GRAVITY;
  return { porosity: n, source: `estimated from bentonite mass per area with G_s = ${gs}` };
}
