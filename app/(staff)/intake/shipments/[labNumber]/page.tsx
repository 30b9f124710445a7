import Link from "next/link";
import { notFound } from "next/navigation";
import { AcknowledgeButton } from "@/components/intake/acknowledge-button";
import { CorrectionForm } from "@/components/intake/correction-form";
import { CorrectionHistory } from "@/components/custody/correction-history";
import { GenealogyTree } from "@/components/custody/genealogy-tree";
import { RecordFacts } from "@/components/samples/record-facts";
import { StateTag } from "@/components/ui/state-tag";
import { isAppError } from "@/lib/errors/app-error";
import { formatDateTime } from "@/lib/format/dates";
import { RECEIPT_FIELD_LABELS, receiptFieldValue } from "@/lib/format/receipt-fields";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getGenealogy } from "@/lib/server/samples/get-genealogy";
import { getShipment } from "@/lib/server/samples/get-sample-item";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";
import { ScrollArea } from "@/components/ui/scroll-area";

type Props = { params: Promise<{ labNumber: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Shipment ${(await params).labNumber}` };
}

export default async function ShipmentPage({ params }: Props) {
  const actor = await requirePageUser("shipment.view");
  const zone = await getLabTimeZone();
  const { labNumber } = await params;
  const [shipment, genealogy] = await Promise.all([getShipment({ actor, labNumber }), getGenealogy({ actor, shipmentLabNumber: labNumber })]).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const rollLabel = new Map(shipment.rolls.map((r) => [r.id, r.labNumber]));
  const labelNumbers = shipment.rolls.map((r) => r.labNumber).join(",");
  return (
    <>
      <div className="page-head">
        <div>
          <h1>Shipment <span className="mono">{shipment.labNumber}</span></h1>
          <p className="muted">{shipment.clientOrganization.name} · {shipment.project.name} · {shipment.project.siteName}</p>
        </div>
        <div className="links">
          <Link className="button button-quiet" href={`/labels?numbers=${labelNumbers}`}>Labels for all rolls</Link>
          <Link className="button button-quiet" href={`/intake/shipments/${shipment.labNumber}/receipt`}>Receipt</Link>
          {!shipment.acknowledgedAt && can(actor.role, "shipment.acknowledge") && <AcknowledgeButton shipmentId={shipment.id} version={shipment.version} />}
        </div>
      </div>
      <div className="stack-gap">
        <section className="card">
          <RecordFacts facts={[
            ["Received", formatDateTime(shipment.receivedAt, zone)],
            ["Received by", shipment.receivedBy.name],
            ["Delivered by", shipment.deliveredBy],
            ["Receipt", shipment.acknowledgedAt ? <span data-testid="receipt-status">acknowledged {formatDateTime(shipment.acknowledgedAt, zone)} by {shipment.acknowledgedBy?.name}</span> : <span data-testid="receipt-status" className="state state-warn">not yet acknowledged</span>],
            ["Condition on arrival", shipment.conditionNotes || "—"],
          ]} />
        </section>
        <section className="card">
          <h2>Rolls <span className="count">{shipment.rolls.length}</span></h2>
          <ScrollArea>
            <table className="list" data-testid="shipment-rolls">
              <thead><tr><th>Lab number</th><th>Roll</th><th>Lot</th><th>Product</th><th>Manufacturer</th><th>Size (mm)</th><th>MD marked</th><th>Condition</th><th>State</th></tr></thead>
              <tbody>
                {shipment.rolls.map((r) => (
                  <tr key={r.id}>
                    <td><Link className="mono" href={`/samples/rolls/${r.labNumber}`}>{r.labNumber}</Link></td><td>{r.rollNumber}</td><td>{r.lotNumber}</td><td>{r.product}</td><td>{r.manufacturer}</td>
                    <td>{r.sampleLengthMm && r.sampleWidthMm ? `${r.sampleLengthMm} × ${r.sampleWidthMm}` : "—"}</td><td>{r.machineDirectionMarked ? "yes" : "no"}</td><td>{r.conditionNotes || <span className="muted">as the shipment</span>}</td><td><StateTag state={r.state} /></td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollArea>
        </section>
        <div className="grid">
          <section className="card">
            <h2>From shipment to specimens</h2>
            <GenealogyTree genealogy={genealogy} />
          </section>
          <section className="card">
            <h2>Corrections</h2>
            <CorrectionHistory zone={zone} corrections={shipment.corrections.map((c) => ({
              ...c, itemLabel: c.entity === "Roll" ? (rollLabel.get(c.entityId) ?? "roll") : "shipment", field: RECEIPT_FIELD_LABELS[c.field] ?? c.field,
              oldValue: receiptFieldValue(c.field, c.oldValue, zone), newValue: receiptFieldValue(c.field, c.newValue, zone),
            }))} />
            {can(actor.role, "shipment.correct") && (
              <>
                <h2 style={{ marginTop: "1rem" }}>Correct this receipt</h2>
                <CorrectionForm targets={[
                  { key: "shipment", target: "shipment", id: shipment.id, version: shipment.version, label: `Shipment ${shipment.labNumber}` },
                  ...shipment.rolls.map((r) => ({ key: r.id, target: "roll" as const, id: r.id, version: r.version, label: `Roll ${r.labNumber} (${r.rollNumber})` })),
                ]} />
              </>
            )}
          </section>
        </div>
      </div>
    </>
  );
}
