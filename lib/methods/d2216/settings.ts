/** Moisture content of the clay by oven drying, in the manner of ASTM D2216. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

const G = "The method";
export const D2216_SETTINGS = indexMethodSettings({
  methodCode: "D2216",
  units: ["%"],
  ownShape: {
    ovenTemperatureC: measured("the oven temperature", { min: 20, max: 300 }),
    minDryingHours: measured("the shortest drying time", { min: 0, max: 1000 }),
  },
  ownFields: [
    { key: "ovenTemperatureC", label: "Oven temperature", unit: "°C", group: G, source: "standard", note: "ASTM D2216: 110 ± 5 °C." },
    { key: "minDryingHours", label: "Drying time, at least", unit: "h", group: G, source: "from memory", note: "To constant mass; overnight (about 16 h) is usual." },
  ],
  defaults: { minSpecimens: 1, reportingUnit: "%", reportingDecimals: 1, expandedUncertainty: null, coverageFactor: 2, ovenTemperatureC: 110, minDryingHours: 16 },
  specimens: { source: "common practice", note: "One specimen per test." },
  decimals: { source: "from memory", note: "ASTM D2216 reports to 1 % or 0.1 % depending on the specimen's mass." },
});
