import Link from "next/link";
import { notFound } from "next/navigation";
import { IndexTestReviewForm } from "@/components/index-tests/index-test-review-form";
import { RecordFacts } from "@/components/samples/record-facts";
import { isAppError } from "@/lib/errors/app-error";
import { formatDate, formatDateTime } from "@/lib/format/dates";
import { INDEX_TEST_FIELDS } from "@/lib/index-tests/index-test-fields";
import { INDEX_METHODS, isIndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { reportIndexValue } from "@/lib/index-tests/reported-value";
import { methodSettingsDefinition } from "@/lib/methods/registry";
import { readStoredSettings } from "@/lib/methods/settings-definition";
import { can, canApproveRun } from "@/lib/policy/permissions";
import { formatNumber, formatUnit } from "@/lib/results/format-result";
import { TEST_PROPERTY_LABELS } from "@/lib/results/property-units";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getIndexTest } from "@/lib/server/index-tests/get-index-test";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

type Props = { params: Promise<{ id: string }> };

export const metadata = { title: "Index test" };

const STATE_WORDS = { SUBMITTED: "Awaiting review", RETURNED: "Returned for changes", APPROVED: "Approved" } as const;

export default async function IndexTestPage({ params }: Props) {
  const actor = await requirePageUser("run.view");
  const { id } = await params;
  const [test, zone] = await Promise.all([
    getIndexTest({ actor, id }).catch((error) => {
      if (isAppError(error) && (error.code === "NOT_FOUND" || error.code === "INVALID_INPUT")) notFound();
      throw error;
    }),
    getLabTimeZone(),
  ]);
  const method = isIndexMethodCode(test.methodCode) ? INDEX_METHODS[test.methodCode] : null;
  const layout = isIndexMethodCode(test.methodCode) ? INDEX_TEST_FIELDS[test.methodCode] : null;
  const definition = methodSettingsDefinition(test.methodCode);
  const evaluation = test.evaluation as { departures?: string[]; notes?: string[]; specimenValues?: number[] } | null;
  const observations = (test.observations ?? {}) as Record<string, unknown>;
  const specimens = Array.isArray(observations.specimens) ? (observations.specimens as Array<Record<string, unknown>>) : [];
  const review = canApproveRun(actor, test);
  // Reported in the unit and to the places of the settings version the test was computed by.
  const reporting = definition ? (readStoredSettings(definition, test.methodSettingsVersion?.settings ?? {}) as Record<string, unknown>) : {};
  return (
    <>
      <div className="page-head">
        <div>
          <h1>{method?.title ?? test.methodCode} <span className="tag" data-testid="index-test-state">{STATE_WORDS[test.state]}</span></h1>
          <p className="muted">Roll <Link className="mono" href={`/samples/rolls/${test.roll.labNumber}`}>{test.roll.labNumber}</Link> · roll {test.roll.rollNumber}, lot {test.roll.lotNumber} · {test.roll.project.name}</p>
        </div>
      </div>
      <div className="stack-gap">
        <section className="card">
          <RecordFacts facts={[
            ["Tested", formatDateTime(test.testedAt, zone)], ["Performed by", test.performedBy.name],
            ["Coupon", test.coupon ? <Link className="mono" href={`/samples/coupons/${test.coupon.labNumber}`}>{test.coupon.labNumber}</Link> : "from the roll sample"],
            ["Method settings", test.methodSettingsVersion ? `version ${test.methodSettingsVersion.version}` : "as installed"],
            ["Approved", test.approvedAt ? `${formatDateTime(test.approvedAt, zone)} by ${test.approvedBy?.name ?? "—"}` : "—"],
            ["Replaces", test.correctsId ? <Link href={`/index-tests/${test.correctsId}`}>the returned test</Link> : "—"],
          ]} />
        </section>
        <section className="card">
          <h2>Results</h2>
          <table className="list" data-testid="index-test-results">
            <thead><tr><th>Property</th><th>Result</th><th>Specimens</th><th>Standard deviation</th><th>Expanded uncertainty</th></tr></thead>
            <tbody>{test.results.map((r) => (
              <tr key={r.property} data-property={r.property}>
                <td>{TEST_PROPERTY_LABELS[r.property]}</td>
                <td className="mono">{reportIndexValue(r.value, r.unit, reporting)}</td>
                <td>{r.specimenCount}</td>
                <td>{r.standardDeviation === null ? "—" : `${formatNumber(r.standardDeviation, { significantDigits: 2 })} ${formatUnit(r.unit)}`}</td>
                <td>{r.expandedUncertainty === null ? "none declared" : `± ${formatNumber(r.expandedUncertainty, { significantDigits: 2 })} ${formatUnit(r.unit)} (k = ${r.coverageFactor ?? 2})`}</td>
              </tr>
            ))}</tbody>
          </table>
          {evaluation?.notes?.map((n) => <p key={n} className="hint">{n}</p>)}
          {(evaluation?.departures ?? []).length > 0 && <div className="notice notice-error" data-testid="departures">Departures from the method: {evaluation!.departures!.join(" ")}</div>}
        </section>
        <section className="card">
          <h2>Observations as entered</h2>
          {layout && (
            <RecordFacts facts={[
              ...(layout.choice ? [[layout.choice.label, layout.choice.options.find((o) => o.value === observations[layout.choice!.key])?.label ?? String(observations[layout.choice.key] ?? "—")] as [string, string]] : []),
              ...layout.fields.map((f) => [f.label, String(observations[f.key] ?? "—")] as [string, string]),
            ]} />
          )}
          {layout && specimens.length > 0 && (
            <table className="list" data-testid="index-test-specimens">
              <thead><tr><th>#</th>{layout.specimenColumns.map((c) => <th key={c.key}>{c.label}</th>)}<th>Per specimen</th></tr></thead>
              <tbody>{specimens.map((s, i) => (
                <tr key={i}><td>{i + 1}</td>{layout.specimenColumns.map((c) => <td key={c.key}>{String(s[c.key] ?? "")}</td>)}<td>{evaluation?.specimenValues?.[i] === undefined ? "—" : `${formatNumber(evaluation.specimenValues[i]!, { significantDigits: 4 })} ${formatUnit(test.unit)}`}</td></tr>
              ))}</tbody>
            </table>
          )}
        </section>
        <section className="card">
          <h2>Instruments</h2>
          <table className="list"><thead><tr><th>Role</th><th>Instrument</th><th>Calibration</th></tr></thead>
            <tbody>{test.equipment.map((e) => (
              <tr key={e.equipment.assetTag}><td>{e.role}</td><td><Link className="mono" href={`/equipment/${encodeURIComponent(e.equipment.assetTag)}`}>{e.equipment.assetTag}</Link> · {e.equipment.name}</td><td>{e.calibration ? `${e.calibration.reference}, due ${formatDate(e.calibration.dueAt, zone)}` : "—"}</td></tr>
            ))}</tbody>
          </table>
        </section>
        <section className="card">
          <h2>Review</h2>
          {test.reviews.length === 0 ? <p className="empty">No decision yet.</p> : (
            <ul>{test.reviews.map((r, i) => <li key={i}>{formatDateTime(r.createdAt, zone)}: {r.decision === "APPROVED" ? "approved" : "returned"} by {r.reviewer.name}{r.comments ? `: “${r.comments}”` : ""}</li>)}</ul>
          )}
          {test.state === "SUBMITTED" && (review.ok ? <IndexTestReviewForm indexTestId={test.id} version={test.version} /> : can(actor.role, "run.review") ? <p className="notice">{review.reason}</p> : null)}
          {test.state === "RETURNED" && !test.correctedBy && method && can(actor.role, "run.operate") && (
            <p><Link className="button" href={`/index-tests/new/${test.roll.labNumber}/${method.code}`}>Record the test again</Link></p>
          )}
        </section>
      </div>
    </>
  );
}
