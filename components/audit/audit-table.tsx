import Link from "next/link";
import type { AuditEntry } from "@/lib/audit/audit-entry";
import type { AuditChange } from "@/lib/audit/describe-audit-change";
import { formatAuditTime } from "@/lib/audit/format-audit-value";
import styles from "./audit.module.css";

// An added row lists many values; past this many they fold away behind a count.
const OPEN_UP_TO = 6;

function Change({ change }: { change: AuditChange }) {
  return (
    <li>
      <span className={styles.label}>{change.label}:</span>{" "}
      {change.old !== null && <span className={change.new !== null ? styles.old : undefined}>{change.old}</span>}
      {change.old !== null && change.new !== null && <span className={styles.arrow} aria-label="changed to"> → </span>}
      {change.new !== null && <span className={change.old !== null ? styles.new : undefined}>{change.new}</span>}
      {change.new === null && <span className={styles.label}> (removed)</span>}
    </li>
  );
}

function Changes({ changes }: { changes: AuditChange[] }) {
  if (changes.length === 0) return <span className="muted">no values shown</span>;
  const list = <ul className={styles.changes}>{changes.map((c) => <Change key={c.field} change={c} />)}</ul>;
  const isEdit = changes.some((c) => c.old !== null && c.new !== null);
  if (isEdit || changes.length <= OPEN_UP_TO) return list;
  return (
    <details>
      <summary>{changes.length} values</summary>
      {list}
    </details>
  );
}

/** Audit entries newest first: when, who, which record (linked), what was done, which values changed. */
export function AuditTable({ entries }: { entries: AuditEntry[] }) {
  return (
    <table className="list" data-testid="audit-table">
      <thead><tr><th>When (UTC)</th><th>Who</th><th>Record</th><th>What</th><th>Values</th></tr></thead>
      <tbody>
        {entries.map((e) => (
          <tr key={e.id} data-entry={e.id}>
            <td className={styles.when}>{formatAuditTime(e.occurredAt).replace(" UTC", "")}</td>
            <td>{e.person}</td>
            <td>
              {e.record ? e.record.href ? <Link className="mono" href={e.record.href}>{e.record.text}</Link> : <span>{e.record.text}</span> : <span className="muted">—</span>}
              {e.part && <div className="muted">{e.part}</div>}
            </td>
            <td>{e.kind} {e.operation}</td>
            <td><Changes changes={e.changes} /></td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
