import { describe, expect, it } from "vitest";
import { decisionRuleText } from "@/lib/certificates/decision-rule";
import { revisionChanges } from "@/lib/certificates/revision-changes";
import { makeCertificateSnapshot } from "../../support/make-certificate-snapshot";

describe("what a revision changes", () => {
  const before = makeCertificateSnapshot({ tests: 2, complete: true });

  it("says nothing changed when the content is the same", () => {
    expect(revisionChanges(before, makeCertificateSnapshot({ tests: 2, complete: true }))).toEqual([]);
  });

  it("names a changed remark, a result left out, a new specification and other units", () => {
    const after = { ...before, remarks: "Cut with a 100 mm die.", specification: { name: "Cell 4 specification", revision: "Rev. D" }, unitSystem: "CENTIMETRE" as const, tests: before.tests.slice(0, 1) };
    expect(revisionChanges(before, after)).toEqual([
      "Removed: hydraulic conductivity at 20 °C of T26-00092 (specimen S26-00312).",
      "Specification: now Cell 4 specification, Rev. D (was MWA cell 4 GCL specification (GRI-GCL3 limits), Rev. B, 2026-05).",
      'Remarks changed; they now read: "Cut with a 100 mm die."',
      "Results now printed in centimetre units (cm/s).",
    ]);
  });

  it("names a restated value", () => {
    const after = structuredClone(before);
    after.tests[0]!.results[0]!.display = "2.5 × 10⁻⁹ m³/m²/s";
    expect(revisionChanges(before, after)).toEqual(["Restated: index flux of T26-00091 (specimen S26-00311), now 2.5 × 10⁻⁹ m³/m²/s (was 2.4 × 10⁻⁹ m³/m²/s)."]);
  });

  it("names index-test results added, left out and restated", () => {
    const withIndex = makeCertificateSnapshot({ tests: 2, complete: true, indexTests: true });
    const after = structuredClone(withIndex);
    after.indexTests = after.indexTests!.slice(0, 1);
    after.indexTests[0]!.results[0]!.display = "9.1 kN/m";
    expect(revisionChanges(withIndex, after)).toEqual([
      "Removed: bentonite swell index of roll R26-00412 (ASTM D5890).",
      "Restated: tensile strength of roll R26-00412 (ASTM D6768), now 9.1 kN/m (was 9.0 kN/m).",
    ]);
    expect(revisionChanges(before, withIndex)).toEqual(["Added: tensile strength of roll R26-00412 (ASTM D6768).", "Added: bentonite swell index of roll R26-00412 (ASTM D5890)."]);
  });
});

describe("the decision rule in words", () => {
  it("states each limit's ASTM E29 method and that the uncertainty does not enter the decision", () => {
    const text = decisionRuleText([{ label: "Index flux", method: "ROUNDING" }, { label: "Hydraulic conductivity at 20 °C", method: "ABSOLUTE" }])!;
    expect(text).toContain("Index flux: ASTM E29 rounding method");
    expect(text).toContain("Hydraulic conductivity at 20 °C: ASTM E29 absolute method");
    expect(text).toContain("is not taken into account in the decision");
    expect(decisionRuleText([])).toBeNull();
  });
});
