import Link from "next/link";
import { notFound } from "next/navigation";
import { CustodyLedger } from "@/components/custody/custody-ledger";
import { ItemCustodyActions } from "@/components/custody/item-custody-actions";
import { RecordFacts } from "@/components/samples/record-facts";
import { StateTag } from "@/components/ui/state-tag";
import { isAppError } from "@/lib/errors/app-error";
import { formatDate, formatDateTime } from "@/lib/format/dates";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getItemHistory } from "@/lib/server/samples/get-item-history";
import { getSpecimen } from "@/lib/server/samples/get-sample-item";
import { listStorageLocations } from "@/lib/server/samples/list-storage-locations";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

type Props = { params: Promise<{ labNumber: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Specimen ${(await params).labNumber}` };
}

export default async function SpecimenPage({ params }: Props) {
  const actor = await requirePageUser("sample.view");
  const zone = await getLabTimeZone();
  const { labNumber } = await params;
  const specimen = await getSpecimen({ actor, labNumber }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const [history, locations] = await Promise.all([getItemHistory({ actor, kind: "specimen", id: specimen.id }), listStorageLocations({ actor, activeOnly: true })]);
  return (
    <>
      <div className="page-head">
        <div>
          <h1>Specimen <span className="mono">{specimen.labNumber}</span> <StateTag state={specimen.state} /></h1>
          <p className="muted">
            From coupon <Link className="mono" href={`/samples/coupons/${specimen.coupon.labNumber}`}>{specimen.coupon.labNumber}</Link>, roll{" "}
            <Link className="mono" href={`/samples/rolls/${specimen.coupon.roll.labNumber}`}>{specimen.coupon.roll.labNumber}</Link> · {specimen.coupon.roll.project.name}
          </p>
        </div>
        <div className="links"><Link className="button button-quiet" href={`/labels?numbers=${specimen.labNumber}`}>Label</Link></div>
      </div>
      <div className="stack-gap">
        <section className="card">
          <RecordFacts facts={[
            ["Intended method", `ASTM ${specimen.intendedMethodCode}`], ["Die diameter (mm)", specimen.dieDiameterMm], ["Initial thickness (mm)", specimen.initialThicknessMm],
            ["Initial mass (g)", specimen.initialMassG], ["Moisture content (%)", specimen.moistureContentPct ?? "—"],
            ["Dry bentonite mass (g)", specimen.bentoniteDryMassG ?? "—"], ["Bentonite mass per area (kg/m²)", specimen.bentoniteMassPerAreaKgPerM2 ?? "—"], ["Specific gravity", specimen.specificGravity ?? "default"], ["Prepared by", specimen.preparedBy.name],
            ["Prepared at", formatDateTime(specimen.preparedAt, zone)], ["Kept at", specimen.storageLocation ? `${specimen.storageLocation.code} · ${specimen.storageLocation.name}` : "—"],
            ["Retained until", formatDate(specimen.retainUntil, zone)],
          ]} />
          {can(actor.role, "sample.move") && <ItemCustodyActions kind="specimen" id={specimen.id} version={specimen.version} labNumber={specimen.labNumber} currentLocationId={specimen.storageLocationId} locations={locations} />}
        </section>
        <div className="grid">
          <section className="card">
            <h2>Preparation checklist</h2>
            <table className="list" data-testid="specimen-checklist">
              <tbody>{specimen.checklist.map((item) => (
                <tr key={item.id}><td>{item.question}</td><td>{item.answer ? <span className="state state-ok">yes</span> : <span className="state state-bad">no</span>}</td></tr>
              ))}</tbody>
            </table>
          </section>
          <section className="card">
            <h2>Runs</h2>
            {specimen.runs.length === 0 ? <p className="empty">Not yet assigned to a cell.</p> : (
              <ul>{specimen.runs.map((r) => <li key={r.labNumber}>{can(actor.role, "run.view") ? <Link className="mono" href={`/runs/${r.labNumber}`}>{r.labNumber}</Link> : <span className="mono">{r.labNumber}</span>} ASTM {r.methodCode} <StateTag state={r.state} kind="run" /></li>)}</ul>
            )}
            {/* The next step from here, for whoever mounts specimens: a prepared specimen with no active run. */}
            {specimen.state === "PREPARED" && can(actor.role, "run.operate") && (
              <p><Link className="button" href={`/runs/new?specimen=${specimen.id}`} data-testid="mount-specimen">Mount it in a cell</Link></p>
            )}
          </section>
        </div>
        <section className="card"><h2>Custody ledger</h2><CustodyLedger zone={zone} events={history.events} /></section>
      </div>
    </>
  );
}
