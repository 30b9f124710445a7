import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CertificateDocument } from "@/components/documents/certificate-document";
import type { CertificateSnapshot } from "@/lib/certificates/certificate-snapshot";
import { makeCertificateSnapshot } from "../../support/make-certificate-snapshot";

// The items of a test report in ISO/IEC 17025:2017 7.8.2.1 and 7.8.3.1 (and 7.8.8 for amendments), as
// listed in the project's domain notes (paraphrased there, not quoted), each with the snapshot field that
// satisfies it and what the rendered certificate must show. Items that do not apply to this lab's work are
// listed at the end with the reason.
const QR = '<svg viewBox="0 0 29 29"></svg>';
const render = (s: CertificateSnapshot) => renderToStaticMarkup(createElement(CertificateDocument, { snapshot: s, qrSvg: QR }));
const words = (html: string) => html.replace(/<style[\s\S]*?<\/style>/g, "").replace(/<[^>]+>/g, " ").replace(/&amp;/g, "&").replace(/&#x27;/g, "'").replace(/&quot;/g, '"').replace(/\s+/g, " ");
const section = (html: string, testId: string) => {
  const start = html.indexOf(`data-testid="${testId}"`);
  expect(start, `the certificate has no ${testId}`).toBeGreaterThan(-1);
  return words(html.slice(start, start + 6000));
};

type Item = { clause: string; item: string; field: string; check: (html: string, s: CertificateSnapshot) => void };

const CHECKLIST: Item[] = [
  { clause: "7.8.2.1 a", item: "a title", field: "document heading (fixed text)", check: (h) => expect(words(h)).toContain("Test certificate") },
  { clause: "7.8.2.1 b", item: "the laboratory's name and address", field: "lab.name, lab.address", check: (h, s) => { expect(words(h)).toContain(s.lab.name); expect(words(h)).toContain("Quarry Lane"); } },
  { clause: "7.8.2.1 c", item: "a unique identification on every page and a clear end", field: "number, revision (page footer: certificateTitle); closing section", check: (h, s) => { expect(words(h)).toContain(`Certificate ${s.number} · revision ${s.revision}`); expect(h).toContain('data-testid="certificate-close"'); } },
  { clause: "7.8.2.1 d", item: "the client's name and contact information", field: "client.name, client.address, client.contact", check: (h, s) => { const t = section(h, "certificate-client"); expect(t).toContain(s.client.name); expect(t).toContain(s.client.address!); expect(t).toContain(s.client.contact!); } },
  { clause: "7.8.2.1 e", item: "the method used, with its edition", field: "tests[].method.code, tests[].method.edition", check: (h, s) => expect(section(h, "certificate-method-edition")).toContain(s.tests[0]!.method.edition!) },
  { clause: "7.8.2.1 f", item: "a description, identification and condition of each item", field: "samples[] (roll, lot, product, manufacturer, condition), tests[].specimen", check: (h, s) => { const t = section(h, "certificate-samples"); expect(t).toContain(s.samples[0]!.rollNumber); expect(t).toContain("Outer wrapping torn"); } },
  { clause: "7.8.2.1 g", item: "the date of receipt", field: "samples[].receivedAt", check: (h) => expect(section(h, "certificate-samples")).toContain("2026-11-14") },
  { clause: "7.8.2.1 h", item: "the date(s) of testing: start and end of permeation", field: "tests[].dates", check: (h) => { const t = section(h, "certificate-specimen"); expect(t).toMatch(/Permeation started \d{4}-\d\d-\d\d/); expect(t).toMatch(/Permeation ended \d{4}-\d\d-\d\d/); } },
  { clause: "7.8.2.1 i", item: "the date of issue", field: "issuedAt", check: (h) => expect(words(h)).toMatch(/Issued 2026-12-14/) },
  { clause: "7.8.2.1 k", item: "a statement that results relate only to the items tested", field: "CERTIFICATE_CAUTIONS", check: (h) => expect(words(h)).toContain("relate only to the specimens tested") },
  { clause: "7.8.2.1 l", item: "results with units", field: "tests[].results[].display", check: (h) => expect(section(h, "certificate-summary")).toContain("2.4 × 10⁻⁹ m³/m²/s") },
  { clause: "7.8.2.1 m", item: "any addition to, deviation from or exclusion from the method", field: "tests[].deviations", check: (h) => expect(words(h)).toContain("Permeation paused for 3 h") },
  { clause: "7.8.2.1 n", item: "who authorised the report: name, function, signature or equivalent", field: "signatory", check: (h, s) => { const t = section(h, "certificate-signatory"); expect(t).toContain(s.signatory.name); expect(t).toContain("QA manager"); expect(t).toContain("Signed electronically"); } },
  { clause: "7.8.3.1 a", item: "test conditions: temperature at which flux was measured", field: "tests[].conditions.meanTemperatureC", check: (h) => expect(section(h, "certificate-temperature")).toMatch(/20\.6 °C \(mean while the reported flux was measured/) },
  { clause: "7.8.3.1 a", item: "test conditions: specimen data (die diameter and area, thickness and mass before and after, moisture, hydration, equilibration, effective stress, gradient, permeant)", field: "tests[].specimen", check: (h) => {
    const t = section(h, "certificate-specimen");
    // Area of a 100 mm die: pi x 100^2 / 4 = 7853.98 mm^2 = 78.54 cm^2 (A = pi d^2 / 4, DOMAIN.md).
    for (const expected of ["Die diameter 100 mm", "Area 78.54 cm²", "Thickness, initial 7.1 mm", "Thickness after test 5.92 mm", "Mass, initial 60.52 g", "Mass after test 118.4 g", "Moisture content 11.2 %", "Hydration before permeation 48 h", "Equilibration hold 24 h", "Effective stress 34.5 kPa", "Hydraulic gradient 240", "Permeant de-aired water"]) expect(t).toContain(expected);
  } },
  { clause: "7.8.3.1 b", item: "a statement of conformity with the decision rule used, and whether uncertainty is taken into account", field: "specification (name, revision), decisionRule, tests[].results[].conformance", check: (h, s) => {
    expect(section(h, "certificate-specification")).toContain(s.specification!.revision!);
    const rule = section(h, "certificate-decision-rule");
    expect(rule).toContain("ASTM E29 rounding method");
    expect(rule).toContain("not taken into account");
    expect(section(h, "certificate-decision")).toMatch(/conforms/);
  } },
  { clause: "7.8.3.1 c", item: "the measurement uncertainty in the same unit as the result, with its coverage probability", field: "tests[].results[].uncertaintyDisplay, coverage", check: (h) => {
    expect(section(h, "certificate-summary")).toContain("± 0.21 × 10⁻⁹ m³/m²/s");
    expect(section(h, "certificate-uncertainty")).toContain("coverage probability of about 95 %");
  } },
  { clause: "7.8.2.1 e, l; 7.8.3.1 b, c", item: "an index test: method with edition, item, specimens, result with standard deviation, uncertainty or why none, limit and E29 decision", field: "indexTests[] (method.edition, couponLabNumber, specimenValues, results[].standardDeviationDisplay, uncertaintyNote, conformance)", check: (h, s) => {
    const t = section(h, "certificate-index-test");
    expect(t).toContain(s.indexTests![0]!.method.edition!);
    expect(t).toContain("C26-00209");
    // ASTM D6768: five strips, mean 9.02 kN/m printed 9.0, standard deviation 0.30 kN/m (worked in make-certificate-snapshot).
    expect(t).toMatch(/Tensile strength 9\.0 kN\/m 5 0\.30 kN\/m not stated ≥ 4 kN\/m conforms/);
    expect(t).toContain("Specimens 5: 9.1 kN/m; 8.9 kN/m; 9.5 kN/m; 9.0 kN/m; 8.7 kN/m");
    expect(t).toContain("no expanded uncertainty for this method");
    expect(t).toContain("9.02 kN/m, rounded to 9 kN/m (ASTM E29, half to even), is not below the minimum of 4 kN/m: conforms.");
    expect(section(h, "certificate-summary")).toMatch(/4 · D6768 C26-00209 Tensile strength 9\.0 kN\/m/);
  } },
  { clause: "7.8.3.1 b", item: "conformity with the whole specification: every property listed, those not reported named with the reason", field: "propertyCoverage (rows, notTested, otherRolls)", check: (h) => {
    const t = section(h, "certificate-coverage");
    expect(t).toContain("Bentonite fluid loss of R26-00412: pending: Fluid loss (ASTM D5891) awaits the QA manager's review.");
    expect(t).toContain("Bentonite swell index of R26-00413: not required for this roll by the specification's sampling frequency (1 per lot)");
    expect(t).toContain("Tensile strength of R26-00413: not required for this roll by the specification's sampling frequency (1 per 20,000 m² delivered)");
    expect(t).toContain("The project's other rolls (R26-00414) have no result on this certificate");
  } },
  { clause: "7.8.8", item: "an amended report identified as such, with the reason and what changed", field: "supersedes, reason, changes", check: () => {
    const amended = render(makeCertificateSnapshot({ tests: 1, complete: true, supersedes: true, conditions: true }));
    const t = section(amended, "certificate-amendment");
    expect(t).toContain("Amended certificate");
    expect(t).toContain("Client address corrected");
    expect(t).toContain("Remarks changed");
  } },
];

describe("ISO/IEC 17025:2017 7.8.2.1 and 7.8.3.1 checklist on a rendered certificate", () => {
  const snapshot = makeCertificateSnapshot({ tests: 3, complete: true, conditions: true, deviations: true, indexTests: true });
  const html = render(snapshot);
  for (const item of CHECKLIST) it(`${item.clause}: ${item.item} (${item.field})`, () => item.check(html, snapshot));

  it("a preview (with the draft mark) says it is not signed", () => {
    const markup = renderToStaticMarkup(createElement(CertificateDocument, { snapshot, qrSvg: QR, watermark: "DRAFT · NOT ISSUED" }));
    const preview = words(markup);
    // The mark is drawn from the attribute (CSS generated content, decoration for assistive technology).
    expect(markup).toContain('data-watermark="DRAFT · NOT ISSUED"');
    expect(preview).toContain("Not signed: a preview of the draft.");
    expect(preview).not.toContain("Signed electronically");
  });

  it("writes no raw floating-point numbers and no bare compared value of 0", () => {
    const t = words(html);
    expect(t).not.toMatch(/\d\.\d{6,}e-\d/);
    expect(t).not.toMatch(/\d+(\.\d+)?e-\d+/);
    expect(t).not.toMatch(/compared value 0/i);
  });
});

/**
 * Not applicable to this lab's reports, and why:
 * - 7.8.2.1 j, a reference to the sampling plan and method: the lab does not sample; clients send rolls cut
 *   on site, so the report identifies the items as received (7.8.2.1 f and g) instead.
 * - 7.8.2.1 o, results from external providers: every test is performed in the lab; nothing is
 *   subcontracted, so there is nothing to mark.
 * - 7.8.3.1 d, opinions and interpretations: none are given; the cautions say design decisions rest with
 *   the responsible engineer.
 * - 7.8.3.1 e, additional information required by specific methods or clients: covered per method by the
 *   calculation, criteria, leakage check and chart sections; nothing else is asked for.
 */
