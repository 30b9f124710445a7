import { CERTIFICATE_CAUTIONS, isoDateTime, roleLabel } from "@/lib/certificates/certificate-wording";
import type { CertificateSnapshot } from "@/lib/certificates/certificate-snapshot";
import { timeZoneStatement } from "@/lib/format/time-zone";

// A long address wraps after a slash rather than inside the code.
function breakableUrl(url: string) {
  return url.split(/(?<=\/)/).map((part, i) => <span key={i}>{i >= 3 ? <wbr /> : null}{part}</span>);
}

/** Signatory, verification code with its 2D code, and the closing statements, kept together on one page. */
export function CertificateClose({ snapshot, qrSvg, preview = false }: { snapshot: CertificateSnapshot; qrSvg: string; preview?: boolean }) {
  const { signatory } = snapshot;
  return (
    <section className="cert-close" data-testid="certificate-close">
      <div className="cert-close-grid">
        <div className="doc-box" data-testid="certificate-signatory">
          <div className="doc-small">Authorised for issue by</div>
          <div className="cert-sign-name">{signatory.name}</div>
          <div>{roleLabel(signatory.role)}</div>
          <p style={{ margin: "4pt 0 2pt" }}>{signatory.meaning}</p>
          {preview
            ? <div className="doc-small" data-testid="certificate-not-signed">Not signed: a preview of the draft. The signatory confirms with their password when it is issued.</div>
            : <div className="doc-small">Signed electronically {isoDateTime(signatory.signedAt, snapshot.lab.timeZone)}, the signatory confirming with their password.</div>}
        </div>
        <div className="doc-box cert-verify" data-testid="certificate-verification">
          {/* The SVG comes from the qrcode package (our own lib/server/labels/qr-code-svg), never from user text. */}
          <div className="cert-qr" dangerouslySetInnerHTML={{ __html: qrSvg }} />
          <div>
            <div className="doc-small">Verification code</div>
            <div className="cert-code">{snapshot.verificationCode}</div>
            <div className="cert-url">{breakableUrl(snapshot.verificationUrl)}</div>
            <div className="doc-small" style={{ marginTop: "3pt" }}>
              Scan or open the address to see whether this revision is valid, superseded or revoked, and the SHA-256 digest of the issued PDF to compare with your copy.
            </div>
          </div>
        </div>
      </div>
      <div className="cert-statements">
        {CERTIFICATE_CAUTIONS.map((text) => <p key={text}><strong>{text}</strong></p>)}
        <p>This certificate may be reproduced only in full. {timeZoneStatement(snapshot.lab.timeZone ?? "UTC", new Date(snapshot.issuedAt))} The laboratory keeps the original observations and the full record of each test.</p>
      </div>
    </section>
  );
}
