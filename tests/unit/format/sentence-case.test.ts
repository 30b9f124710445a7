import { describe, expect, it } from "vitest";
import { inSentence } from "@/lib/format/sentence-case";
import { TEST_PROPERTY_LABELS } from "@/lib/results/property-units";

describe("a label inside a sentence", () => {
  it("lower-cases the first letter of an ordinary label", () => {
    expect(inSentence(TEST_PROPERTY_LABELS.HYDRAULIC_CONDUCTIVITY)).toBe("hydraulic conductivity (20 °C)");
  });

  it("keeps an acronym that opens the label in capitals", () => {
    expect(inSentence(TEST_PROPERTY_LABELS.GCL_MASS_PER_AREA)).toBe("GCL mass per unit area");
  });
});
