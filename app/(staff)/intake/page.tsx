import { QueueCard } from "@/components/ui/queue-card";
import { formatDateTime } from "@/lib/format/dates";
import { requirePageUser } from "@/lib/server/auth/require-permission";
import { listShipments } from "@/lib/server/intake/list-shipments";

export const metadata = { title: "Intake" };

export default async function IntakePage() {
  const actor = await requirePageUser("shipment.view");
  const shipments = await listShipments({ actor });
  return (
    <>
      <h1>Intake</h1>
      <p className="muted">Shipments as they arrived at the door, newest first.</p>
      <QueueCard title="Shipments" count={shipments.length} empty="No shipment has been logged yet." testId="shipment-list">
        <table className="list">
          <thead><tr><th>Shipment</th><th>Client / project</th><th>Received</th><th>Delivered by</th><th>Rolls</th><th>Receipt</th></tr></thead>
          <tbody>
            {shipments.map((s) => (
              <tr key={s.id}>
                <td className="mono">{s.labNumber}</td>
                <td>{s.clientOrganization.name}<div className="muted">{s.project.name}</div></td>
                <td>{formatDateTime(s.receivedAt)}</td>
                <td>{s.deliveredBy}<div className="muted">{s.conditionNotes}</div></td>
                <td>{s._count.rolls}</td>
                <td>{s.acknowledgedAt ? <span className="state state-ok">acknowledged</span> : <span className="state state-warn">to acknowledge</span>}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </QueueCard>
    </>
  );
}
