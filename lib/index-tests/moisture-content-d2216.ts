/**
 * Moisture (water) content by oven drying, in the manner of ASTM D2216: the water lost on drying over the
 * mass of the dry solids, w = (m_wet - m_dry) / (m_dry - m_tare). Masses include the container (tare).
 * Pure; the form's schema (lib/validation/index-tests.ts) refuses impossible masses with a field message.
 */
export type MoistureObservations = {
  /** Container plus moist specimen, g. */
  wetWithTareG: number;
  /** Container plus oven-dried specimen, g. */
  dryWithTareG: number;
  /** Container alone, g. */
  tareG: number;
};

export type MoistureContent = {
  waterMassG: number;
  drySolidsMassG: number;
  /** Moisture content as a fraction of the dry mass (0.12 for 12 %). */
  moistureFraction: number;
  moisturePct: number;
};

/** Moisture content of one oven-dried specimen. Throws a RangeError for a dry mass above the wet or a tare not below the dry. */
export function moistureContentD2216(o: MoistureObservations): MoistureContent {
  // Only the three masses are read: callers may pass a whole test's observations.
  for (const k of ["wetWithTareG", "dryWithTareG", "tareG"] as const) if (!Number.isFinite(o[k]) || o[k] < 0) throw new RangeError(`${k} must be a mass of 0 g or more, got ${o[k]}.`);
  if (o.dryWithTareG > o.wetWithTareG) throw new RangeError("The dry mass is above the wet mass: water cannot be gained in the oven.");
  if (o.tareG >= o.dryWithTareG) throw new RangeError("The tare is not below the dry mass: there are no dry solids.");
  const waterMassG = o.wetWithTareG - o.dryWithTareG;
  const drySolidsMassG = o.dryWithTareG - o.tareG;
  const moistureFraction = waterMassG / drySolidsMassG;
  return { waterMassG, drySolidsMassG, moistureFraction, moisturePct: moistureFraction * 100 };
}
