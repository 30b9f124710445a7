import Link from "next/link";
import { RunTable } from "@/components/runs/run-table";
import { QueueCard } from "@/components/ui/queue-card";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listRuns } from "@/lib/server/runs/list-runs";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Runs" };

// A technician sees their own runs first; QA and everyone else see all of them.
export default async function RunsPage({ searchParams }: { searchParams: Promise<{ all?: string }> }) {
  const actor = await requirePageUser("run.view");
  const zone = await getLabTimeZone();
  const operates = can(actor.role, "run.operate");
  const mine = operates && (await searchParams).all !== "1";
  const runs = await listRuns({ actor, mine });
  return (
    <>
      <div className="page-head">
        <div>
          <h1>{mine ? "My runs" : "Runs"}</h1>
          <p className="muted">Hydraulic tests, newest first. {operates && (mine ? <Link href="/runs?all=1">Show everyone&apos;s runs</Link> : <Link href="/runs">Show only mine</Link>)}</p>
        </div>
        {operates && <div className="links"><Link className="button" href="/runs/new">Start a run</Link></div>}
      </div>
      <QueueCard title={mine ? "My runs" : "Runs"} count={runs.length} empty="No run here yet." testId="run-list"><RunTable zone={zone} runs={runs} /></QueueCard>
    </>
  );
}
