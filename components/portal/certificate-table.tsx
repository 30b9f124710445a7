import { formatDate } from "@/lib/format/dates";
import type { PortalCertificate, PortalCertificateRevision } from "@/lib/server/portal/list-portal-certificates";
import styles from "./portal.module.css";

function RevisionStatus({ revision, zone }: { revision: PortalCertificateRevision; zone: string }) {
  if (revision.status === "SUPERSEDED")
    return (
      <>
        <span className="state state-warn">{revision.supersededByRevision ? `Superseded by revision ${revision.supersededByRevision}` : "Superseded"}</span>
        {revision.supersededAt && <div className={`muted ${styles.nowrap}`}>since {formatDate(revision.supersededAt, zone)}</div>}
      </>
    );
  if (revision.status === "REVOKED")
    return (
      <>
        <span className="state state-bad">Revoked</span>
        {revision.revokedAt && <div className={`muted ${styles.nowrap}`}>since {formatDate(revision.revokedAt, zone)}</div>}
      </>
    );
  return <span className="state state-ok">Issued, valid</span>;
}

/**
 * Certificates with every issued revision: status (superseded ones say by which revision), issue date,
 * verification code and the PDF download. `showProject` adds the project column for the all-projects list.
 */
export function CertificateTable({ certificates, showProject = false, zone = "UTC" }: { certificates: PortalCertificate[]; showProject?: boolean; zone?: string }) {
  return (
    <div className="table-wrap">
      <table className={`list ${styles.certificates}`} data-testid="portal-certificates">
        <thead>
          <tr>
            <th>Certificate</th>
            {showProject && <th>Project</th>}
            <th>Rev.</th><th>Status</th><th>Issued</th><th>Verification</th><th>PDF</th>
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
                <td className={styles.nowrap}>{formatDate(revision.issuedAt, zone)}</td>
                <td><a className="mono" href={`/verify/${encodeURIComponent(revision.verificationCode)}`}>{revision.verificationCode}</a></td>
                <td>
                  {revision.hasPdf ? (
                    <a
                      href={`/api/certificates/${encodeURIComponent(certificate.number)}/pdf?revision=${revision.revision}`}
                      download
                      aria-label={`Download the PDF of ${certificate.number} revision ${revision.revision}`}
                    >
                      Download
                    </a>
                  ) : (
                    <span className="muted" title="Ask the laboratory for a copy.">not stored yet</span>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        ))}
      </table>
    </div>
  );
}
