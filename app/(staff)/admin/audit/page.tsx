import { QueueCard } from "@/components/ui/queue-card";
import { formatDateTime } from "@/lib/format/dates";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listAuditEntries } from "@/lib/server/audit/list-audit-entries";

export const metadata = { title: "Audit trail" };

function changedFields(before: unknown, after: unknown): string {
  if (!before || !after || typeof before !== "object" || typeof after !== "object") return "";
  const b = before as Record<string, unknown>;
  const a = after as Record<string, unknown>;
  return Object.keys(a).filter((k) => k !== "updatedAt" && JSON.stringify(a[k]) !== JSON.stringify(b[k])).join(", ");
}

export default async function AuditPage() {
  const actor = await requirePageUser("audit.view");
  const entries = await listAuditEntries({ actor });
  return (
    <>
      <h1>Audit trail</h1>
      <p className="muted">Every insert, update and delete on the record tables, written by the database itself. These rows cannot be changed or removed.</p>
      <QueueCard title="Latest changes" count={entries.length} empty="No change recorded yet." testId="audit-list">
        <table className="list">
          <thead><tr><th>When</th><th>Who</th><th>Table</th><th>Change</th><th>Fields changed</th></tr></thead>
          <tbody>
            {entries.map((e) => (
              <tr key={e.id}>
                <td>{formatDateTime(e.occurredAt)}</td><td>{e.actorName}</td><td className="mono">{e.tableName}</td>
                <td>{e.operation.toLowerCase()}</td><td className="muted">{e.operation === "UPDATE" ? changedFields(e.before, e.after) : ""}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </QueueCard>
    </>
  );
}
