import Link from "next/link";
import { listQueryToSearch, type ListKind, type ListQuery } from "@/lib/validation/list-query";
import styles from "./lists.module.css";

/** A column heading that sorts the list by its column; a second click turns the direction round. */
export function SortHeader({ label, column, kind, query, basePath }: { label: string; column: string; kind: ListKind; query: ListQuery; basePath: string }) {
  const active = query.sort === column;
  // A new column starts from its natural direction (dates newest first), so leave dir to the default.
  const next = active ? { ...query, page: 1, dir: query.dir === "asc" ? "desc" : "asc" } : { ...query, page: 1, sort: column, dir: undefined };
  const href = `${basePath}${listQueryToSearch(kind, next as Partial<ListQuery>)}`;
  return (
    <th aria-sort={active ? (query.dir === "asc" ? "ascending" : "descending") : undefined}>
      <Link className={styles.sort} href={href} title={`Sort by ${label.toLowerCase()}`}>
        {label}
        {active && <span className={styles.arrow} aria-hidden>{query.dir === "asc" ? "▲" : "▼"}</span>}
      </Link>
    </th>
  );
}
