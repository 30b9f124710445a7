import { revisionStanding } from "@/lib/certificates/revision-standing";
import { formatDate } from "@/lib/format/dates";
import type { PortalCertificate, PortalCertificateRevision } from "@/lib/server/portal/list-portal-certificates";
import styles from "./portal.module.css";
import { ScrollArea } from "@/components/ui/scroll-area";

const TONE = { ok: "state-ok", warn: "state-warn", bad: "state-bad" } as const;

// When a revision stopped standing; the portal never lists drafts.
const sinceOf = (r: PortalCertificateRevision) => (r.status === "REVOKED" ? r.revokedAt : r.status === "SUPERSEDED" ? r.supersededAt : null);
const standingOf = (r: PortalCertificateRevision, zone?: string) =>
  revisionStanding({ status: r.status === "DRAFT" ? "ISSUED" : r.status, supersededByRevision: r.supersededByRevision, since: sinceOf(r), zone });

function RevisionStatus({ revision, zone }: { revision: PortalCertificateRevision; zone: string }) {
  const standing = standingOf(revision, zone);
  const since = sinceOf(revision);
  return (
    <>
      <span className={`state ${TONE[standing.tone]}`} title={`${standing.headline} ${standing.detail}`}>{standing.label}</span>
      {since && <div className={`muted ${styles.nowrap}`}>since {formatDate(since, zone)}</div>}
    </>
  );
}

/** The PDF cell: a download while the revision may circulate (a superseded one says so), never for a revoked one. */
function Download({ number, revision }: { number: string; revision: PortalCertificateRevision }) {
  if (!standingOf(revision).clientMayDownload) return <span className="muted" data-testid="pdf-withdrawn">withdrawn; not offered</span>;
  if (!revision.hasPdf) return <span className="muted" title="Ask the laboratory for a copy.">not stored yet</span>;
  const superseded = revision.status === "SUPERSEDED";
  return (
    <a
      href={`/api/certificates/${encodeURIComponent(number)}/pdf?revision=${revision.revision}`}
      download
      aria-label={`Download the PDF of ${number} revision ${revision.revision}${superseded ? ", superseded" : ""}`}
    >
      {superseded ? "Download (superseded)" : "Download"}
    </a>
  );
}

/**
 * Certificates with every issued revision: status (superseded ones say by which revision), the rolls it covers, issue date,
 * verification code and the PDF download (none for a revoked revision). `showProject` adds the project
 * column for the all-projects list.
 */
export function CertificateTable({ certificates, showProject = false, zone = "UTC" }: { certificates: PortalCertificate[]; showProject?: boolean; zone?: string }) {
  return (
    <ScrollArea>
      <table className={`list ${styles.certificates}`} data-testid="portal-certificates">
        <thead>
          <tr>
            <th>Certificate</th>
            {showProject && <th>Project</th>}
            <th>Rev.</th><th>Status</th><th>Rolls covered</th><th>Issued</th><th>Verification</th><th>PDF</th>
          </tr>
        </thead>
        {certificates.map((certificate) => (
          <tbody key={certificate.number} className={styles.certificate} data-certificate={certificate.number}>
            {certificate.revisions.map((revision, index) => (
              <tr key={revision.revision} data-revision={revision.revision} data-status={revision.status} className={revision.status === "ISSUED" ? "" : styles.past}>
                {index === 0 && (
                  <>
                    <td rowSpan={certificate.revisions.length} className={`mono ${styles.number}`}>{certificate.number}</td>
                    {showProject && <td rowSpan={certificate.revisions.length}>{certificate.project.name}<div className="muted mono">{certificate.project.code}</div></td>}
                  </>
                )}
                <td>{revision.revision}</td>
                <td>
                  <RevisionStatus revision={revision} zone={zone} />
                  {revision.reason && <div className={`muted ${styles.reason}`}>Reason: {revision.reason}</div>}
                </td>
                <td className="mono" data-testid="certificate-rolls">{revision.rolls.length ? revision.rolls.join(", ") : "—"}</td>
                <td className={styles.nowrap}>{formatDate(revision.issuedAt, zone)}</td>
                <td><a className="mono" href={`/verify/${encodeURIComponent(revision.verificationCode)}`}>{revision.verificationCode}</a></td>
                <td><Download number={certificate.number} revision={revision} /></td>
              </tr>
            ))}
          </tbody>
        ))}
      </table>
    </ScrollArea>
  );
}
