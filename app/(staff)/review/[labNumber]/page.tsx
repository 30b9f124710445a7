import Link from "next/link";
import { notFound } from "next/navigation";
import { ReadingsPanel } from "@/components/readings/readings-panel";
import { readingsPageOf } from "@/components/readings/readings-pager";
import { ChooseSettingsForm } from "@/components/review/choose-settings-form";
import { ResultPreview } from "@/components/review/result-preview";
import { ResultPanel } from "@/components/results/result-panel";
import { ReviewDecision } from "@/components/review/review-decision";
import { CriteriaPanel } from "@/components/runs/criteria-panel";
import { EvaluationBasis } from "@/components/runs/evaluation-basis";
import { ZoomableRunCharts } from "@/components/runs/zoomable-run-charts";
import { RunStagesTable } from "@/components/runs/run-stages-table";
import { RecordFacts } from "@/components/samples/record-facts";
import { StateTag } from "@/components/ui/state-tag";
import { isAppError } from "@/lib/errors/app-error";
import { formatDateTime } from "@/lib/format/dates";
import { canApproveRun } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listMethodSettings } from "@/lib/server/methods/list-method-settings";
import { getRun } from "@/lib/server/runs/get-run";
import { verdictChartSeries } from "@/lib/server/runs/get-run-chart-series";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";
import type { TestMethod } from "@/lib/hydraulics";

type Props = { params: Promise<{ labNumber: string }>; searchParams?: Promise<{ readings?: string | string[] }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Review ${(await params).labNumber}` };
}

export default async function ReviewRunPage({ params, searchParams }: Props) {
  const actor = await requirePageUser("run.review");
  const zone = await getLabTimeZone();
  const { labNumber } = await params;
  const { run, deviations, verdict, limits } = await getRun({ actor, labNumber }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const { evaluation, reason } = verdict;
  const allowed = canApproveRun(actor, run);
  const versions = run.state === "SUBMITTED" && allowed.ok ? ((await listMethodSettings({ actor, methodCode: run.methodCode }))[0]?.versions ?? []) : [];
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
        <section className="card"><h2>Stages</h2><RunStagesTable stages={run.stages} pressureUnit={actor.pressureUnit} zone={zone} /></section>
        <ReadingsPanel runId={run.id} labNumber={run.labNumber} actor={actor} zone={zone} basePath={`/review/${run.labNumber}`} {...readingsPageOf(await searchParams)} />
        {evaluation ? (
          <>
            <ResultPanel verdict={verdict} method={run.methodCode as TestMethod} earlyEnd={run.terminationKind === "EARLY_END"} unitSystem={actor.resultUnits ?? "SI"} limits={limits} />
            <EvaluationBasis verdict={verdict} />
            <CriteriaPanel met={evaluation.termination.met} criteria={evaluation.termination.criteria} trend={verdict.trend} settingsLabel={verdict.settings.label} />
            {run.state === "SUBMITTED" && <ResultPreview verdict={verdict} method={run.methodCode as TestMethod} earlyEnd={run.terminationKind === "EARLY_END"} unitSystem={actor.resultUnits ?? "SI"} />}
            <ZoomableRunCharts labNumber={run.labNumber} initial={verdictChartSeries(verdict)!} ratioBand={[evaluation.settings.ratioMin, evaluation.settings.ratioMax]} refillHours={verdict.refillsAtS.map((s) => s / 3600)} />
          </>
        ) : <p className="notice notice-caution">{reason}</p>}
        {run.reviews.length > 0 && <section className="card"><h2>Earlier reviews</h2><ul>{run.reviews.map((r) => <li key={r.id}>{formatDateTime(r.createdAt, zone)} · {r.reviewer.name}: {r.decision.toLowerCase()} {r.comments && `— ${r.comments}`}</li>)}</ul></section>}
        {run.state === "SUBMITTED" && (
          <section className="card">
            <h2>Decision</h2>
            {allowed.ok ? <ReviewDecision runId={run.id} version={run.version} leakageWarning={verdict.leakage?.flagged ? verdict.leakage.statement : null} /> : <p className="notice notice-caution" data-testid="review-refused">{allowed.reason}</p>}
          </section>
        )}
        {run.state === "SUBMITTED" && allowed.ok && (
          <section className="card">
            <h2>Settings version</h2>
            <p className="muted">The run is judged by {verdict.settings.label}. To judge it by another version of the method&apos;s settings, choose it with the reason; the result and the certificate will name it.</p>
            <ChooseSettingsForm runId={run.id} version={run.version} versions={versions} currentId={verdict.settings.versionId} />
          </section>
        )}
      </div>
    </>
  );
}
