import { formatDateTime } from "@/lib/format/dates";
import { ITEM_STATE_LABELS } from "@/lib/format/states";
import { ScrollArea } from "@/components/ui/scroll-area";

type Event = {
  id: string; action: string; fromState: string | null; toState: string | null; occurredAt: Date; note: string;
  actor: { name: string }; fromLocation: { code: string } | null; toLocation: { code: string } | null;
};

const ACTION_LABELS: Record<string, string> = {
  RECEIVED: "Received", STORED: "Stored", MOVED: "Moved", CUT: "Cut", PREPARED: "Prepared", ASSIGNED: "Assigned to a cell",
  TEST_STARTED: "Test started", TESTED: "Tested", RETAINED: "Retained", DISPOSED: "Disposed of", CORRECTED: "Corrected", WITHDRAWN: "Taken out of its cell",
};

const state = (s: string | null) => (s ? (ITEM_STATE_LABELS[s] ?? s) : "—");

/** Every custody event of one item: what, who, when, where, and from which state to which. */
export function CustodyLedger({ events, zone = "UTC" }: { events: Event[]; zone?: string }) {
  if (events.length === 0) return <p className="empty">No custody event recorded.</p>;
  return (
    <ScrollArea>
      <table className="list" data-testid="custody-ledger">
        <thead><tr><th>When</th><th>Event</th><th>By</th><th>From → to</th><th>Where</th><th>Note</th></tr></thead>
        <tbody>
          {events.map((e) => (
            <tr key={e.id}>
              <td>{formatDateTime(e.occurredAt, zone)}</td>
              <td>{ACTION_LABELS[e.action] ?? e.action}</td>
              <td>{e.actor.name}</td>
              <td>{state(e.fromState)} → {state(e.toState)}</td>
              <td className="mono">{e.fromLocation && e.toLocation && e.fromLocation.code !== e.toLocation.code ? `${e.fromLocation.code} → ${e.toLocation.code}` : (e.toLocation?.code ?? e.fromLocation?.code ?? "—")}</td>
              <td className="muted">{e.note}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollArea>
  );
}
