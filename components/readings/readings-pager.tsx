import Link from "next/link";
import styles from "@/components/lists/lists.module.css";

type Window = { page: number; pageCount: number; pageSize: number; total: number; first: number };

/** First, previous, next and last page of a run's readings, with which readings are shown. */
export function ReadingsPager({ window, basePath }: { window: Window; basePath: string }) {
  const href = (page: number) => `${basePath}?readings=${page}#readings`;
  const last = Math.min(window.first + window.pageSize - 1, window.total);
  const link = (page: number, label: string, rel?: string) =>
    page >= 1 && page <= window.pageCount && page !== window.page ? <Link href={href(page)} rel={rel} scroll={false}>{label}</Link> : <span className={styles.disabled}>{label}</span>;
  return (
    <div className={styles.pager} data-testid="readings-pager">
      <span className="muted">Readings {window.first.toLocaleString("en-GB")}–{last.toLocaleString("en-GB")} of {window.total.toLocaleString("en-GB")}, by elapsed time</span>
      <nav aria-label="Pages of readings">
        {link(1, "« first")}
        {link(window.page - 1, "‹ earlier", "prev")}
        <span>page {window.page.toLocaleString("en-GB")} of {window.pageCount.toLocaleString("en-GB")}</span>
        {link(window.page + 1, "later ›", "next")}
        {link(window.pageCount, "latest »")}
      </nav>
    </div>
  );
}

/** The page of readings an address asks for (?readings=3); anything else shows the latest. */
export function readingsPageOf(search: { readings?: string | string[] } | undefined): { page?: number } {
  const text = Array.isArray(search?.readings) ? search.readings[0] : search?.readings;
  const page = Number(text);
  return text && Number.isInteger(page) && page >= 1 ? { page } : {};
}
