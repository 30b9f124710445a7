/**
 * Tensile strength of a GCL, ASTM D6768: strips of known width pulled to failure; the peak force over the
 * width of each, in kN/m (a force in N over a width in mm is N/mm, which equals kN/m), and the mean and
 * sample standard deviation of the specimens. Pure.
 */
import { specimenStatistics, type SpecimenStatistics } from "./statistics";

export type StripSpecimen = { widthMm: number; peakForceN: number };

export type TensileResult = { specimensKnPerM: number[] } & SpecimenStatistics;

/** Peak force per unit width of each strip and their statistics, kN/m. */
export function tensileStrengthD6768(specimens: readonly StripSpecimen[]): TensileResult {
  if (specimens.length === 0) throw new RangeError("At least one specimen is needed.");
  const specimensKnPerM = specimens.map((s, i) => {
    if (!(s.widthMm > 0)) throw new RangeError(`Specimen ${i + 1}: the width must be more than 0 mm.`);
    if (!(s.peakForceN >= 0)) throw new RangeError(`Specimen ${i + 1}: the peak force cannot be negative.`);
    return s.peakForceN / s.widthMm;
  });
  return { specimensKnPerM, ...specimenStatistics(specimensKnPerM) };
}
