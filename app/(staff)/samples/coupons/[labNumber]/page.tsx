import Link from "next/link";
import { notFound } from "next/navigation";
import { CustodyLedger } from "@/components/custody/custody-ledger";
import { ItemCustodyActions } from "@/components/custody/item-custody-actions";
import { PrepareSpecimenForm } from "@/components/samples/prepare-specimen-form";
import { INDEX_METHODS, isIndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { RecordFacts } from "@/components/samples/record-facts";
import { StateTag } from "@/components/ui/state-tag";
import { isAppError } from "@/lib/errors/app-error";
import { formatDate, formatDateTime } from "@/lib/format/dates";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getItemHistory } from "@/lib/server/samples/get-item-history";
import { getCoupon } from "@/lib/server/samples/get-sample-item";
import { listStorageLocations } from "@/lib/server/samples/list-storage-locations";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

type Props = { params: Promise<{ labNumber: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Coupon ${(await params).labNumber}` };
}

export default async function CouponPage({ params }: Props) {
  const actor = await requirePageUser("sample.view");
  const zone = await getLabTimeZone();
  const { labNumber } = await params;
  const coupon = await getCoupon({ actor, labNumber }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const [history, locations] = await Promise.all([getItemHistory({ actor, kind: "coupon", id: coupon.id }), listStorageLocations({ actor, activeOnly: true })]);
  return (
    <>
      <div className="page-head">
        <div>
          <h1>Coupon <span className="mono">{coupon.labNumber}</span> <StateTag state={coupon.state} /></h1>
          <p className="muted">From roll <Link className="mono" href={`/samples/rolls/${coupon.roll.labNumber}`}>{coupon.roll.labNumber}</Link> ({coupon.roll.rollNumber}) · {coupon.roll.project.name}</p>
        </div>
        <div className="links"><Link className="button button-quiet" href={`/labels?numbers=${[coupon.labNumber, ...coupon.specimens.map((s) => s.labNumber)].join(",")}`}>Labels</Link></div>
      </div>
      <div className="stack-gap">
        <section className="card">
          <RecordFacts facts={[
            ["Position in the roll sample", coupon.positionInSample], ["Size (mm)", `${coupon.lengthMm} × ${coupon.widthMm}`],
            ["Cut for", coupon.intendedMethodCode && isIndexMethodCode(coupon.intendedMethodCode) ? INDEX_METHODS[coupon.intendedMethodCode].title : "specimens for a hydraulic test"],
            ["Cut by", coupon.cutBy.name], ["Cut at", formatDateTime(coupon.cutAt, zone)],
            ["Kept at", coupon.storageLocation ? `${coupon.storageLocation.code} · ${coupon.storageLocation.name}` : "—"], ["Retained until", formatDate(coupon.retainUntil, zone)],
          ]} />
          {can(actor.role, "sample.move") && <ItemCustodyActions kind="coupon" id={coupon.id} version={coupon.version} labNumber={coupon.labNumber} currentLocationId={coupon.storageLocationId} locations={locations} />}
        </section>
        <div className="grid">
          <section className="card">
            <h2>Specimens <span className="count">{coupon.specimens.length}</span></h2>
            {coupon.specimens.length === 0 ? <p className="empty">No specimen prepared yet.</p> : (
              <table className="list" data-testid="coupon-specimens">
                <thead><tr><th>Specimen</th><th>Method</th><th>Prepared</th><th>State</th></tr></thead>
                <tbody>{coupon.specimens.map((s) => (
                  <tr key={s.id}><td><Link className="mono" href={`/samples/specimens/${s.labNumber}`}>{s.labNumber}</Link></td><td>ASTM {s.intendedMethodCode}</td><td>{formatDate(s.preparedAt, zone)}</td><td><StateTag state={s.state} /></td></tr>
                ))}</tbody>
              </table>
            )}
          </section>
          {coupon.indexTests.length > 0 && (
            <section className="card">
              <h2>Index tests on this coupon</h2>
              <ul>{coupon.indexTests.map((t) => <li key={t.id}><Link href={`/index-tests/${t.id}`}>{isIndexMethodCode(t.methodCode) ? INDEX_METHODS[t.methodCode].title : t.methodCode}</Link>, {formatDateTime(t.testedAt, zone)}</li>)}</ul>
            </section>
          )}
          {can(actor.role, "run.operate") && coupon.state === "CUT" && coupon.intendedMethodCode && isIndexMethodCode(coupon.intendedMethodCode) && (
            <section className="card"><h2>Test it</h2><p><Link className="button" href={`/index-tests/new/${coupon.roll.labNumber}/${coupon.intendedMethodCode}`}>Record the {INDEX_METHODS[coupon.intendedMethodCode].title}</Link></p></section>
          )}
          {can(actor.role, "sample.cut") && coupon.state === "CUT" && !coupon.intendedMethodCode && (
            <section className="card"><h2>Prepare a specimen</h2><PrepareSpecimenForm zone={zone} couponId={coupon.id} locations={locations} /></section>
          )}
        </div>
        <section className="card"><h2>Custody ledger</h2><CustodyLedger zone={zone} events={history.events} /></section>
      </div>
    </>
  );
}
