import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CertificateDocument } from "@/components/documents/certificate-document";
import { CERTIFICATE_CAUTIONS } from "@/lib/certificates/certificate-wording";
import type { CertificateSnapshot } from "@/lib/certificates/certificate-snapshot";
import { makeCertificateSnapshot } from "../../support/make-certificate-snapshot";

// The document as static HTML (no browser): what it says, from the snapshot alone. The PDF itself is
// checked in tests/integration/certificate-document.test.ts.
const QR = '<svg viewBox="0 0 29 29" data-qr="1"></svg>';
const html = (snapshot: CertificateSnapshot) => renderToStaticMarkup(createElement(CertificateDocument, { snapshot, qrSvg: QR }));
const text = (snapshot: CertificateSnapshot) => html(snapshot).replace(/<style[\s\S]*?<\/style>/g, "").replace(/<[^>]+>/g, " ").replace(/&amp;/g, "&").replace(/&#x27;/g, "'").replace(/\s+/g, " ");

describe("certificate document", () => {
  it("carries the number, revision, issue date, both cautions and the verification code with its 2D code", () => {
    const s = makeCertificateSnapshot({ tests: 1 });
    const t = text(s);
    expect(t).toContain("C26-00017");
    expect(t).toMatch(/Revision 1 Issued 2026-12-14/);
    for (const caution of CERTIFICATE_CAUTIONS) expect(t).toContain(caution);
    expect(t).toContain("7Q4K-2M9X-HT3B");
    expect(html(s)).toContain('data-qr="1"');
    expect(t).not.toContain("supersedes");
  });

  it("writes its times in the lab's time zone, says which, and carries each roll's condition on arrival", () => {
    const s = makeCertificateSnapshot({ tests: 2, timeZone: "Europe/Berlin", conditions: true });
    const t = text(s);
    // Issued 2026-12-14 09:30 UTC, which is 10:30 in Berlin (UTC+1 in winter; IANA tz database).
    expect(t).toContain("Times are given in the laboratory's time zone, Europe/Berlin (UTC+01:00 on the date of this document).");
    expect(t).toMatch(/Signed electronically 2026-12-14 10:30 CET/);
    expect(t).toContain("Condition on arrival");
    expect(t).toContain("Outer wrapping torn at one end; liner dry.");
    expect(t).toContain("No remarks recorded");
    // A snapshot from before either existed prints as it did: UTC, and no condition column.
    const older = text(makeCertificateSnapshot({ tests: 1 }));
    expect(older).toContain("reproduced only in full. Times are given in UTC.");
    expect(older).not.toContain("Condition on arrival");
  });

  it("shows each test's conditions, results with uncertainty, verdicts with their numbers, and a chart", () => {
    const s = makeCertificateSnapshot({ tests: 3, chartPoints: 12 });
    const t = text(s);
    expect(t).toContain("34.5 kPa");
    expect(t).toContain("calcium chloride solution, CaCl2, 0.1 mol/L");
    expect(t).toContain("8.7 × 10⁻¹¹ m/s ± 0.92 × 10⁻¹¹ m/s"); // the unit is not printed twice, nor "(k = 2)" under a heading saying it
    expect(t).not.toMatch(/m\/s m\/s/);
    expect(t).toContain("8.70 × 10⁻¹¹ m/s, rounded to 9 × 10⁻¹¹ m/s (ASTM E29, half to even), exceeds the maximum of 5 × 10⁻¹¹ m/s: does not conform.");
    // Limits, rounded values and results in one notation; a rounding to 0 is said in words, never "compared value 0".
    expect(t).toContain("Measured value 8.70 × 10⁻¹¹ m/s Rounded to the limit's last place 9 × 10⁻¹¹ m/s Limit maximum 5 × 10⁻¹¹ m/s");
    expect(t).toContain("≤ 1 × 10⁻⁸ m³/m²/s");
    expect(t).not.toMatch(/\de-\d/);
    // ASTM E29 in words: where rounding to the limit's place gives 0, the certificate says what that 0 means.
    expect(t).toContain("Measured 2.43 × 10⁻⁹ m³/m²/s; rounded to the nearest 1 × 10⁻⁸ m³/m²/s it reads 0. That 0 is not a measured zero: the result is smaller than half of 1 × 10⁻⁸ m³/m²/s, so it does not exceed the maximum.");
    expect(t).toContain("Measured 8.70 × 10⁻¹¹ m/s; rounded 9 × 10⁻¹¹ m/s.");
    expect(t).toContain("4 results were compared with the specification: 3 conform, 1 does not.");
    // How the first test's result was obtained: calculation, refills, criteria with their settings version, leakage, contributors.
    expect(t).toContain("Calculation. Falling head with rising tail (ASTM D5084 method C)");
    expect(t).toContain("The burettes were refilled or drained 1 time; no interval spans a refill.");
    expect(t).toContain("Termination criteria of ASTM D5887 settings, version 2: Outflow/inflow ratio: 0.75 ≤ outflow/inflow ≤ 1.25 for each of the last 4 intervals");
    expect(t).toContain("Apparatus leakage. Apparatus leakage of cell CELL-01");
    expect(t).toContain("Uncertainty of index flux: expanded, coverage factor k = 2 (about 95 %); largest contributors (relative standard uncertainty): burette readings 1.8 % (BP-01 calibration CAL-BP-01-2026); die diameter");
    expect(html(s).match(/data-refill=""/g)).toHaveLength(2);
    const markup = html(s);
    expect(markup.match(/data-testid="chart-flux"/g)).toHaveLength(3);
    expect(markup.match(/<polyline /g)).toHaveLength(6);
    expect(t).toContain("Flux (×10⁻⁹ m³/m²/s)");
  });

  it("says a revision supersedes the one before, with the reason, and lists deviations or says none", () => {
    const t = text(makeCertificateSnapshot({ tests: 2, supersedes: true, deviations: true }));
    expect(t).toContain("Amended certificate. Revision 2 supersedes revision 1, which is no longer valid. Reason: Client address corrected; the results are unchanged.");
    expect(t).toContain("Permeation paused for 3 h");
    expect(t).toContain("None.");
  });

  it("escapes what people typed and copes with no specification, no results and no chart data", () => {
    const base = makeCertificateSnapshot({ tests: 1 });
    const s: CertificateSnapshot = {
      ...base,
      client: { name: "<script>alert(1)</script> & Co", address: null },
      specification: null,
      tests: [{ ...base.tests[0]!, results: [], chart: [] }],
    };
    const markup = html(s);
    expect(markup).not.toContain("<script>alert");
    expect(markup).toContain("&lt;script&gt;alert(1)&lt;/script&gt; &amp; Co");
    const t = text(s);
    expect(t).toContain("None given");
    expect(t).toContain("No results are reported for this test.");
    expect(t).toContain("no intervals recorded");
  });
});
