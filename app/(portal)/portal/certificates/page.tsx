import { CertificateTable } from "@/components/portal/certificate-table";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listPortalCertificates } from "@/lib/server/portal/list-portal-certificates";

export const metadata = { title: "Certificates" };

export default async function PortalCertificatesPage() {
  const actor = await requirePageUser("portal.view");
  const certificates = await listPortalCertificates({ actor });
  return (
    <>
      <h1>Certificates</h1>
      <p className="muted">
        Every certificate the laboratory has issued to your organisation, with each revision. A superseded revision stays
        downloadable and says which revision replaced it; a revoked one is marked revoked and no longer offered, since its
        results must not be relied on. Anyone can check a certificate with its verification code.
      </p>
      <section className="card">
        <h2>Issued certificates <span className="count">{certificates.length === 0 ? "none yet" : certificates.length}</span></h2>
        {certificates.length === 0 ? <p className="empty">No certificate has been issued to your organisation yet.</p> : <CertificateTable certificates={certificates} showProject />}
      </section>
    </>
  );
}
