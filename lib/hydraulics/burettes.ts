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

/**
 * Cumulative inflow and outflow volumes, mL, from a run's burette levels (mm) in time order, carried
 * across refills: each step adds the fall of the inflow level and the rise of the outflow level times
 * the burette areas (mm^2), except into a reading marked afterRefill, where the levels jumped because
 * the technician refilled or drained a burette and no flow is counted. `start` is the first reading's
 * cumulative volumes.
 */
export function cumulativeVolumesAcrossRefillsMl(
  levels: ReadonlyArray<{ inflowLevelMm: number; outflowLevelMm: number; afterRefill?: boolean }>,
  areas: { inflowAreaMm2: number; outflowAreaMm2: number },
  start: { inflowMl: number; outflowMl: number } = { inflowMl: 0, outflowMl: 0 },
): Array<{ inflowMl: number; outflowMl: number }> {
  const out: Array<{ inflowMl: number; outflowMl: number }> = [];
  let inflowMl = start.inflowMl;
  let outflowMl = start.outflowMl;
  for (let i = 0; i < levels.length; i++) {
    const r = levels[i]!;
    const prev = levels[i - 1];
    if (prev && !r.afterRefill) {
      inflowMl += ((prev.inflowLevelMm - r.inflowLevelMm) * areas.inflowAreaMm2) / 1000;
      outflowMl += ((r.outflowLevelMm - prev.outflowLevelMm) * areas.outflowAreaMm2) / 1000;
    }
    out.push({ inflowMl, outflowMl });
  }
  return out;
}
