import Link from "next/link";
import { notFound } from "next/navigation";
import { RecordFacts } from "@/components/samples/record-facts";
import { CriteriaPanel } from "@/components/runs/criteria-panel";
import { ResultPanel } from "@/components/results/result-panel";
import type { TestMethod } from "@/lib/hydraulics";
import { EvaluationBasis } from "@/components/runs/evaluation-basis";
import { PressureCaution } from "@/components/runs/pressure-caution";
import { ZoomableRunCharts } from "@/components/runs/zoomable-run-charts";
import { RunStagesTable } from "@/components/runs/run-stages-table";
import { AbandonRunForm } from "@/components/runs/abandon-run-form";
import { PostTestForm, SubmitRunButton, TerminateForm } from "@/components/runs/run-step-forms";
import { StageForm } from "@/components/runs/stage-form";
import { ReadingsPanel } from "@/components/readings/readings-panel";
import { readingsPageOf } from "@/components/readings/readings-pager";
import { StateTag } from "@/components/ui/state-tag";
import { isAppError } from "@/lib/errors/app-error";
import { formatDateTime } from "@/lib/format/dates";
import { formatPressure } from "@/lib/units/pressure-entry";
import { allowedRunSteps, type RunStateName } from "@/lib/runs/run-state-machine";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getRun } from "@/lib/server/runs/get-run";
import { verdictChartSeries } from "@/lib/server/runs/get-run-chart-series";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";
import { listStorageLocations } from "@/lib/server/samples/list-storage-locations";

type Props = { params: Promise<{ labNumber: string }>; searchParams?: Promise<{ readings?: string | string[] }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Run ${(await params).labNumber}` };
}

function projectedText(permeationStart: Date | null, projectedAtS: number | null, reason: string, zone: string): string {
  if (projectedAtS === null || !permeationStart) return reason;
  return `Probably met about ${formatDateTime(new Date(permeationStart.getTime() + projectedAtS * 1000), zone)}. ${reason}`;
}

/** When the last current reading was taken: permeation start plus its elapsed time (ISO), or null. */
function lastReadingAt(permeationStart: Date | null, readings: ReadonlyArray<{ elapsedS: number }>): string | null {
  const last = readings.at(-1);
  return permeationStart && last ? new Date(permeationStart.getTime() + last.elapsedS * 1000).toISOString() : null;
}

export default async function RunPage({ params, searchParams }: Props) {
  const actor = await requirePageUser("run.view");
  const { labNumber } = await params;
  const { run, verdict, limits } = await getRun({ actor, labNumber }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const { evaluation, reason } = verdict;
  const steps = allowedRunSteps(run.state as RunStateName);
  const mine = can(actor.role, "run.operate") && run.performedById === actor.id;
  const [zone, locations] = await Promise.all([getLabTimeZone(), mine && steps.includes("abandon") ? listStorageLocations({ actor, activeOnly: true }) : []]);
  const permeation = run.stages.find((s) => s.kind === "PERMEATION") ?? null;
  const stageKinds = (["SATURATION", "BACK_PRESSURE", "EQUILIBRATION", "PERMEATION"] as const).filter((k) =>
    k === "EQUILIBRATION" ? steps.includes("start-equilibration") : k === "PERMEATION" ? steps.includes("start-permeation") : steps.includes("add-stage"),
  );
  const ratioBand: [number, number] = evaluation ? [evaluation.settings.ratioMin, evaluation.settings.ratioMax] : [0.75, 1.25];
  return (
    <>
      <div className="page-head">
        <div>
          <h1>Run <span className="mono">{run.labNumber}</span> <StateTag state={run.state} kind="run" /></h1>
          <p className="muted">
            {run.method.title} · specimen <Link className="mono" href={`/samples/specimens/${run.specimen.labNumber}`}>{run.specimen.labNumber}</Link> · roll{" "}
            <Link className="mono" href={`/samples/rolls/${run.specimen.coupon.roll.labNumber}`}>{run.specimen.coupon.roll.labNumber}</Link> · {run.specimen.coupon.roll.project.clientOrganization.name}
          </p>
        </div>
      </div>
      <div className="stack-gap">
        <PressureCaution />
        <section className="card">
          <RecordFacts facts={[
            ["Cell", `${run.cell.assetTag} · ${run.cell.name}`], ["Technician", run.performedBy.name], ["Mounted", formatDateTime(run.assignedAt, zone)],
            ["Effective stress", formatPressure(run.effectiveStressPa, actor.pressureUnit)],
            ["Instruments", run.equipment.map((e) => `${e.equipment.assetTag} (${e.role}${e.calibration ? `, cal. ${e.calibration.reference}` : ""})`).join("; ")],
            ["Calibration override", run.calibrationOverrideReason ? `${run.calibrationOverrideReason} — allowed by ${run.calibrationOverrideBy?.name}` : "none"],
            ...(run.permeantName ? ([["Permeant", `${run.permeantName}${run.permeantSalt ? `, ${run.permeantSalt}` : ""}${run.permeantMolarityMolPerL ? ` ${run.permeantMolarityMolPerL} mol/L` : ""}`]] as Array<[string, string]>) : []),
            ...(run.abandonedAt ? ([["Abandoned", `${formatDateTime(run.abandonedAt, zone)} by ${run.abandonedBy?.name ?? "—"}: ${run.abandonmentReason}`]] as Array<[string, string]>) : []),
            ["Termination", run.terminatedAt ? `${formatDateTime(run.terminatedAt, zone)} · ${run.terminationKind === "EARLY_END" ? `ended early: ${run.terminationReason}` : "criteria met"}` : "—"],
            ["Post-test thickness (mm)", run.postTestThicknessMm ?? "—"], ["Final mass (g)", run.postTestMassG ?? "—"], ["Observations", run.postTestObservations || "—"],
          ]} />
        </section>
        <div className="grid">
          <section className="card">
            <h2>Stages</h2>
            <RunStagesTable stages={run.stages} pressureUnit={actor.pressureUnit} zone={zone} />
          </section>
          {mine && stageKinds.length > 0 && (
            <section className="card"><h2>Record a stage</h2><StageForm key={run.version} runId={run.id} version={run.version} kinds={[...stageKinds]} pressureUnit={actor.pressureUnit} zone={zone} /></section>
          )}
        </div>
        {permeation && <ReadingsPanel runId={run.id} labNumber={run.labNumber} actor={actor} zone={zone} basePath={`/runs/${run.labNumber}`} {...readingsPageOf(await searchParams)} />}
        {permeation && <p><a className="button button-quiet" href={`/api/runs/${encodeURIComponent(run.labNumber)}/xlsx`} download data-testid="run-xlsx">Download readings and intervals (XLSX)</a></p>}
        {evaluation ? (
          <>
            {(evaluation.termination.met || run.terminationKind === "EARLY_END") && (
              <ResultPanel verdict={verdict} method={run.methodCode as TestMethod} earlyEnd={run.terminationKind === "EARLY_END"} unitSystem={actor.resultUnits ?? "SI"} limits={limits} />
            )}
            <CriteriaPanel met={evaluation.termination.met} criteria={evaluation.termination.criteria} trend={verdict.trend} settingsLabel={verdict.settings.label} />
            <section className="card" data-testid="projection">
              <h2>Projected end</h2>
              <p>{evaluation.termination.met ? "The criteria are met now." : projectedText(permeation?.startedAt ?? null, evaluation.projection.projectedAtS, evaluation.projection.reason, zone)}</p>
              {evaluation.warnings.map((w) => <p key={w} className="notice notice-caution">{w}</p>)}
            </section>
            <EvaluationBasis verdict={verdict} />
            <ZoomableRunCharts
              labNumber={run.labNumber}
              initial={verdictChartSeries(verdict)!}
              ratioBand={ratioBand}
              refillHours={verdict.refillsAtS.map((s) => s / 3600)}
              {...(evaluation.settings.criteria.includes("pore-volumes") && { minPoreVolumes: evaluation.settings.minPoreVolumes })}
            />
          </>
        ) : permeation ? <p className="notice notice-caution">{reason}</p> : null}
        {mine && steps.includes("terminate") && <section className="card"><h2>End permeation</h2><TerminateForm runId={run.id} version={run.version} criteriaMet={evaluation?.termination.met ?? false} zone={zone} lastReadingAt={lastReadingAt(permeation?.startedAt ?? null, verdict.inputReadings)} /></section>}
        {mine && steps.includes("record-post-test") && <section className="card"><h2>Post-test measurements</h2><PostTestForm runId={run.id} version={run.version} /></section>}
        {mine && steps.includes("submit") && run.postTestThicknessMm && <section className="card"><h2>Review</h2><SubmitRunButton runId={run.id} version={run.version} /></section>}
        {mine && steps.includes("abandon") && (
          <section className="card" data-testid="abandon-run"><h2>Abandon the run</h2><AbandonRunForm runId={run.id} version={run.version} locations={locations} /></section>
        )}
        {run.reviews.length > 0 && (
          <section className="card"><h2>Reviews</h2><ul>{run.reviews.map((r) => <li key={r.id}>{formatDateTime(r.createdAt, zone)} · {r.reviewer.name}: {r.decision.toLowerCase()} {r.comments && `— ${r.comments}`}</li>)}</ul></section>
        )}
      </div>
    </>
  );
}
