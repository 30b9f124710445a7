import { ScrollArea } from "@/components/ui/scroll-area";

/** A titled card holding one work queue; says so plainly when the queue is empty. */
export function QueueCard({ title, count, empty, children, testId }: { title: string; count: number; empty: string; children: React.ReactNode; testId?: string }) {
  return (
    <section className="card" data-testid={testId}>
      <h2>
        {title} <span className="count">{count === 0 ? "none" : `${count} shown`}</span>
      </h2>
      {count === 0 ? <p className="empty">{empty}</p> : <ScrollArea>{children}</ScrollArea>}
    </section>
  );
}
