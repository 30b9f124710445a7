/**
 * Peel strength of a needle-punched GCL, ASTM D6496: specimens of known width whose geotextiles are peeled
 * apart; the average peel force over the width of each, in N/m, and the mean and sample standard deviation
 * of the specimens. Pure.
 */
import { specimenStatistics, type SpecimenStatistics } from "./statistics";

export type PeelSpecimen = { widthMm: number; peelForceN: number };

export type PeelResult = { specimensNPerM: number[] } & SpecimenStatistics;

/** Average peel force per unit width of each specimen and their statistics, N/m. */
export function peelStrengthD6496(specimens: readonly PeelSpecimen[]): PeelResult {
  if (specimens.length === 0) throw new RangeError("At least one specimen is needed.");
  const specimensNPerM = specimens.map((s, i) => {
    if (!(s.widthMm > 0)) throw new RangeError(`Specimen ${i + 1}: the width must be more than 0 mm.`);
    if (!(s.peelForceN >= 0)) throw new RangeError(`Specimen ${i + 1}: the peel force cannot be negative.`);
    return (s.peelForceN / s.widthMm) * 1000;
  });
  return { specimensNPerM, ...specimenStatistics(specimensNPerM) };
}
