/** ASTM D6496 peel strength of a needle-punched GCL: 100 mm specimens, the geotextiles peeled apart. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

const G = "The method";
export const D6496_SETTINGS = indexMethodSettings({
  methodCode: "D6496",
  units: ["N/m", "kN/m"],
  ownShape: {
    specimenWidthMm: measured("the specimen width", { positive: true, max: 1000 }),
  },
  ownFields: [
    { key: "specimenWidthMm", label: "Specimen width", unit: "mm", group: G, source: "standard", note: "ASTM D6496: 100 mm wide specimens." },
  ],
  defaults: { minSpecimens: 5, reportingUnit: "N/m", reportingDecimals: 0, expandedUncertainty: null, coverageFactor: 2, specimenWidthMm: 100 },
  specimens: { source: "from memory", note: "Commonly five specimens." },
  decimals: { source: "common practice", note: "Specifications state peel strength in whole N/m (360 N/m)." },
});
