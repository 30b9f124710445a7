/**
 * What the entry form of each index-test method asks, in the order a technician works: the observation
 * fields with their labels, and the columns of the per-specimen rows. Defaults that the method fixes (the
 * clay mass, the strip width) are taken from the lab's settings of the method. Pure.
 */
import type { IndexMethodCode } from "./index-test-methods";

export type ObservationField = { key: string; label: string; hint?: string; fromSetting?: string };
export type SpecimenColumn = { key: string; label: string; fromSetting?: string };

export const INDEX_TEST_FIELDS: Record<IndexMethodCode, { fields: ObservationField[]; specimenColumns: SpecimenColumn[]; choice?: { key: string; label: string; options: Array<{ value: string; label: string }> } }> = {
  D5890: {
    fields: [
      { key: "dryClayMassG", label: "Dry clay added (g)", fromSetting: "nominalClayMassG" },
      { key: "settledVolumeMl", label: "Settled swollen volume (mL)", hint: "Read on the cylinder after hydration." },
      { key: "hydrationHours", label: "Hydration time (h)", fromSetting: "minHydrationHours" },
      { key: "waterTemperatureC", label: "Water temperature (°C)" },
    ],
    specimenColumns: [],
  },
  D5891: {
    fields: [
      { key: "clayMassG", label: "Clay in the slurry (g)", fromSetting: "clayMassG" },
      { key: "waterVolumeMl", label: "Water in the slurry (mL)", fromSetting: "waterVolumeMl" },
      { key: "pressureKPa", label: "Filter-press pressure (kPa)", fromSetting: "pressureKPa" },
      { key: "filtrationMinutes", label: "Filtration time (min)", fromSetting: "filtrationMinutes" },
      { key: "filtrateVolumeMl", label: "Filtrate collected (mL)" },
    ],
    specimenColumns: [],
  },
  D2216: {
    fields: [
      { key: "wetWithTareG", label: "Container and wet clay (g)" },
      { key: "dryWithTareG", label: "Container and oven-dried clay (g)" },
      { key: "tareG", label: "Container (g)" },
      { key: "dryingHours", label: "Drying time (h)", fromSetting: "minDryingHours" },
      { key: "ovenTemperatureC", label: "Oven temperature (°C)", fromSetting: "ovenTemperatureC" },
    ],
    specimenColumns: [],
  },
  D5993: {
    fields: [
      { key: "wetWithTareG", label: "Clay moisture: container and wet clay (g)" },
      { key: "dryWithTareG", label: "Clay moisture: container and oven-dried clay (g)" },
      { key: "tareG", label: "Clay moisture: container (g)" },
    ],
    specimenColumns: [
      { key: "lengthMm", label: "Length (mm)" },
      { key: "widthMm", label: "Width (mm)" },
      { key: "totalMassG", label: "Total mass (g)" },
      { key: "geotextileMassG", label: "Geotextile mass (g)" },
    ],
  },
  D6768: {
    fields: [],
    choice: { key: "direction", label: "Direction", options: [{ value: "MD", label: "Machine direction (MD)" }, { value: "XD", label: "Cross-machine direction (XD)" }] },
    specimenColumns: [
      { key: "widthMm", label: "Strip width (mm)", fromSetting: "stripWidthMm" },
      { key: "peakForceN", label: "Peak force (N)" },
    ],
  },
  D6496: {
    fields: [],
    specimenColumns: [
      { key: "widthMm", label: "Specimen width (mm)", fromSetting: "specimenWidthMm" },
      { key: "peelForceN", label: "Average peel force (N)" },
    ],
  },
};
