import { RunTable } from "@/components/runs/run-table";
import { QueueCard } from "@/components/ui/queue-card";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listRuns } from "@/lib/server/runs/list-runs";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Review" };

export default async function ReviewPage() {
  const actor = await requirePageUser("run.review");
  const zone = await getLabTimeZone();
  const runs = await listRuns({ actor, states: ["SUBMITTED"] });
  return (
    <>
      <h1>Review</h1>
      <p className="muted">Runs submitted by technicians and waiting for a QA decision. You cannot approve a run you performed.</p>
      <QueueCard title="Awaiting review" count={runs.length} empty="Nothing is waiting for review." testId="review-list"><RunTable zone={zone} runs={runs} linkTo="review" /></QueueCard>
    </>
  );
}
