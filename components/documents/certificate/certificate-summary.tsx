import { valueWithUnit, withoutCoverageFactor } from "@/lib/certificates/certificate-wording";
import type { CertificateSnapshot } from "@/lib/certificates/certificate-snapshot";
import { CertificateVerdict, limitLabel } from "./certificate-verdict";

/** Who the work was for, and every reported result with its verdict on one table. */
export function CertificateSummary({ snapshot }: { snapshot: CertificateSnapshot }) {
  const { client, project, specification } = snapshot;
  const lines = [
    ...snapshot.tests.flatMap((test, t) => test.results.map((result) => ({ number: t + 1, code: test.method.code, item: test.specimenLabNumber, result }))),
    ...(snapshot.indexTests ?? []).flatMap((test, t) => test.results.map((result) => ({ number: snapshot.tests.length + t + 1, code: test.method.code, item: test.couponLabNumber ?? test.rollLabNumber, result }))),
  ];
  const assessed = lines.filter((l) => l.result.conformance);
  const failing = assessed.filter((l) => !l.result.conformance!.conforms).length;
  return (
    <>
      <dl className="doc-facts">
        <div data-testid="certificate-client"><dt>Client</dt><dd>{client.name}{client.address ? <div className="doc-lab-address">{client.address}</div> : null}{client.contact ? <div className="doc-small">Contact: {client.contact}</div> : null}</dd></div>
        <div><dt>Project</dt><dd>{project.name} <span className="doc-muted">({project.code})</span></dd></div>
        <div><dt>Site</dt><dd>{project.siteName}{project.siteLocation ? `, ${project.siteLocation}` : ""}</dd></div>
        <div data-testid="certificate-specification"><dt>Specification</dt><dd>{specification ? <>{specification.name}{specification.revision ? <>, {specification.revision}</> : specification.revision === "" ? <span className="doc-muted"> (no revision stated)</span> : null}</> : "None given: results are reported without a conformance statement."}</dd></div>
      </dl>
      {snapshot.decisionRule ? <p className="doc-small" data-testid="certificate-decision-rule"><strong>Decision rule.</strong> {snapshot.decisionRule}</p> : null}
      {snapshot.remarks ? <div className="doc-box" data-testid="certificate-remarks"><strong>Remarks.</strong> {snapshot.remarks}</div> : null}

      <h2>Results at a glance</h2>
      <table data-testid="certificate-summary">
        <thead>
          <tr><th>Test</th><th className="nowrap">Item tested</th><th>Property</th><th className="num">Result</th><th className="nowrap">U (k = 2, ≈95 %)</th><th className="nowrap">Limit</th><th>Verdict</th></tr>
        </thead>
        <tbody>
          {lines.map(({ number, code, item, result }, i) => (
            <tr key={i}>
              <td className="nowrap">{number} · {code}</td>
              <td className="mono nowrap">{item}</td>
              <td>{result.label}</td>
              <td className="num">{valueWithUnit(result.display, result.unit)}</td>
              <td className="nowrap">{result.uncertaintyDisplay ? withoutCoverageFactor(result.uncertaintyDisplay) : "not stated"}</td>
              <td className="nowrap">{result.conformance ? limitLabel(result.conformance) : "—"}</td>
              <td><CertificateVerdict conformance={result.conformance} /></td>
            </tr>
          ))}
        </tbody>
      </table>
      {lines.length === 0 ? <p className="doc-muted" style={{ marginTop: "6pt" }}>No results are reported on this certificate.</p> : null}
      {assessed.length > 0 ? (
        <p className="doc-small" style={{ marginTop: "4pt" }}>
          {assessed.length === 1 ? "1 result was" : `${assessed.length} results were`} compared with the specification: {assessed.length - failing} {assessed.length - failing === 1 ? "conforms" : "conform"},{" "}
          {failing} {failing === 1 ? "does" : "do"} not. Each test below gives the numbers that decided its verdict.
        </p>
      ) : null}
    </>
  );
}
