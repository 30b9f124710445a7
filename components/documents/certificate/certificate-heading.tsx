import { isoDate } from "@/lib/certificates/certificate-wording";
import type { CertificateSnapshot } from "@/lib/certificates/certificate-snapshot";

// A reason typed with or without its full stop reads as one sentence.
function sentence(text: string): string {
  const trimmed = text.trim();
  return /[.!?]$/.test(trimmed) ? trimmed : `${trimmed}.`;
}

/** Title, the identity panel (number, revision, issue date) and, for a correction, what it supersedes. */
export function CertificateHeading({ snapshot }: { snapshot: CertificateSnapshot }) {
  const indexTests = snapshot.indexTests ?? [];
  const methods = [...new Set([...snapshot.tests, ...indexTests].map((t) => t.method.code))];
  const title = indexTests.length === 0 ? "Hydraulic tests on geosynthetic clay liner" : snapshot.tests.length === 0 ? "Index tests on geosynthetic clay liner" : "Hydraulic and index tests on geosynthetic clay liner";
  return (
    <>
      <div className="cert-head">
        <div>
          <div className="cert-kicker">Test certificate</div>
          <h1>{title}</h1>
          <div className="doc-small">{methods.length ? `Methods: ${methods.join(", ")}` : "No tests are reported on this certificate."}</div>
        </div>
        <div className="cert-identity" data-testid="certificate-identity">
          <div><div className="cert-label">Certificate</div><div className="cert-value cert-number">{snapshot.number}</div></div>
          <div><div className="cert-label">Revision</div><div className="cert-value">{snapshot.revision}</div></div>
          <div><div className="cert-label">Issued</div><div className="cert-value">{isoDate(snapshot.issuedAt, snapshot.lab.timeZone)}</div></div>
        </div>
      </div>
      {snapshot.supersedes ? (
        <div className="doc-box doc-box-warn cert-supersedes" style={{ marginTop: 0, marginBottom: "10pt" }} data-testid="certificate-amendment">
          <strong>Amended certificate.</strong> Revision {snapshot.revision} supersedes revision {snapshot.supersedes.revision}, which is no longer valid.
          {" "}Reason: <span data-testid="certificate-amendment-reason">{sentence(snapshot.supersedes.reason || snapshot.reason || "no reason was recorded")}</span>
          {snapshot.changes ? (
            snapshot.changes.length ? (
              <ul style={{ margin: "3pt 0 0", paddingLeft: "14pt" }} data-testid="certificate-changes">{snapshot.changes.map((c, i) => <li key={i}>{c}</li>)}</ul>
            ) : <div>The content is unchanged from revision {snapshot.supersedes.revision}.</div>
          ) : null}
        </div>
      ) : null}
    </>
  );
}
