import { formatDate } from "@/lib/format/dates";
import type { PortalProject } from "@/lib/server/portal/get-portal-project";
import { ScrollArea } from "@/components/ui/scroll-area";

/** Shipments of the project with their receipt acknowledgements (the PDF route checks the organisation again). */
export function ProjectShipments({ shipments, zone = "UTC" }: { shipments: PortalProject["shipments"]; zone?: string }) {
  if (shipments.length === 0) return <p className="empty">No shipment of this project has arrived yet.</p>;
  return (
    <ScrollArea>
      <table className="list" data-testid="portal-shipments">
        <thead><tr><th>Shipment</th><th>Received</th><th>Rolls</th><th>Receipt</th><th><span className="visually-hidden">Receipt document</span></th></tr></thead>
        <tbody>
          {shipments.map((s) => (
            <tr key={s.labNumber}>
              <td className="mono">{s.labNumber}</td>
              <td>{formatDate(s.receivedAt, zone)}</td>
              <td>{s.rollCount}</td>
              <td>{s.acknowledgedAt ? `acknowledged ${formatDate(s.acknowledgedAt, zone)}` : <span className="state state-warn">not yet acknowledged</span>}</td>
              <td><a href={`/api/shipments/${encodeURIComponent(s.labNumber)}/receipt`} download>Receipt (PDF)</a></td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollArea>
  );
}
