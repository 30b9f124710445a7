import styles from "./lists.module.css";
import { ScrollArea } from "@/components/ui/scroll-area";

/** A list's card: title with the total found, the table (or a plain sentence when nothing matches), the pager. */
export function ListCard({ title, total, empty, testId, actions, pager, children }: { title: string; total: number; empty: string; testId: string; actions?: React.ReactNode; pager: React.ReactNode; children: React.ReactNode }) {
  return (
    <section className="card" data-testid={testId}>
      <div className={styles.head}>
        <h2>
          {title} <span className="count">{total === 0 ? "none" : `${total.toLocaleString("en-GB")} found`}</span>
        </h2>
        {actions}
      </div>
      {total === 0 ? <p className="empty">{empty}</p> : <ScrollArea>{children}</ScrollArea>}
      {pager}
    </section>
  );
}
