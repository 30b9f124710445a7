import { DraftCertificateForm } from "@/components/certificates/draft-certificate-form";
import { formatPropertyValue } from "@/lib/format/result-numbers";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listCertifiableResults } from "@/lib/server/certificates/list-certifiable-results";

export const metadata = { title: "New certificate" };

export default async function NewCertificatePage() {
  const actor = await requirePageUser("certificate.issue");
  const groups = await listCertifiableResults({ actor });
  return (
    <>
      <h1>New certificate</h1>
      <p className="muted">Approved results not yet on a certificate, by project. A certificate covers one project.</p>
      {groups.length === 0 ? <p className="empty">No approved result is waiting for a certificate.</p> : (
        <DraftCertificateForm groups={groups.map((g) => ({ project: g.project, results: g.results.map((r) => ({ id: r.id, limited: g.limited.includes(r.property), noLimit: g.noLimit[r.id] ?? null, shipment: r.run.specimen.coupon.roll.shipment.labNumber, label: `${r.run.labNumber} · specimen ${r.run.specimen.labNumber} · roll ${r.run.specimen.coupon.roll.labNumber} (shipment ${r.run.specimen.coupon.roll.shipment.labNumber}) · ASTM ${r.run.methodCode} · ${formatPropertyValue(r.property, r.value, r.unit, actor.resultUnits ?? "SI").text}` })), indexResults: g.indexResults.map((r) => ({ id: r.id, limited: g.limited.includes(r.property), noLimit: g.noLimit[r.id] ?? null, shipment: r.shipmentLabNumber, label: `${r.label} ${formatPropertyValue(r.property, r.value, r.unit, actor.resultUnits ?? "SI").text}` })) }))} />
      )}
    </>
  );
}
