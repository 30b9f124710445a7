import { formatDateTime } from "@/lib/format/dates";
import { ScrollArea } from "@/components/ui/scroll-area";

type CorrectionRow = { id: string; field: string; oldValue: string; newValue: string; reason: string; createdAt: Date; actor: { name: string }; itemLabel?: string };

/** Changes made after the record was first saved: the old value stays visible beside the new one. */
export function CorrectionHistory({ corrections, zone = "UTC" }: { corrections: CorrectionRow[]; zone?: string }) {
  if (corrections.length === 0) return <p className="empty">No correction has been made.</p>;
  return (
    <ScrollArea>
      <table className="list" data-testid="correction-history">
        <thead><tr><th>When</th><th>By</th><th>What</th><th>Was</th><th>Now</th><th>Why</th></tr></thead>
        <tbody>
          {corrections.map((c) => (
            <tr key={c.id}>
              <td>{formatDateTime(c.createdAt, zone)}</td><td>{c.actor.name}</td><td>{c.itemLabel ? `${c.itemLabel} · ` : ""}{c.field}</td>
              <td><del>{c.oldValue || "—"}</del></td><td>{c.newValue || "—"}</td><td>{c.reason}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollArea>
  );
}
