import { QueueCard } from "@/components/ui/queue-card";

/** A queue card holding a list table: one heading per column, one row per item (each row carries its own key). */
export function QueueTable<T>({ title, empty, testId, headings, items, row }: {
  title: string; empty: string; testId?: string; headings: readonly string[]; items: readonly T[]; row: (item: T) => React.ReactNode;
}) {
  return (
    <QueueCard title={title} count={items.length} empty={empty} testId={testId}>
      <table className="list">
        <thead><tr>{headings.map((h) => <th key={h}>{h}</th>)}</tr></thead>
        <tbody>{items.map((item) => row(item))}</tbody>
      </table>
    </QueueCard>
  );
}
