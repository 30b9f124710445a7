import { describe, expect, it } from "vitest";
import { createProjectSpecificationSchema, setSpecificationLimitSchema, significantDigitsOf } from "../../../lib/validation/specifications";

const base = { specificationId: "spec-1", property: "HYDRAULIC_CONDUCTIVITY", limitText: "5e-11", unit: "m/s", direction: "MAXIMUM", conformanceMethod: "ROUNDING", testMethodCode: "D5084" };
const errorsOf = (input: unknown) => {
  const r = setSpecificationLimitSchema.safeParse(input);
  if (r.success) return {};
  // The first message per field, as parseOrThrow reports it.
  const errors: Record<string, string> = {};
  for (const issue of r.error.issues) errors[issue.path.join(".")] ??= issue.message;
  return errors;
};

describe("significantDigitsOf (the digits a limit is written to; ASTM E29 reads the last one)", () => {
  it.each([["1e-8", 1], ["5e-11", 1], ["24", 2], ["18", 2], ["3.66", 3], ["5.0e-11", 2], ["0.050", 2], ["100", 3], ["1e2", 1], [".5", 1]])("%s -> %i", (text, digits) => {
    expect(significantDigitsOf(text)).toBe(digits);
  });
});

describe("setSpecificationLimitSchema", () => {
  it("keeps the limit text as written and derives the significant digits from it", () => {
    const v = setSpecificationLimitSchema.parse({ ...base, limitText: " 5.0e-11 ", significantDigits: "" });
    expect(v).toMatchObject({ limitText: "5.0e-11", significantDigits: 2, testMethodCode: "D5084" });
  });

  it("accepts significant digits that agree with the text, refuses ones that do not", () => {
    expect(setSpecificationLimitSchema.parse({ ...base, significantDigits: "1" }).significantDigits).toBe(1);
    expect(errorsOf({ ...base, significantDigits: 2 }).significantDigits).toMatch(/5e-11 is written to 1 significant digit; write the limit/);
    expect(errorsOf({ ...base, significantDigits: 7 }).significantDigits).toBe("At most 6 significant digits.");
  });

  it("refuses limits that are not plain positive numbers", () => {
    for (const text of ["5 × 10^-11", "abc", "5e-11 m/s", "-24", "0", "0x10", "Infinity", ""]) expect(errorsOf({ ...base, limitText: text }).limitText).toBeDefined();
  });

  it("allows only the property's units", () => {
    expect(errorsOf({ ...base, unit: "cm/s", limitText: "5e-9" })).toEqual({});
    expect(errorsOf({ ...base, unit: "mL" }).unit).toBe("Hydraulic conductivity (20 °C) is stated in m/s or cm/s.");
    expect(errorsOf({ ...base, property: "SWELL_INDEX", limitText: "24", unit: "mL/2 g", direction: "MINIMUM" })).toEqual({});
  });

  it("defaults to the rounding method and takes a blank method code as none", () => {
    const v = setSpecificationLimitSchema.parse({ ...base, conformanceMethod: undefined, testMethodCode: "" });
    expect(v).toMatchObject({ conformanceMethod: "ROUNDING", testMethodCode: undefined });
  });
});

describe("createProjectSpecificationSchema", () => {
  it("needs a project and a name; the revision and the template are optional", () => {
    expect(createProjectSpecificationSchema.parse({ projectId: "p", name: " Cell 3 liner ", templateId: "" })).toEqual({ projectId: "p", name: "Cell 3 liner", revision: "", templateId: undefined });
    expect(createProjectSpecificationSchema.parse({ projectId: "p", name: "Cell 3 liner", revision: " Rev. B, 2026-05 " }).revision).toBe("Rev. B, 2026-05");
    expect(createProjectSpecificationSchema.safeParse({ projectId: "", name: "" }).success).toBe(false);
  });
});
