import Link from "next/link";
import { RunTable } from "@/components/runs/run-table";
import { QueueCard } from "@/components/ui/queue-card";
import { formatDateTime } from "@/lib/format/dates";
import { INDEX_METHODS, isIndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { formatResultValue } from "@/lib/results/format-result";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listIndexTestsForReview } from "@/lib/server/index-tests/list-index-tests-for-review";
import { listRuns } from "@/lib/server/runs/list-runs";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Review" };

export default async function ReviewPage() {
  const actor = await requirePageUser("run.review");
  const zone = await getLabTimeZone();
  const [runs, indexTests] = await Promise.all([listRuns({ actor, states: ["SUBMITTED"] }), listIndexTestsForReview({ actor })]);
  return (
    <>
      <h1>Review</h1>
      <p className="muted">Runs and index tests recorded by technicians and waiting for a QA decision. You cannot approve work you performed.</p>
      <div className="stack-gap">
        <QueueCard title="Runs awaiting review" count={runs.length} empty="No run is waiting for review." testId="review-list"><RunTable zone={zone} runs={runs} linkTo="review" /></QueueCard>
        <QueueCard title="Index tests awaiting review" count={indexTests.length} empty="No index test is waiting for review." testId="index-review-list">
          <table className="list">
            <thead><tr><th>Test</th><th>Roll</th><th>Result</th><th>Tested</th><th>By</th></tr></thead>
            <tbody>{indexTests.map((t) => (
              <tr key={t.id}>
                <td><Link href={`/index-tests/${t.id}`}>{isIndexMethodCode(t.methodCode) ? INDEX_METHODS[t.methodCode].title : t.methodCode}</Link></td>
                <td className="mono">{t.roll.labNumber}</td>
                <td className="mono">{formatResultValue(t.value, t.unit, { significantDigits: 3 })}</td>
                <td>{formatDateTime(t.testedAt, zone)}</td>
                <td>{t.performedBy.name}{t.performedById === actor.id && <span className="muted"> (you: another QA manager reviews it)</span>}</td>
              </tr>
            ))}</tbody>
          </table>
        </QueueCard>
      </div>
    </>
  );
}
