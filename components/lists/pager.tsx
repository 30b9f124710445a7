import Link from "next/link";
import { listQueryToSearch, type ListKind, type ListQuery } from "@/lib/validation/list-query";
import styles from "./lists.module.css";

/** « previous · page x of y · next », with the total count of what the filters found. */
export function Pager({ kind, query, total, pageCount, basePath, noun }: { kind: ListKind; query: ListQuery; total: number; pageCount: number; basePath: string; noun: string }) {
  const href = (page: number) => `${basePath}${listQueryToSearch(kind, { ...query, page })}`;
  const first = total === 0 ? 0 : Math.min((query.page - 1) * query.pageSize + 1, total + 1);
  const last = Math.min(query.page * query.pageSize, total);
  return (
    <div className={styles.pager}>
      <span className="muted" data-testid="list-total">
        {total === 0 ? `No ${noun} found` : first > total ? `${total.toLocaleString("en-GB")} ${noun}; this page is past the end` : `${first.toLocaleString("en-GB")}–${last.toLocaleString("en-GB")} of ${total.toLocaleString("en-GB")} ${noun}`}
      </span>
      <nav aria-label="Pages">
        {query.page > 1 ? <Link href={href(Math.min(query.page - 1, pageCount))} rel="prev">« previous</Link> : <span className={styles.disabled}>« previous</span>}
        <span>page {query.page.toLocaleString("en-GB")} of {pageCount.toLocaleString("en-GB")}</span>
        {query.page < pageCount ? <Link href={href(query.page + 1)} rel="next">next »</Link> : <span className={styles.disabled}>next »</span>}
      </nav>
    </div>
  );
}
