/** ASTM D5891 fluid loss: 22.5 g in 350 mL, filter press at about 690 kPa for 30 min. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

const G = "The method";
export const D5891_SETTINGS = indexMethodSettings({
  methodCode: "D5891",
  units: ["mL"],
  ownShape: {
    clayMassG: measured("the clay mass of the slurry", { positive: true, max: 1000 }),
    waterVolumeMl: measured("the water volume of the slurry", { positive: true, max: 10000 }),
    pressureKPa: measured("the filter-press pressure", { positive: true, max: 5000 }),
    pressureToleranceKPa: measured("the tolerance on the pressure", { min: 0, max: 1000 }),
    filtrationMinutes: measured("the filtration time", { positive: true, max: 600 }),
  },
  ownFields: [
    { key: "clayMassG", label: "Clay in the slurry", unit: "g", group: G, source: "standard", note: "ASTM D5891: 22.5 g of bentonite (a slurry of about 6 % solids)." },
    { key: "waterVolumeMl", label: "Water in the slurry", unit: "mL", group: G, source: "standard", note: "ASTM D5891: 350 mL of reagent water." },
    { key: "pressureKPa", label: "Filter-press pressure", unit: "kPa", group: G, source: "standard", note: "ASTM D5891: about 690 kPa (100 psi)." },
    { key: "pressureToleranceKPa", label: "Tolerance on the pressure", unit: "± kPa", group: G, source: "from memory", note: "About ±35 kPa (5 psi); further off is recorded as a departure." },
    { key: "filtrationMinutes", label: "Filtration time", unit: "min", group: G, source: "standard", note: "ASTM D5891: the filtrate collected over 30 minutes." },
  ],
  defaults: { minSpecimens: 1, reportingUnit: "mL", reportingDecimals: 1, expandedUncertainty: null, coverageFactor: 2, clayMassG: 22.5, waterVolumeMl: 350, pressureKPa: 690, pressureToleranceKPa: 35, filtrationMinutes: 30 },
  specimens: { source: "common practice", note: "One slurry per test is usual." },
  decimals: { source: "from memory", note: "The filtrate is read to 0.1 mL." },
});
