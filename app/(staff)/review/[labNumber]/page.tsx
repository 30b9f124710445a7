import Link from "next/link";
import { notFound } from "next/navigation";
import { ReadingsPanel } from "@/components/readings/readings-panel";
import { ReviewDecision } from "@/components/review/review-decision";
import { CriteriaPanel } from "@/components/runs/criteria-panel";
import { RunCharts } from "@/components/runs/run-charts";
import { RunStagesTable } from "@/components/runs/run-stages-table";
import { RecordFacts } from "@/components/samples/record-facts";
import { StateTag } from "@/components/ui/state-tag";
import { isAppError } from "@/lib/errors/app-error";
import { formatDateTime } from "@/lib/format/dates";
import { canApproveRun } from "@/lib/policy/permissions";
import { toChartPoints } from "@/lib/runs/chart-points";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getRun } from "@/lib/server/runs/get-run";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

type Props = { params: Promise<{ labNumber: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Review ${(await params).labNumber}` };
}

export default async function ReviewRunPage({ params }: Props) {
  const actor = await requirePageUser("run.review");
  const zone = await getLabTimeZone();
  const { labNumber } = await params;
  const { run, evaluation, reason, deviations, inputReadings } = await getRun({ actor, labNumber }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const allowed = canApproveRun(actor, run);
  return (
    <>
      <div className="page-head">
        <div>
          <h1>Review <span className="mono">{run.labNumber}</span> <StateTag state={run.state} kind="run" /></h1>
          <p className="muted">{run.method.title} · specimen <span className="mono">{run.specimen.labNumber}</span> · performed by {run.performedBy.name} · <Link href={`/runs/${run.labNumber}`}>the run&apos;s own page</Link></p>
        </div>
      </div>
      <div className="stack-gap">
        <section className="card">
          <RecordFacts facts={[
            ["Cell", run.cell.assetTag], ["Instruments", run.equipment.map((e) => `${e.equipment.assetTag} (${e.calibration?.reference ?? "no calibration"})`).join("; ")],
            ["Terminated", run.terminatedAt ? `${formatDateTime(run.terminatedAt, zone)} · ${run.terminationKind === "EARLY_END" ? `early: ${run.terminationReason}` : "criteria met"}` : "—"],
            ["Bentonite thickness after test (mm)", run.postTestThicknessMm ?? "—"], ["Final mass (g)", run.postTestMassG ?? "—"], ["Observations", run.postTestObservations || "—"],
            ["Submitted", formatDateTime(run.submittedAt, zone)],
          ]} />
        </section>
        <section className="card" data-testid="deviations">
          <h2>Deviations</h2>
          {deviations.length === 0 ? <p>None recorded.</p> : <ul>{deviations.map((d) => <li key={d}>{d}</li>)}</ul>}
        </section>
        <section className="card"><h2>Stages</h2><RunStagesTable stages={run.stages} pressureUnit={actor.pressureUnit} /></section>
        <ReadingsPanel runId={run.id} labNumber={run.labNumber} actor={actor} />
        {evaluation ? (
          <>
            <CriteriaPanel met={evaluation.termination.met} criteria={evaluation.termination.criteria} />
            <RunCharts points={toChartPoints(evaluation.intervals, inputReadings)} ratioBand={[evaluation.settings.ratioMin, evaluation.settings.ratioMax]} />
          </>
        ) : <p className="notice notice-caution">{reason}</p>}
        {run.reviews.length > 0 && <section className="card"><h2>Earlier reviews</h2><ul>{run.reviews.map((r) => <li key={r.id}>{formatDateTime(r.createdAt, zone)} · {r.reviewer.name}: {r.decision.toLowerCase()} {r.comments && `— ${r.comments}`}</li>)}</ul></section>}
        {run.state === "SUBMITTED" && (
          <section className="card">
            <h2>Decision</h2>
            {allowed.ok ? <ReviewDecision runId={run.id} version={run.version} /> : <p className="notice notice-caution" data-testid="review-refused">{allowed.reason}</p>}
          </section>
        )}
      </div>
    </>
  );
}
