/** ASTM D5891 fluid loss: 22.5 g in 350 mL, filter press at about 690 kPa for 30 min. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

export const D5891_SETTINGS = indexMethodSettings({
  methodCode: "D5891",
  units: ["mL"],
  specimens: { default: 1, source: "common practice", note: "One slurry per test is usual." },
  decimals: { default: 1, source: "from memory", note: "The filtrate is read to 0.1 mL." },
  own: {
    clayMassG: { default: 22.5, schema: measured("the clay mass of the slurry", { positive: true, max: 1000 }), label: "Clay in the slurry", unit: "g", source: "standard", note: "ASTM D5891: 22.5 g of bentonite (a slurry of about 6 % solids)." },
    waterVolumeMl: { default: 350, schema: measured("the water volume of the slurry", { positive: true, max: 10000 }), label: "Water in the slurry", unit: "mL", source: "standard", note: "ASTM D5891: 350 mL of reagent water." },
    pressureKPa: { default: 690, schema: measured("the filter-press pressure", { positive: true, max: 5000 }), label: "Filter-press pressure", unit: "kPa", source: "standard", note: "ASTM D5891: about 690 kPa (100 psi)." },
    pressureToleranceKPa: { default: 35, schema: measured("the tolerance on the pressure", { min: 0, max: 1000 }), label: "Tolerance on the pressure", unit: "± kPa", source: "from memory", note: "About ±35 kPa (5 psi); further off is recorded as a departure." },
    filtrationMinutes: { default: 30, schema: measured("the filtration time", { positive: true, max: 600 }), label: "Filtration time", unit: "min", source: "standard", note: "ASTM D5891: the filtrate collected over 30 minutes." },
  },
});
