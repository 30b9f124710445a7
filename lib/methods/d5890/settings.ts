/** ASTM D5890 swell index: 2 g of clay, a 100 mL cylinder, read after at least 16 h. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

export const D5890_SETTINGS = indexMethodSettings({
  methodCode: "D5890",
  units: ["mL/2 g"],
  specimens: { default: 1, source: "common practice", note: "One cylinder per test is usual." },
  decimals: { default: 1, source: "from memory", note: "The cylinder is read to 0.5 mL; one decimal keeps the half." },
  own: {
    nominalClayMassG: { default: 2, schema: measured("the clay mass", { positive: true, max: 100 }), label: "Clay mass added", unit: "g", source: "standard", note: "ASTM D5890: 2 g of dried, ground bentonite." },
    clayMassToleranceG: { default: 0.01, schema: measured("the tolerance on the clay mass", { min: 0, max: 10 }), label: "Tolerance on the clay mass", unit: "± g", source: "from memory", note: "About ±0.01 g; a mass further off is recorded as a departure." },
    minHydrationHours: { default: 16, schema: measured("the shortest hydration time", { min: 0, max: 1000 }), label: "Hydration before the reading, at least", unit: "h", source: "standard", note: "ASTM D5890: the volume is read after at least 16 hours." },
    cylinderCapacityMl: { default: 100, schema: measured("the cylinder's capacity", { positive: true, max: 10000 }), label: "Graduated cylinder's capacity", unit: "mL", source: "standard", note: "ASTM D5890: a 100 mL graduated cylinder; a reading above it is refused." },
  },
});
