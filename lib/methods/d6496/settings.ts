/** ASTM D6496 peel strength of a needle-punched GCL: 100 mm specimens, the geotextiles peeled apart. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

export const D6496_SETTINGS = indexMethodSettings({
  methodCode: "D6496",
  units: ["N/m", "kN/m"],
  specimens: { default: 5, source: "from memory", note: "Commonly five specimens." },
  decimals: { default: 0, source: "common practice", note: "Specifications state peel strength in whole N/m (360 N/m)." },
  own: {
    specimenWidthMm: { default: 100, schema: measured("the specimen width", { positive: true, max: 1000 }), label: "Specimen width", unit: "mm", source: "standard", note: "ASTM D6496: 100 mm wide specimens." },
  },
});
