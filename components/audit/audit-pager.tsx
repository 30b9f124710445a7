import Link from "next/link";
import { auditSearch, type AuditFilterText } from "@/lib/validation/audit";
import styles from "./audit.module.css";

/** « newest · « newer · older »: keyset links that keep the filter; no page numbers, since none are counted. */
export function AuditPager({ filter, pageSize, newer, older, paged }: { filter: AuditFilterText; pageSize: number; newer: string | null; older: string | null; paged: boolean }) {
  const href = (cursor: { before?: string; after?: string }) => `/admin/audit${auditSearch(filter, { ...cursor, pageSize })}`;
  return (
    <div className={styles.pager}>
      <span className="muted">Newest first; up to {pageSize} changes a page.</span>
      <nav aria-label="Pages">
        {paged ? <Link href={href({})}>« newest</Link> : <span className={styles.disabled}>« newest</span>}
        {newer ? <Link href={href({ after: newer })} rel="prev">‹ newer</Link> : <span className={styles.disabled}>‹ newer</span>}
        {older ? <Link href={href({ before: older })} rel="next">older ›</Link> : <span className={styles.disabled}>older ›</span>}
      </nav>
    </div>
  );
}
