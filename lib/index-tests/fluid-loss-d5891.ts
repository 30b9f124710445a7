/**
 * Bentonite fluid loss, ASTM D5891: a slurry of about 6 % solids (22.5 g of clay in 350 mL of water) aged,
 * then filtered in a filter press at about 690 kPa (100 psi) for 30 minutes; the filtrate volume is the
 * result in mL. Pure.
 */
export type FluidLossObservations = {
  clayMassG: number;
  waterVolumeMl: number;
  pressureKPa: number;
  filtrationMinutes: number;
  filtrateVolumeMl: number;
};

export type FluidLossRules = {
  pressureKPa: number;
  pressureToleranceKPa: number;
  filtrationMinutes: number;
};

export type FluidLossResult = {
  fluidLossMl: number;
  /** Solids content of the slurry, % by mass, taking water at 1 g/mL (common practice). */
  slurrySolidsPct: number;
  departures: string[];
};

/** The fluid loss, the slurry's solids content and any departure from the method's pressure or time. */
export function fluidLossD5891(o: FluidLossObservations, rules: FluidLossRules): FluidLossResult {
  if (!(o.filtrateVolumeMl >= 0)) throw new RangeError("The filtrate volume must be 0 mL or more.");
  if (!(o.clayMassG > 0) || !(o.waterVolumeMl > 0)) throw new RangeError("The clay mass and the water volume must be more than 0.");
  const slurrySolidsPct = (o.clayMassG / (o.clayMassG + o.waterVolumeMl)) * 100;
  const departures: string[] = [];
  if (Math.abs(o.pressureKPa - rules.pressureKPa) > rules.pressureToleranceKPa + 1e-9)
    departures.push(`The filter-press pressure, ${o.pressureKPa} kPa, is outside ${rules.pressureKPa} ± ${rules.pressureToleranceKPa} kPa.`);
  if (o.filtrationMinutes !== rules.filtrationMinutes) departures.push(`The filtrate was collected over ${o.filtrationMinutes} min, not the method's ${rules.filtrationMinutes} min.`);
  return { fluidLossMl: o.filtrateVolumeMl, slurrySolidsPct, departures };
}
