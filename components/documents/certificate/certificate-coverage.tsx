import type { CertificateCoverage } from "@/lib/certificates/property-coverage";

const MARK: Record<string, string> = { reported: "reported", "not required": "not required", pending: "pending", "not tested": "not tested", "not included": "not included" };

/**
 * The specification, property by property, for every roll the certificate reports on: reported here, or
 * not and why (sampling frequency, pending, not tested yet, left out of this certificate). Nothing the
 * specification lists is silently missing.
 */
export function CertificateCoverageSection({ coverage, specificationName }: { coverage: CertificateCoverage; specificationName: string }) {
  return (
    <section className="doc-keep" data-testid="certificate-coverage">
      <h2>What this certificate covers of the specification</h2>
      <p className="doc-small">Every property {specificationName} lists, for each roll reported on. A property not reported for a roll is named below with the reason.</p>
      <table>
        <thead>
          <tr><th>Roll</th>{coverage.properties.map((p) => <th key={p.property}>{p.label}</th>)}</tr>
        </thead>
        <tbody>
          {coverage.rows.map((row) => (
            <tr key={row.rollLabNumber} data-roll={row.rollLabNumber}>
              <td className="mono nowrap">{row.rollLabNumber}</td>
              {row.cells.map((c) => <td key={c.property} data-property={c.property} data-status={c.status} className={c.status === "reported" ? "" : "doc-muted"}>{MARK[c.status]}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
      <h3>Properties not reported, and why</h3>
      {coverage.notTested.length ? (
        <ul style={{ margin: 0, paddingLeft: "14pt" }} data-testid="certificate-not-tested">{coverage.notTested.map((line, i) => <li key={i}>{line}</li>)}</ul>
      ) : (
        <p data-testid="certificate-not-tested">None: every property the specification lists is reported for every roll on this certificate.</p>
      )}
      {coverage.otherRolls.length ? (
        <p className="doc-small" data-testid="certificate-other-rolls">The project&apos;s other rolls ({coverage.otherRolls.join(", ")}) have no result on this certificate; it says nothing of them.</p>
      ) : null}
    </section>
  );
}
