/**
 * Bentonite swell index, ASTM D5890: 2 g of dried, ground clay dusted into reagent water in a 100 mL
 * graduated cylinder, the settled swollen volume read after the hydration time; reported in mL/2 g. The
 * reading is the result; the checks say whether the test was done as the method (and the lab's settings)
 * ask. Pure.
 */
export type SwellIndexObservations = {
  dryClayMassG: number;
  settledVolumeMl: number;
  hydrationHours: number;
  waterTemperatureC: number;
};

export type SwellIndexRules = {
  nominalClayMassG: number;
  clayMassToleranceG: number;
  minHydrationHours: number;
  cylinderCapacityMl: number;
};

export type SwellIndexResult = {
  swellIndexMlPer2g: number;
  /** Departures from the method, in words; empty when none. */
  departures: string[];
};

/** The swell index and any departure from the method's clay mass or hydration time. */
export function swellIndexD5890(o: SwellIndexObservations, rules: SwellIndexRules): SwellIndexResult {
  if (!(o.settledVolumeMl >= 0)) throw new RangeError("The settled volume must be 0 mL or more.");
  if (o.settledVolumeMl > rules.cylinderCapacityMl) throw new RangeError(`The settled volume is above the cylinder's capacity of ${rules.cylinderCapacityMl} mL.`);
  const departures: string[] = [];
  if (Math.abs(o.dryClayMassG - rules.nominalClayMassG) > rules.clayMassToleranceG + 1e-12)
    departures.push(`The clay mass, ${o.dryClayMassG} g, is outside ${rules.nominalClayMassG} ± ${rules.clayMassToleranceG} g.`);
  if (o.hydrationHours < rules.minHydrationHours) departures.push(`The volume was read after ${o.hydrationHours} h, before the ${rules.minHydrationHours} h the method asks.`);
  return { swellIndexMlPer2g: o.settledVolumeMl, departures };
}
