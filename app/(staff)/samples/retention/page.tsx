import { SampleTabs } from "@/components/lists/sample-tabs";
import { DisposeForm } from "@/components/samples/dispose-form";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listRetentionDue } from "@/lib/server/samples/list-retention-due";

export const metadata = { title: "Retention" };

export default async function RetentionPage() {
  const actor = await requirePageUser("sample.view");
  const due = await listRetentionDue({ actor });
  const items = due.map((d) => ({ kind: d.kind, id: d.id, labNumber: d.labNumber, retainUntil: d.retainUntil, place: d.storageLocation?.code ?? "—" }));
  return (
    <>
      <h1>Retention ended</h1>
      <SampleTabs current="retention" />
      <p className="muted">Retained items whose retention period is over. Disposal is recorded for each item; nothing is deleted from the records.</p>
      <section className="card">
        {items.length === 0 ? <p className="empty">No retained item is due for disposal.</p> : can(actor.role, "sample.move") ? <DisposeForm items={items} /> : <p>{items.length} items are due; the intake clerk or a technician disposes of them.</p>}
      </section>
    </>
  );
}
