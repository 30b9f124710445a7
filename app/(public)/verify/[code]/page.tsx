import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { Wordmark } from "@/components/shell/wordmark";
import { formatDate } from "@/lib/format/dates";
import { revisionStanding } from "@/lib/certificates/revision-standing";
import { normaliseVerificationCode } from "@/lib/certificates/verification-code";
import { verifyCertificate, type CertificateVerification } from "@/lib/server/certificates/verify-certificate";
import { getLabName } from "@/lib/server/lab/get-lab-name";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Certificate verification", robots: { index: false } };
export const dynamic = "force-dynamic";

const NOWRAP = { whiteSpace: "nowrap" } as const;

const TONE = { ok: "notice-ok", warn: "notice-caution", bad: "notice-error" } as const;
const STATUS_NAME = { VALID: "valid", SUPERSEDED: "superseded", REVOKED: "revoked" } as const;

function Status({ result, zone }: { result: CertificateVerification; zone: string }) {
  const standing = revisionStanding({
    status: result.status === "VALID" ? "ISSUED" : result.status,
    supersededByRevision: result.supersededBy?.revision ?? null,
    since: result.since,
    zone,
  });
  return (
    <div className={`notice ${TONE[standing.tone]}`} data-testid="verify-status" data-status={STATUS_NAME[result.status]}>
      <strong>{standing.headline}</strong> {standing.detail}
    </div>
  );
}

/** Public: what the laboratory's record says about one verification code, and nothing about the client. */
export default async function VerificationPage({ params }: { params: Promise<{ code: string }> }) {
  const { code } = await params;
  const canonical = normaliseVerificationCode(code);
  if (!canonical) notFound();
  if (canonical !== code) redirect(`/verify/${canonical}`);
  const result = await verifyCertificate(canonical);
  if (!result) notFound();
  const zone = await getLabTimeZone();
  return (
    <main className="plain" id="main" tabIndex={-1}>
      <div className="plain-card">
        <Wordmark />
        <h1>Certificate verification</h1>
        <p className="muted">{await getLabName()} · code <span className="mono" style={{ whiteSpace: "nowrap" }}>{canonical}</span></p>
        <Status result={result} zone={zone} />
        <dl className="facts" style={{ marginTop: "0.75rem" }}>
          <div><dt>Certificate</dt><dd className="mono" data-testid="verify-number">{result.number}</dd></div>
          <div><dt>Revision</dt><dd data-testid="verify-revision">{result.revision}</dd></div>
          <div><dt>Issued</dt><dd data-testid="verify-issued">{formatDate(result.issuedAt, zone)}</dd></div>
        </dl>
        <h2 style={{ marginTop: "0.75rem" }}>SHA-256 digest of the issued PDF</h2>
        {result.pdfSha256 ? (
          <>
            <p className="mono" data-testid="verify-digest" style={{ overflowWrap: "anywhere", background: "var(--paper)", padding: "0.5rem 0.6rem", borderRadius: "var(--radius)" }}>{result.pdfSha256}</p>
            <p className="hint">
              Compare it with the digest of your copy: <code style={NOWRAP}>sha256sum certificate.pdf</code> on Linux, <code style={NOWRAP}>shasum -a 256 certificate.pdf</code>
              {" "}on macOS, <code style={NOWRAP}>certutil -hashfile certificate.pdf SHA256</code> on Windows. If the two differ, your file is not the one the laboratory issued.
            </p>
          </>
        ) : (
          <p className="muted" data-testid="verify-digest">No digest is on record for this revision; ask the laboratory to confirm your copy.</p>
        )}
        <p className="hint"><Link href="/verify">Check another code</Link></p>
      </div>
    </main>
  );
}
