/** ASTM D6768 tensile strength of a GCL: 100 mm strips pulled to failure. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

export const D6768_SETTINGS = indexMethodSettings({
  methodCode: "D6768",
  units: ["kN/m", "N/m"],
  specimens: { default: 5, source: "from memory", note: "Commonly five strips per direction." },
  decimals: { default: 1, source: "common practice", note: "Specifications state tensile strength to 0.1 kN/m." },
  own: {
    stripWidthMm: { default: 100, schema: measured("the strip width", { positive: true, max: 1000 }), label: "Strip width", unit: "mm", source: "standard", note: "ASTM D6768: 100 mm wide strips." },
  },
});
