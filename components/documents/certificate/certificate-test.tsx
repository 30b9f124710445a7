import { capitalise, conditionValue, isoDateTime, prettyUnit, valueWithUnit, withoutCoverageFactor } from "@/lib/certificates/certificate-wording";
import type { CertificateResultLine, CertificateTest } from "@/lib/certificates/certificate-snapshot";
import { CertificateChart } from "./certificate-chart";
import { CertificateVerdict, limitLabel } from "./certificate-verdict";

/** The numbers that decided a verdict: what was compared, by which ASTM E29 method, with which limit, and the statement. */
function Decision({ result }: { result: CertificateResultLine }) {
  const c = result.conformance;
  if (!c) return null;
  return (
    <div className="cert-decision" data-testid="certificate-decision">
      <div className="cert-decision-head"><strong>{result.label}</strong> <CertificateVerdict conformance={c} /></div>
      <dl className="cert-decision-numbers">
        {c.measuredValue ? <div><dt>Measured value</dt><dd className="mono">{c.measuredValue}</dd></div> : null}
        <div><dt>{c.method === "ROUNDING" ? "Rounded value compared" : "Compared value"}</dt><dd className="mono">{c.comparedValue} {prettyUnit(c.unit)}</dd></div>
        <div><dt>Limit</dt><dd>{c.direction === "MAXIMUM" ? "maximum" : "minimum"} <span className="mono">{c.limitText} {prettyUnit(c.unit)}</span></dd></div>
        <div><dt>ASTM E29 method</dt><dd>{c.method === "ROUNDING" ? "rounding (once, half to even, to the limit's last place)" : "absolute (any excursion fails)"}</dd></div>
      </dl>
      <p>{c.statement}</p>
      {c.plainRule ? <p className="doc-small" data-testid="certificate-e29-rule">{c.plainRule}</p> : null}
    </div>
  );
}

/** Under the results: the three largest contributors to each stated uncertainty, or why none is stated. */
function Uncertainties({ results }: { results: CertificateResultLine[] }) {
  const lines = results.filter((r) => r.uncertaintyContributors?.length || r.uncertaintyNote);
  if (lines.length === 0) return null;
  return (
    <div className="doc-small" data-testid="certificate-uncertainty" style={{ marginTop: "4pt" }}>
      {lines.map((r, i) => (
        <p key={i} style={{ margin: "2pt 0" }}>
          {r.uncertaintyContributors?.length
            ? <>Uncertainty of {r.label.toLowerCase()}: expanded, coverage factor k = 2 (about 95 %); largest contributors (relative standard uncertainty): {r.uncertaintyContributors.join("; ")}.</>
            : <>Uncertainty of {r.label.toLowerCase()} not stated: {r.uncertaintyNote}</>}
        </p>
      ))}
    </div>
  );
}

/** How the numbers were obtained: the calculation, the criteria and settings version, refills, the leakage check. */
function HowComputed({ test }: { test: CertificateTest }) {
  if (!test.calculation && !test.criteria && !test.leakage) return null;
  return (
    <div className="doc-keep" data-testid="certificate-method-detail">
      <h3>How the result was obtained</h3>
      {test.calculation ? <p style={{ margin: "2pt 0" }}><strong>Calculation.</strong> {test.calculation}{test.refills ? ` The burettes were refilled or drained ${test.refills} time${test.refills === 1 ? "" : "s"}; no interval spans a refill.` : ""}</p> : null}
      {test.criteria ? (
        <>
          <p style={{ margin: "2pt 0" }}><strong>Termination criteria</strong> of {test.criteria.settings}{test.criteria.chosen ? ` (${test.criteria.chosen})` : ""}:</p>
          <ul style={{ margin: 0, paddingLeft: "14pt" }}>{test.criteria.lines.map((l, i) => <li key={i}>{l.name}: {l.limit}{l.met ? "" : " (not met)"}</li>)}</ul>
        </>
      ) : null}
      {test.leakage ? <p style={{ margin: "2pt 0" }}><strong>Apparatus leakage.</strong> {test.leakage}</p> : null}
    </div>
  );
}

/** One test: method, conditions, results with uncertainty, the conformance decisions, chart and deviations. */
export function CertificateTestSection({ test, index, count }: { test: CertificateTest; index: number; count: number }) {
  const c = test.conditions;
  return (
    <section className="cert-test" data-testid="certificate-test">
      {/* The heading, conditions, results and verdicts of a test stay on one page; the chart may follow. */}
      <div className="doc-keep">
      <div className="cert-test-head">
        <h2>Test {index + 1} of {count} · {test.method.code}</h2>
        <div className="cert-test-ids">
          specimen <span className="mono">{test.specimenLabNumber}</span> · roll <span className="mono">{test.rollLabNumber}</span> · run <span className="mono">{test.runLabNumber}</span>
        </div>
      </div>
      <div className="cert-two">
        <div>
          <h3 style={{ marginTop: 0 }}>{test.method.title}</h3>
          <dl className="cert-conditions">
            <dt>Effective stress</dt><dd>{conditionValue(c.effectiveStressKPa, "kPa")}</dd>
            <dt>Head difference</dt><dd>{conditionValue(c.headKPa, "kPa")}</dd>
            <dt>Permeant</dt><dd>{c.permeant || "not recorded"}</dd>
            <dt>Mean temperature</dt><dd>{conditionValue(c.meanTemperatureC, "°C")}</dd>
            <dt>Cell</dt><dd>{c.cell || "not recorded"}</dd>
            <dt>Bentonite thickness</dt><dd>{conditionValue(c.thicknessMm, "mm", 2)} <span className="doc-muted">(after the test, geotextiles excluded)</span></dd>
          </dl>
        </div>
        <div>
          <h3 style={{ marginTop: 0 }}>Test record</h3>
          <dl className="cert-conditions">
            <dt>Ended</dt><dd>{isoDateTime(test.terminatedAt)}</dd>
            <dt>Termination</dt><dd>{test.termination ? capitalise(test.termination) : "not recorded"}</dd>
            <dt>Performed by</dt><dd>{test.performedBy}</dd>
            <dt>Approved by</dt><dd>{test.approvedBy}</dd>
            <dt>Approved</dt><dd>{isoDateTime(test.approvedAt)}</dd>
          </dl>
        </div>
      </div>

      <h3>Results</h3>
      <table>
        <thead>
          <tr><th>Property</th><th className="num">Result</th><th className="nowrap">Expanded uncertainty (k = 2)</th><th className="nowrap">Limit</th><th>Verdict</th></tr>
        </thead>
        <tbody>
          {test.results.map((r, i) => (
            <tr key={i}>
              <td>{r.label}</td>
              <td className="num">{valueWithUnit(r.display, r.unit)}</td>
              <td className="nowrap">{r.uncertaintyDisplay ? withoutCoverageFactor(r.uncertaintyDisplay) : "not stated"}</td>
              <td className="nowrap">{r.conformance ? limitLabel(r.conformance, prettyUnit) : "—"}</td>
              <td><CertificateVerdict conformance={r.conformance} /></td>
            </tr>
          ))}
          {test.results.length === 0 ? <tr><td colSpan={5} className="doc-muted">No results are reported for this test.</td></tr> : null}
        </tbody>
      </table>
      <Uncertainties results={test.results} />
      {test.results.map((r, i) => <Decision key={i} result={r} />)}
      </div>

      <HowComputed test={test} />

      <CertificateChart test={test} />

      <h3>Deviations from the method</h3>
      {test.deviations.length ? (
        <ul style={{ margin: 0, paddingLeft: "14pt" }}>{test.deviations.map((d, i) => <li key={i}>{d}</li>)}</ul>
      ) : (
        <p>None.</p>
      )}
    </section>
  );
}
