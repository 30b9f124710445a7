/**
 * Burettes: cumulative volumes from raw level readings and calibrated cross-section areas, and the
 * head loss across the specimen from the differential pressure plus the level difference.
 * Levels are heights in mm above a datum common to both burettes; areas are in mm^2 (from the
 * cell's calibration), so level (mm) × area (mm^2) / 1000 is mL.
 */
import { MM_M } from "./units";

/**
 * Cumulative inflow volumes, mL, from inflow burette levels (mm): inflow is the fall of the level
 * since the first reading, times the burette area (mm^2).
 */
export function cumulativeInflowMl(levelsMm: readonly number[], areaMm2: number): number[] {
  const first = levelsMm[0] ?? 0;
  return levelsMm.map((level) => ((first - level) * areaMm2) / 1000);
}

/**
 * Cumulative outflow volumes, mL, from outflow burette levels (mm): outflow is the rise of the
 * level since the first reading, times the burette area (mm^2).
 */
export function cumulativeOutflowMl(levelsMm: readonly number[], areaMm2: number): number[] {
  const first = levelsMm[0] ?? 0;
  return levelsMm.map((level) => ((level - first) * areaMm2) / 1000);
}

/**
 * Head loss across the specimen, m of water: dh = (p_in - p_out) / gamma_w + (z_in - z_out),
 * with the differential pressure in kPa, gamma_w in kN/m^3 and the burette levels in mm.
 */
export function headLossM(args: {
  differentialPressureKPa: number;
  inflowLevelMm: number;
  outflowLevelMm: number;
  unitWeightKNPerM3: number;
}): number {
  return (
    args.differentialPressureKPa / args.unitWeightKNPerM3 +
    (args.inflowLevelMm - args.outflowLevelMm) * MM_M
  );
}

/**
 * Level difference (inflow minus outflow), mm, after cumulative inflow and outflow volumes (mL)
 * have moved the two levels from an initial difference: the inflow level falls by V_in / a_in and
 * the outflow level rises by V_out / a_out.
 */
export function levelDifferenceAfterFlowMm(args: {
  initialLevelDifferenceMm: number;
  inflowMl: number;
  outflowMl: number;
  inflowAreaMm2: number;
  outflowAreaMm2: number;
}): number {
  return (
    args.initialLevelDifferenceMm -
    (args.inflowMl * 1000) / args.inflowAreaMm2 -
    (args.outflowMl * 1000) / args.outflowAreaMm2
  );
}
