/**
 * Checks of entered pressures before they are saved (common practice, see shared/DOMAIN.md): the cell
 * (confining) pressure must exceed both line pressures by the confining margin, or the membrane can
 * burst; no pressure may exceed an instrument's rated maximum. All pressures in pascals.
 */
export type StagePressuresPa = { cellPa: number; influentPa: number; effluentPa: number };
export type RatedInstrument = { assetTag: string; ratedMaxPressurePa: number | null };

export type PressureCheck = {
  marginPa: number;
  requiredMarginPa: number;
  marginKept: boolean;
  overRated: Array<{ assetTag: string; ratedMaxPressurePa: number; pressurePa: number }>;
  warnings: string[];
};

/** The margin kept (cell minus the higher line pressure) and any instrument whose rating is exceeded. */
export function checkStagePressures(p: StagePressuresPa, requiredMarginPa: number, instruments: RatedInstrument[]): PressureCheck {
  const highestLinePa = Math.max(p.influentPa, p.effluentPa);
  const marginPa = p.cellPa - highestLinePa;
  const marginKept = marginPa >= requiredMarginPa;
  const highestPa = Math.max(p.cellPa, p.influentPa, p.effluentPa);
  const overRated = instruments
    .filter((i): i is { assetTag: string; ratedMaxPressurePa: number } => i.ratedMaxPressurePa !== null && highestPa > i.ratedMaxPressurePa)
    .map((i) => ({ assetTag: i.assetTag, ratedMaxPressurePa: i.ratedMaxPressurePa, pressurePa: highestPa }));
  const warnings: string[] = [];
  if (!marginKept) {
    const margin = `${(requiredMarginPa / 1000).toFixed(0)} kPa confining margin`;
    const byKPa = (Math.abs(marginPa) / 1000).toFixed(1);
    // A cell level with or below the line is no "excess": say where it stands and what it must reach.
    const where =
      byKPa === "0.0" ? `The cell pressure is level with the higher line pressure; it must exceed it by the ${margin}`
      : marginPa > 0 ? `The cell pressure exceeds the higher line pressure by ${byKPa} kPa, less than the ${margin}`
      : `The cell pressure is ${byKPa} kPa below the higher line pressure; it must exceed it by the ${margin}`;
    warnings.push(`${where}: the membrane can burst or the specimen can be lifted. Raise the cell pressure first.`);
  }
  for (const o of overRated)
    warnings.push(`${o.assetTag} is rated to ${(o.ratedMaxPressurePa / 1000).toFixed(0)} kPa; ${(o.pressurePa / 1000).toFixed(0)} kPa would exceed it.`);
  return { marginPa, requiredMarginPa, marginKept, overRated, warnings };
}

