import Link from "next/link";
import { QueueCard } from "@/components/ui/queue-card";
import { can } from "@/lib/policy/permissions";
import { formatDate } from "@/lib/format/dates";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listCertificates } from "@/lib/server/certificates/list-certificates";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Certificates" };

export default async function CertificatesPage() {
  const actor = await requirePageUser("certificate.view");
  const zone = await getLabTimeZone();
  const certificates = await listCertificates({ actor });
  return (
    <>
      <h1>Certificates</h1>
      <div className="page-head">
        <p className="muted">Signed test certificates and their revisions.</p>
        {can(actor.role, "certificate.issue") && <Link className="button" href="/certificates/new">New certificate</Link>}
      </div>
      <QueueCard title="Certificates" count={certificates.length} empty="No certificate has been issued yet." testId="certificate-list">
        <table className="list">
          <thead><tr><th>Number</th><th>Client / project</th><th>Revision</th><th>Issued</th><th>Status</th></tr></thead>
          <tbody>
            {certificates.map((c) => {
              const latest = c.revisions[0];
              return (
                <tr key={c.id}>
                  <td><Link className="mono" href={`/certificates/${c.number}`}>{c.number}</Link></td><td>{c.clientOrganization.name}<div className="muted">{c.project.name}</div></td>
                  <td>{latest?.revision ?? "—"}</td><td>{formatDate(latest?.issuedAt, zone)}</td><td>{latest ? <span className="state">{latest.status.toLowerCase()}</span> : "—"}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </QueueCard>
    </>
  );
}
