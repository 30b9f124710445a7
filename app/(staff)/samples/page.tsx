import { QueueCard } from "@/components/ui/queue-card";
import { StateTag } from "@/components/ui/state-tag";
import { requirePageUser } from "@/lib/server/auth/require-permission";
import { listRolls } from "@/lib/server/samples/list-rolls";

export const metadata = { title: "Samples" };

export default async function SamplesPage() {
  const actor = await requirePageUser("sample.view");
  const rolls = await listRolls({ actor });
  return (
    <>
      <h1>Samples</h1>
      <p className="muted">Rolls in the laboratory's custody, newest first.</p>
      <QueueCard title="Rolls" count={rolls.length} empty="No roll has been received yet." testId="roll-list">
        <table className="list">
          <thead><tr><th>Lab number</th><th>Roll / lot</th><th>Client / project</th><th>Product</th><th>Coupons</th><th>Where</th><th>State</th></tr></thead>
          <tbody>
            {rolls.map((r) => (
              <tr key={r.id}>
                <td className="mono">{r.labNumber}</td>
                <td>{r.rollNumber}<div className="muted">lot {r.lotNumber}</div></td>
                <td>{r.project.clientOrganization.name}<div className="muted">{r.project.name}</div></td>
                <td>{r.product}</td>
                <td>{r._count.coupons}</td>
                <td className="mono">{r.storageLocation?.code ?? "—"}</td>
                <td><StateTag state={r.state} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </QueueCard>
    </>
  );
}
