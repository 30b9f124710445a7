/**
 * Mass per unit area of a GCL and of its clay at 0 % moisture, in the manner of ASTM D5993: specimens of
 * measured size weighed whole; the geotextiles' mass taken off; the clay's mass brought to 0 % moisture with
 * its oven-dried moisture content (ASTM D2216 style): clay_0 = (m_total - m_geotextile) / (1 + w) / A.
 * Pure; kg/m^2 out, mm and g in.
 */
import { moistureContentD2216, type MoistureObservations } from "./moisture-content-d2216";
import { specimenStatistics, type SpecimenStatistics } from "./statistics";

export type MassPerAreaSpecimen = {
  lengthMm: number;
  widthMm: number;
  /** The whole specimen as weighed, g. */
  totalMassG: number;
  /** Both geotextiles (and any scrim) after the clay was removed, g. */
  geotextileMassG: number;
};

export type MassPerAreaResult = {
  /** Per specimen: area, GCL mass per area as weighed, clay mass per area at 0 % moisture. */
  specimens: Array<{ areaM2: number; gclKgPerM2: number; clayDryKgPerM2: number }>;
  moisture: ReturnType<typeof moistureContentD2216>;
  gcl: SpecimenStatistics;
  clayDry: SpecimenStatistics;
};

/** Area of a rectangular specimen, m^2. */
export function specimenAreaM2(lengthMm: number, widthMm: number): number {
  return (lengthMm / 1000) * (widthMm / 1000);
}

/** GCL and clay (0 % moisture) mass per unit area of each specimen and their means, kg/m^2. */
export function massPerAreaD5993(specimens: readonly MassPerAreaSpecimen[], moisture: MoistureObservations): MassPerAreaResult {
  if (specimens.length === 0) throw new RangeError("At least one specimen is needed.");
  const w = moistureContentD2216({ wetWithTareG: moisture.wetWithTareG, dryWithTareG: moisture.dryWithTareG, tareG: moisture.tareG });
  const rows = specimens.map((s, i) => {
    if (!(s.lengthMm > 0) || !(s.widthMm > 0)) throw new RangeError(`Specimen ${i + 1}: its length and width must be more than 0 mm.`);
    if (!(s.totalMassG > 0)) throw new RangeError(`Specimen ${i + 1}: its total mass must be more than 0 g.`);
    if (!(s.geotextileMassG >= 0) || s.geotextileMassG > s.totalMassG) throw new RangeError(`Specimen ${i + 1}: the geotextile mass must be between 0 g and the total mass.`);
    const areaM2 = specimenAreaM2(s.lengthMm, s.widthMm);
    const gclKgPerM2 = s.totalMassG / 1000 / areaM2;
    const clayDryKgPerM2 = (s.totalMassG - s.geotextileMassG) / (1 + w.moistureFraction) / 1000 / areaM2;
    return { areaM2, gclKgPerM2, clayDryKgPerM2 };
  });
  return {
    specimens: rows,
    moisture: w,
    gcl: specimenStatistics(rows.map((r) => r.gclKgPerM2)),
    clayDry: specimenStatistics(rows.map((r) => r.clayDryKgPerM2)),
  };
}
