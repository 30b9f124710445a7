/** ASTM D5890 swell index: 2 g of clay, a 100 mL cylinder, read after at least 16 h. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

const G = "The method";
export const D5890_SETTINGS = indexMethodSettings({
  methodCode: "D5890",
  units: ["mL/2 g"],
  ownShape: {
    nominalClayMassG: measured("the clay mass", { positive: true, max: 100 }),
    clayMassToleranceG: measured("the tolerance on the clay mass", { min: 0, max: 10 }),
    minHydrationHours: measured("the shortest hydration time", { min: 0, max: 1000 }),
    cylinderCapacityMl: measured("the cylinder's capacity", { positive: true, max: 10000 }),
  },
  ownFields: [
    { key: "nominalClayMassG", label: "Clay mass added", unit: "g", group: G, source: "standard", note: "ASTM D5890: 2 g of dried, ground bentonite." },
    { key: "clayMassToleranceG", label: "Tolerance on the clay mass", unit: "± g", group: G, source: "from memory", note: "About ±0.01 g; a mass further off is recorded as a departure." },
    { key: "minHydrationHours", label: "Hydration before the reading, at least", unit: "h", group: G, source: "standard", note: "ASTM D5890: the volume is read after at least 16 hours." },
    { key: "cylinderCapacityMl", label: "Graduated cylinder's capacity", unit: "mL", group: G, source: "standard", note: "ASTM D5890: a 100 mL graduated cylinder; a reading above it is refused." },
  ],
  defaults: { minSpecimens: 1, reportingUnit: "mL/2 g", reportingDecimals: 1, expandedUncertainty: null, coverageFactor: 2, nominalClayMassG: 2, clayMassToleranceG: 0.01, minHydrationHours: 16, cylinderCapacityMl: 100 },
  specimens: { source: "common practice", note: "One cylinder per test is usual." },
  decimals: { source: "from memory", note: "The cylinder is read to 0.5 mL; one decimal keeps the half." },
});
