import Link from "next/link";
import { notFound } from "next/navigation";
import { ConformanceMatrixTable } from "@/components/conformance/conformance-matrix-table";
import { CorrectionHistory } from "@/components/custody/correction-history";
import { CustodyLedger } from "@/components/custody/custody-ledger";
import { ItemCustodyActions } from "@/components/custody/item-custody-actions";
import { CutCouponForm } from "@/components/samples/cut-coupon-form";
import { RecordFacts } from "@/components/samples/record-facts";
import { StateTag } from "@/components/ui/state-tag";
import { isAppError } from "@/lib/errors/app-error";
import { formatDate, formatDateTime } from "@/lib/format/dates";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getItemHistory } from "@/lib/server/samples/get-item-history";
import { getRoll } from "@/lib/server/samples/get-sample-item";
import { listStorageLocations } from "@/lib/server/samples/list-storage-locations";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";
import { getRollConformance } from "@/lib/server/conformance/get-project-conformance";
import { listRollIndexTests } from "@/lib/server/index-tests/list-roll-index-tests";
import { INDEX_METHODS, isIndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { formatResultValue } from "@/lib/results/format-result";

type Props = { params: Promise<{ labNumber: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Roll ${(await params).labNumber}` };
}

export default async function RollPage({ params }: Props) {
  const actor = await requirePageUser("sample.view");
  const zone = await getLabTimeZone();
  const { labNumber } = await params;
  const roll = await getRoll({ actor, labNumber }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const [history, locations, conformance, indexTests] = await Promise.all([
    getItemHistory({ actor, kind: "roll", id: roll.id }), listStorageLocations({ actor, activeOnly: true }),
    getRollConformance({ actor, rollId: roll.id }), listRollIndexTests({ actor, rollId: roll.id }),
  ]);
  const waiting = conformance.waiting.get(roll.id) ?? [];
  const waitingMethods = [...new Set(waiting.map((w) => w.methodCode))];
  return (
    <>
      <div className="page-head">
        <div>
          <h1>Roll <span className="mono">{roll.labNumber}</span> <StateTag state={roll.state} /></h1>
          <p className="muted">{roll.project.clientOrganization.name} · <Link href={`/projects/${roll.project.code}`}>{roll.project.name}</Link> · shipment <Link className="mono" href={`/intake/shipments/${roll.shipment.labNumber}`}>{roll.shipment.labNumber}</Link></p>
        </div>
        <div className="links"><Link className="button button-quiet" href={`/labels?numbers=${roll.labNumber}`}>Label</Link></div>
      </div>
      <div className="stack-gap">
        <section className="card">
          <RecordFacts facts={[
            ["Roll number", roll.rollNumber], ["Lot number", roll.lotNumber], ["Product", roll.product], ["Manufacturer", roll.manufacturer],
            ["Sample size (mm)", roll.sampleLengthMm && roll.sampleWidthMm ? `${roll.sampleLengthMm} × ${roll.sampleWidthMm}` : "—"],
            ["Machine direction marked", roll.machineDirectionMarked ? "yes" : "no"], ["Received", formatDateTime(roll.shipment.receivedAt, zone)],
            ["Condition on arrival", roll.conditionNotes || roll.shipment.conditionNotes || "—"],
            ["Kept at", roll.storageLocation ? `${roll.storageLocation.code} · ${roll.storageLocation.name}` : "—"],
            ["Retained until", formatDate(roll.retainUntil, zone)],
            ["Delivered roll (m)", roll.deliveredLengthM && roll.deliveredWidthM ? `${roll.deliveredLengthM} × ${roll.deliveredWidthM} (${(roll.deliveredLengthM * roll.deliveredWidthM).toLocaleString("en-GB")} m²)` : "—"],
          ]} />
          {can(actor.role, "sample.move") && <ItemCustodyActions kind="roll" id={roll.id} version={roll.version} labNumber={roll.labNumber} currentLocationId={roll.storageLocationId} locations={locations} />}
        </section>
        <div className="grid">
          <section className="card">
            <h2>Coupons <span className="count">{roll.coupons.length}</span></h2>
            {roll.coupons.length === 0 ? <p className="empty">No coupon cut yet.</p> : (
              <table className="list" data-testid="roll-coupons">
                <thead><tr><th>Coupon</th><th>For</th><th>Position</th><th>Cut</th><th>Specimens</th><th>State</th></tr></thead>
                <tbody>{roll.coupons.map((c) => (
                  <tr key={c.id}><td><Link className="mono" href={`/samples/coupons/${c.labNumber}`}>{c.labNumber}</Link></td><td>{c.intendedMethodCode && isIndexMethodCode(c.intendedMethodCode) ? INDEX_METHODS[c.intendedMethodCode].title : "specimens"}</td><td>{c.positionInSample}</td><td>{formatDate(c.cutAt, zone)}</td><td>{c._count.specimens}</td><td><StateTag state={c.state} /></td></tr>
                ))}</tbody>
              </table>
            )}
          </section>
          {can(actor.role, "sample.cut") && (
            <section className="card"><h2>Cut a coupon</h2><CutCouponForm zone={zone} rollId={roll.id} rollVersion={roll.version} locations={locations} /></section>
          )}
        </div>
        <section className="card" data-testid="roll-conformance">
          <h2>Conformance to {conformance.specificationName ?? "the project's specification"}</h2>
          <ConformanceMatrixTable limits={conformance.limits} rows={conformance.rows} />
        </section>
        <section className="card">
          <h2>Index tests <span className="count">{indexTests.length}</span></h2>
          {waiting.length > 0 && <p data-testid="index-tests-waiting">Waiting for this roll: {waitingMethods.map((code) => INDEX_METHODS[code as keyof typeof INDEX_METHODS].title).join(", ")}.</p>}
          {indexTests.length === 0 ? <p className="empty">No index test recorded yet.</p> : (
            <table className="list" data-testid="roll-index-tests">
              <thead><tr><th>Test</th><th>Result</th><th>Tested</th><th>By</th><th>State</th></tr></thead>
              <tbody>{indexTests.map((t) => (
                <tr key={t.id}>
                  <td><Link href={`/index-tests/${t.id}`}>{isIndexMethodCode(t.methodCode) ? INDEX_METHODS[t.methodCode].title : t.methodCode}</Link></td>
                  <td className="mono">{formatResultValue(t.value, t.unit, { significantDigits: 3 })}</td>
                  <td>{formatDateTime(t.testedAt, zone)}</td><td>{t.performedBy.name}</td>
                  <td><StateTag state={t.state} kind="run" />{t.correctedBy && <span className="muted"> (redone)</span>}</td>
                </tr>
              ))}</tbody>
            </table>
          )}
          {can(actor.role, "run.operate") && (
            <p className="links">Record: {Object.values(INDEX_METHODS).map((m) => (
              <Link key={m.code} className={`button ${waitingMethods.includes(m.code) ? "" : "button-quiet"}`} href={`/index-tests/new/${roll.labNumber}/${m.code}`}>{m.title}</Link>
            ))}</p>
          )}
        </section>
        <section className="card"><h2>Custody ledger</h2><CustodyLedger zone={zone} events={history.events} /></section>
        <section className="card"><h2>Corrections</h2><CorrectionHistory zone={zone} corrections={history.corrections} /></section>
      </div>
    </>
  );
}
