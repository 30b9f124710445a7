/** ASTM D6768 tensile strength of a GCL: 100 mm strips pulled to failure. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

const G = "The method";
export const D6768_SETTINGS = indexMethodSettings({
  methodCode: "D6768",
  units: ["kN/m", "N/m"],
  ownShape: {
    stripWidthMm: measured("the strip width", { positive: true, max: 1000 }),
  },
  ownFields: [
    { key: "stripWidthMm", label: "Strip width", unit: "mm", group: G, source: "standard", note: "ASTM D6768: 100 mm wide strips." },
  ],
  defaults: { minSpecimens: 5, reportingUnit: "kN/m", reportingDecimals: 1, expandedUncertainty: null, coverageFactor: 2, stripWidthMm: 100 },
  specimens: { source: "from memory", note: "Commonly five strips per direction." },
  decimals: { source: "common practice", note: "Specifications state tensile strength to 0.1 kN/m." },
});
