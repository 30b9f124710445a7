/** Moisture content of the clay by oven drying, in the manner of ASTM D2216. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

export const D2216_SETTINGS = indexMethodSettings({
  methodCode: "D2216",
  units: ["%"],
  specimens: { default: 1, source: "common practice", note: "One specimen per test." },
  decimals: { default: 1, source: "from memory", note: "ASTM D2216 reports to 1 % or 0.1 % depending on the specimen's mass." },
  own: {
    ovenTemperatureC: { default: 110, schema: measured("the oven temperature", { min: 20, max: 300 }), label: "Oven temperature", unit: "°C", source: "standard", note: "ASTM D2216: 110 ± 5 °C." },
    minDryingHours: { default: 16, schema: measured("the shortest drying time", { min: 0, max: 1000 }), label: "Drying time, at least", unit: "h", source: "from memory", note: "To constant mass; overnight (about 16 h) is usual." },
  },
});
