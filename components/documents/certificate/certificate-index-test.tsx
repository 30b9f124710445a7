import { isoDateTime, valueWithUnit, withoutCoverageFactor } from "@/lib/certificates/certificate-wording";
import type { CertificateIndexTest } from "@/lib/certificates/certificate-snapshot";
import { Decision, Uncertainties } from "./certificate-test";
import { CertificateVerdict, limitLabel } from "./certificate-verdict";
import { Deviations, MethodEdition, TestHead } from "./certificate-test-frame";

/**
 * One index test (swell index, fluid loss, mass per unit area, moisture, tensile, peel): method and edition,
 * what was tested, the specimens and instruments, the results with uncertainty (or why none), the limits and
 * the E29 decisions. Kept on one page.
 */
export function CertificateIndexTestSection({ test, number, count, zone = "UTC" }: { test: CertificateIndexTest; number: number; count: number; zone?: string }) {
  const declared = test.results.filter((r) => r.uncertaintyDisplay && r.coverage);
  return (
    <section className="cert-test doc-keep" data-testid="certificate-index-test">
      <TestHead number={number} count={count} methodCode={test.method.code}>
        roll <span className="mono">{test.rollLabNumber}</span>{test.couponLabNumber ? <> · coupon <span className="mono">{test.couponLabNumber}</span></> : null}
      </TestHead>
      <div className="cert-two">
        <div>
          <MethodEdition method={test.method} testId="certificate-index-method-edition" />
          <dl className="cert-conditions">
            <dt>Specimens</dt><dd data-testid="certificate-index-specimens">{test.specimenValues.length ? `${test.specimenValues.length}: ${test.specimenValues.join("; ")}` : "not recorded"}</dd>
            {test.conditions?.length ? <><dt>Conditions</dt><dd data-testid="certificate-index-conditions">{test.conditions.join(" ")}</dd></> : null}
            <dt>Instruments</dt><dd>{test.instruments.length ? test.instruments.join("; ") : "not recorded"}</dd>
          </dl>
        </div>
        <div>
          <h3 style={{ marginTop: 0 }}>Test record</h3>
          <dl className="cert-conditions">
            <dt>Tested</dt><dd className="nowrap">{isoDateTime(test.testedAt, zone)}</dd>
            <dt>Performed by</dt><dd>{test.performedBy}</dd>
            <dt>Approved by</dt><dd>{test.approvedBy}</dd>
            <dt>Approved</dt><dd className="nowrap">{isoDateTime(test.approvedAt, zone)}</dd>
          </dl>
        </div>
      </div>
      <table style={{ marginTop: "6pt" }}>
        <thead>
          <tr><th>Property</th><th className="num">Result</th><th className="num">Specimens</th><th className="nowrap">Std. deviation</th><th className="nowrap">U (k = 2, ≈95 %)</th><th className="nowrap">Limit</th><th>Verdict</th></tr>
        </thead>
        <tbody>
          {test.results.map((r, i) => (
            <tr key={i}>
              <td>{r.label}</td>
              <td className="num">{valueWithUnit(r.display, r.unit)}</td>
              <td className="num">{r.specimenCount ?? "—"}</td>
              <td className="nowrap">{r.standardDeviationDisplay ?? "—"}</td>
              <td className="nowrap">{r.uncertaintyDisplay ? withoutCoverageFactor(r.uncertaintyDisplay) : "not stated"}</td>
              <td className="nowrap">{r.conformance ? limitLabel(r.conformance) : "—"}</td>
              <td><CertificateVerdict conformance={r.conformance} /></td>
            </tr>
          ))}
        </tbody>
      </table>
      {declared.length ? <p className="doc-small" style={{ margin: "4pt 0 0" }}>{declared.map((r) => `Uncertainty of ${r.label.toLowerCase()}: expanded, ${r.coverage}, as the lab declares it for the method.`).join(" ")}</p> : null}
      <Uncertainties results={test.results} />
      {test.results.map((r, i) => <Decision key={i} result={r} />)}
      <Deviations items={test.departures} />
    </section>
  );
}
