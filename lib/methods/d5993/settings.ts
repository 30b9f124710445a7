/** ASTM D5993 mass per unit area of the GCL and of its clay at 0 % moisture. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

const G = "The method";
export const D5993_SETTINGS = indexMethodSettings({
  methodCode: "D5993",
  units: ["kg/m2", "g/m2"],
  ownShape: {
    minSpecimenAreaCm2: measured("the smallest specimen area", { positive: true, max: 100000 }),
  },
  ownFields: [
    { key: "minSpecimenAreaCm2", label: "Specimen area, at least", unit: "cm²", group: G, source: "from memory", note: "About 100 cm² (a 100 mm square); a smaller specimen is refused." },
  ],
  defaults: { minSpecimens: 3, reportingUnit: "kg/m2", reportingDecimals: 2, expandedUncertainty: null, coverageFactor: 2, minSpecimenAreaCm2: 100 },
  specimens: { source: "from memory", note: "Several specimens across the roll width; three is a common minimum." },
  decimals: { source: "common practice", note: "Specifications state mass per area to 0.01 kg/m² (3.66 kg/m²)." },
});
