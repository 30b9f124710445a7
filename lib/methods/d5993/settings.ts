/** ASTM D5993 mass per unit area of the GCL and of its clay at 0 % moisture. */
import { indexMethodSettings, measured } from "../index-test/index-method-settings";

export const D5993_SETTINGS = indexMethodSettings({
  methodCode: "D5993",
  units: ["kg/m2", "g/m2"],
  specimens: { default: 3, source: "from memory", note: "Several specimens across the roll width; three is a common minimum." },
  decimals: { default: 2, source: "common practice", note: "Specifications state mass per area to 0.01 kg/m² (3.66 kg/m²)." },
  own: {
    minSpecimenAreaCm2: { default: 100, schema: measured("the smallest specimen area", { positive: true, max: 100000 }), label: "Specimen area, at least", unit: "cm²", source: "from memory", note: "About 100 cm² (a 100 mm square); a smaller specimen is refused." },
  },
});
