import { LabDetailsForm } from "@/components/lab/lab-details-form";
import { formatDateTime } from "@/lib/format/dates";
import { formatOffset, listTimeZones } from "@/lib/format/time-zone";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getLabDetails } from "@/lib/server/lab/get-lab-details";

export const metadata = { title: "Lab details" };

export default async function LabDetailsPage() {
  const actor = await requirePageUser("lab.configure");
  const lab = await getLabDetails({ actor });
  const now = new Date();
  const zones = listTimeZones(lab.timeZone).map((zone) => ({ zone, label: `${zone} (${formatOffset(now, zone)})` }));
  return (
    <>
      <h1>Lab details</h1>
      <p className="muted">
        How the laboratory names itself on receipts, labels and certificates, and the time zone every time is shown and entered in. Times are
        stored as instants (UTC); documents name the zone. Issued certificates keep the details they were issued with.
      </p>
      <section className="card" style={{ maxWidth: "40rem" }}>
        <LabDetailsForm lab={{ name: lab.name, address: lab.address, accreditation: lab.accreditation ?? "", timeZone: lab.timeZone }} zones={zones} />
        {lab.updatedAt && <p className="muted" data-testid="lab-updated">Last changed {formatDateTime(lab.updatedAt, lab.timeZone)}.</p>}
      </section>
    </>
  );
}
