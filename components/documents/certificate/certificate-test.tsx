import { capitalise, conditionValue, isoDateTime, prettyUnit, valueWithUnit, withoutCoverageFactor } from "@/lib/certificates/certificate-wording";
import type { CertificateResultLine, CertificateTest } from "@/lib/certificates/certificate-snapshot";
import { CertificateChart } from "./certificate-chart";
import { formatDecimalText } from "@/lib/format/result-numbers";
import { inSentence } from "@/lib/format/sentence-case";
import { CertificateVerdict, limitLabel } from "./certificate-verdict";
import { Deviations, MethodEdition, TestHead } from "./certificate-test-frame";

/** The numbers that decided a verdict: what was compared, by which ASTM E29 method, with which limit, and the statement. */
export function Decision({ result }: { result: CertificateResultLine }) {
  const c = result.conformance;
  if (!c) return null;
  return (
    <div className="cert-decision" data-testid="certificate-decision">
      <div className="cert-decision-head"><strong>{result.label}</strong> <CertificateVerdict conformance={c} /></div>
      <dl className="cert-decision-numbers">
        {c.measuredValue ? <div><dt>Measured value</dt><dd className="mono">{c.measuredValue}</dd></div> : null}
        <div><dt>{c.method === "ROUNDING" ? "Rounded to the limit's last place" : "Compared as measured"}</dt><dd className="mono">{comparedText(c)}</dd></div>
        <div><dt>Limit</dt><dd>{c.direction === "MAXIMUM" ? "maximum" : "minimum"} <span className="mono">{formatDecimalText(c.limitText)} {prettyUnit(c.unit)}</span></dd></div>
        <div><dt>ASTM E29 method</dt><dd>{c.method === "ROUNDING" ? "rounding (once, half to even, to the limit's last place)" : "absolute (any excursion fails)"}</dd></div>
      </dl>
      <p>{c.statement}</p>
      {c.plainRule ? <p className="doc-small" data-testid="certificate-e29-rule">{c.plainRule}</p> : null}
    </div>
  );
}

/** The value the limit was compared with, in the results' notation; a rounding to 0 is said in words, never as a bare "0". */
function comparedText(c: NonNullable<CertificateResultLine["conformance"]>): string {
  if (c.method === "ROUNDING" && Number(c.comparedValue) === 0) return `below half of the limit's last place (rounds to nothing at ${formatDecimalText(c.limitText)} ${prettyUnit(c.unit)})`;
  return `${formatDecimalText(c.comparedValue)} ${prettyUnit(c.unit)}`;
}

/** The specimen as tested: dimensions, masses, moisture, conditioning and loading. */
function SpecimenData({ test, zone }: { test: CertificateTest; zone: string }) {
  const s = test.specimen;
  const d = test.dates;
  if (!s && !d) return null;
  const n = (v: number | null | undefined, unit: string, decimals = 1) => conditionValue(v ?? null, unit, decimals);
  return (
    <div className="cert-two" data-testid="certificate-specimen">
      {s ? (
        <div>
          <h3>Specimen as tested</h3>
          <dl className="cert-conditions">
            <dt>Die diameter</dt><dd data-testid="specimen-diameter">{n(s.dieDiameterMm, "mm")}</dd>
            <dt>Area</dt><dd data-testid="specimen-area">{n(s.areaMm2 / 100, "cm²", 2)}</dd>
            <dt>Thickness, initial</dt><dd data-testid="specimen-initial-thickness">{n(s.initialThicknessMm, "mm", 2)}</dd>
            <dt>Thickness after test</dt><dd data-testid="specimen-final-thickness">{n(s.postTestThicknessMm, "mm", 2)} <span className="doc-muted">(bentonite, geotextiles excluded)</span></dd>
            <dt>Mass, initial</dt><dd data-testid="specimen-initial-mass">{n(s.initialMassG, "g", 2)}</dd>
            <dt>Mass after test</dt><dd data-testid="specimen-final-mass">{n(s.postTestMassG, "g", 2)}</dd>
            <dt>Moisture content</dt><dd data-testid="specimen-moisture">{n(s.moistureContentPct, "%")}</dd>
          </dl>
        </div>
      ) : <div />}
      <div>
        <h3>Conditioning and loading</h3>
        <dl className="cert-conditions">
          {s ? <><dt>Hydration before permeation</dt><dd data-testid="specimen-hydration">{n(s.hydrationHours, "h")}</dd></> : null}
          {s ? <><dt>Equilibration hold</dt><dd data-testid="specimen-equilibration">{n(s.equilibrationHours, "h")}</dd></> : null}
          {s ? <><dt>Effective stress</dt><dd data-testid="specimen-effective-stress">{n(s.effectiveStressKPa, "kPa")}</dd></> : null}
          {s ? <><dt>Hydraulic gradient</dt><dd data-testid="specimen-gradient">{s.gradient === null ? "not recorded" : conditionValue(s.gradient, "", 0).trim()} <span className="doc-muted">(mean over the reported intervals)</span></dd></> : null}
          {s ? <><dt>Permeant</dt><dd data-testid="specimen-permeant">{s.permeant}</dd></> : null}
          {d ? <><dt>Mounted in the cell</dt><dd className="nowrap" data-testid="test-mounted">{isoDateTime(d.mountedAt, zone)}</dd></> : null}
          {d ? <><dt>Permeation started</dt><dd className="nowrap" data-testid="test-permeation-start">{isoDateTime(d.permeationStartedAt, zone)}</dd></> : null}
          {d ? <><dt>Permeation ended</dt><dd className="nowrap" data-testid="test-permeation-end">{isoDateTime(d.permeationEndedAt, zone)}</dd></> : null}
        </dl>
      </div>
    </div>
  );
}

/** Under the results: the three largest contributors to each stated uncertainty, or why none is stated. */
export function Uncertainties({ results }: { results: CertificateResultLine[] }) {
  const lines = results.filter((r) => r.uncertaintyContributors?.length || r.uncertaintyNote);
  if (lines.length === 0) return null;
  return (
    <div className="doc-small" data-testid="certificate-uncertainty" style={{ marginTop: "4pt" }}>
      {lines.map((r, i) => (
        <p key={i} style={{ margin: "2pt 0" }}>
          {r.uncertaintyContributors?.length
            ? <>Uncertainty of {inSentence(r.label)}: expanded, {r.coverage ?? "coverage factor k = 2 (about 95 %)"}; largest contributors (relative standard uncertainty): {r.uncertaintyContributors.join("; ")}.</>
            : <>Uncertainty of {inSentence(r.label)} not stated: {r.uncertaintyNote}</>}
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
export function CertificateTestSection({ test, index, count, zone = "UTC" }: { test: CertificateTest; index: number; count: number; zone?: string }) {
  const c = test.conditions;
  return (
    <section className="cert-test" data-testid="certificate-test">
      {/* The heading, conditions, results and verdicts of a test stay on one page; the chart may follow. */}
      <div className="doc-keep">
      <TestHead number={index + 1} count={count} methodCode={test.method.code}>
        specimen <span className="mono">{test.specimenLabNumber}</span> · roll <span className="mono">{test.rollLabNumber}</span> · run <span className="mono">{test.runLabNumber}</span>
      </TestHead>
      <div className="cert-two">
        <div>
          <MethodEdition method={test.method} testId="certificate-method-edition" />
          <dl className="cert-conditions">
            <dt>Effective stress</dt><dd>{conditionValue(c.effectiveStressKPa, "kPa")}</dd>
            <dt>Line-pressure difference</dt><dd>{conditionValue(c.headKPa, "kPa")} <span className="doc-muted">(influent − effluent)</span></dd>
            {c.meanHeadM != null && <><dt>Total head</dt><dd data-testid="certificate-total-head">{conditionValue(c.meanHeadM, "m", 3)} <span className="doc-muted">(mean over the reported intervals, burette levels included)</span></dd></>}
            <dt>Permeant</dt><dd>{c.permeant || "not recorded"}</dd>
            <dt>Temperature</dt><dd data-testid="certificate-temperature">{conditionValue(c.meanTemperatureC, "°C")} <span className="doc-muted">(mean while the reported flux was measured; k is corrected to 20 °C)</span></dd>
            <dt>Cell</dt><dd>{c.cell || "not recorded"}</dd>
            <dt>Bentonite thickness</dt><dd>{conditionValue(c.thicknessMm, "mm", 2)} <span className="doc-muted">(after the test, geotextiles excluded)</span></dd>
          </dl>
        </div>
        <div>
          <h3 style={{ marginTop: 0 }}>Test record</h3>
          <dl className="cert-conditions">
            <dt>Ended</dt><dd>{isoDateTime(test.terminatedAt, zone)}</dd>
            <dt>Termination</dt><dd>{test.termination ? capitalise(test.termination) : "not recorded"}</dd>
            <dt>Performed by</dt><dd>{test.performedBy}</dd>
            <dt>Approved by</dt><dd>{test.approvedBy}</dd>
            <dt>Approved</dt><dd>{isoDateTime(test.approvedAt, zone)}</dd>
          </dl>
        </div>
      </div>

      <SpecimenData test={test} zone={zone} />

      <h3>Results</h3>
      <table>
        <thead>
          <tr><th>Property</th><th className="num">Result</th><th className="nowrap">Expanded uncertainty (k = 2, ≈95 %)</th><th className="nowrap">Limit</th><th>Verdict</th></tr>
        </thead>
        <tbody>
          {test.results.map((r, i) => (
            <tr key={i}>
              <td>{r.label}</td>
              <td className="num">{valueWithUnit(r.display, r.unit)}</td>
              <td className="nowrap">{r.uncertaintyDisplay ? withoutCoverageFactor(r.uncertaintyDisplay) : "not stated"}</td>
              <td className="nowrap">{r.conformance ? limitLabel(r.conformance) : "—"}</td>
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

      <Deviations items={test.deviations} />
    </section>
  );
}
