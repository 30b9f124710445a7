import { RunTable } from "@/components/runs/run-table";
import { QueueCard } from "@/components/ui/queue-card";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listRuns } from "@/lib/server/runs/list-runs";

export const metadata = { title: "Runs" };

export default async function RunsPage() {
  const actor = await requirePageUser("run.view");
  const runs = await listRuns({ actor });
  return (
    <>
      <h1>Runs</h1>
      <p className="muted">Hydraulic tests, newest first.</p>
      <QueueCard title="Runs" count={runs.length} empty="No run has been started yet." testId="run-list"><RunTable runs={runs} /></QueueCard>
    </>
  );
}
