import Link from "next/link";
import { formatAge, formatDate } from "@/lib/format/dates";
import { EQUIPMENT_KIND_LABELS } from "@/lib/format/states";
import type { HomeQueues } from "@/lib/server/queues/get-home-queues";
import { QueueCard } from "@/components/ui/queue-card";
import { StateTag } from "@/components/ui/state-tag";

/** The home page's work queues; each role is given only the queues its policy allows. */
export function StaffQueues({ queues, now, zone = "UTC" }: { queues: HomeQueues; now: Date; zone?: string }) {
  return (
    <div className="grid">
      {queues.shipments && (
        <QueueCard title="Shipments to acknowledge" count={queues.shipments.length} empty="Every shipment logged has been acknowledged." testId="queue-shipments">
          <table className="list">
            <thead><tr><th>Shipment</th><th>Client / project</th><th>Rolls</th><th>Waiting</th></tr></thead>
            <tbody>
              {queues.shipments.map((s) => (
                <tr key={s.id}><td><Link className="mono" href={`/intake/shipments/${s.labNumber}`}>{s.labNumber}</Link></td><td>{s.clientOrganization.name}<div className="muted">{s.project.name}</div></td><td>{s._count.rolls}</td><td>{formatAge(s.receivedAt, now)}</td></tr>
              ))}
            </tbody>
          </table>
        </QueueCard>
      )}
      {queues.rollsToCut && (
        <QueueCard title="Rolls waiting to be cut" count={queues.rollsToCut.length} empty="No roll is waiting for coupons." testId="queue-rolls">
          <table className="list">
            <thead><tr><th>Roll</th><th>Project</th><th>State</th></tr></thead>
            <tbody>
              {queues.rollsToCut.map((r) => (
                <tr key={r.id}><td><Link className="mono" href={`/samples/rolls/${r.labNumber}`}>{r.labNumber}</Link><div className="muted">{r.rollNumber}</div></td><td>{r.project.name}</td><td><StateTag state={r.state} /></td></tr>
              ))}
            </tbody>
          </table>
        </QueueCard>
      )}
      {queues.specimens && (
        <QueueCard title="Specimens waiting for a cell" count={queues.specimens.length} empty="No prepared specimen is waiting." testId="queue-specimens">
          <table className="list">
            <thead><tr><th>Specimen</th><th>From roll</th><th>Method</th><th>Prepared</th></tr></thead>
            <tbody>
              {queues.specimens.map((s) => (
                <tr key={s.id}><td><Link className="mono" href={`/runs/new?specimen=${s.id}`}>{s.labNumber}</Link></td><td className="mono">{s.coupon.roll.labNumber}<div className="muted">{s.coupon.roll.project.name}</div></td><td>ASTM {s.intendedMethodCode}</td><td>{formatDate(s.preparedAt, zone)}</td></tr>
              ))}
            </tbody>
          </table>
        </QueueCard>
      )}
      {queues.indexTestsWaiting && (
        <QueueCard title="Index tests waiting" count={queues.indexTestsWaiting.length} empty="No roll is waiting for an index test its specification asks for." testId="queue-index-tests">
          <table className="list">
            <thead><tr><th>Roll</th><th>Project</th><th>Tests the specification asks for</th></tr></thead>
            <tbody>
              {queues.indexTestsWaiting.map((r) => (
                <tr key={r.rollLabNumber} data-roll={r.rollLabNumber}>
                  <td><Link className="mono" href={`/samples/rolls/${r.rollLabNumber}`}>{r.rollLabNumber}</Link><div className="muted">{r.rollNumber}</div></td>
                  <td>{r.projectName}</td>
                  <td>{r.methods.map((m, i) => <span key={m.code}>{i > 0 && ", "}<Link href={`/index-tests/new/${r.rollLabNumber}/${m.code}`}>{m.title}</Link></span>)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </QueueCard>
      )}
      {queues.indexTestsToReview && (
        <QueueCard title="Index tests to review" count={queues.indexTestsToReview.length} empty="No index test is waiting for review." testId="queue-index-reviews">
          <table className="list">
            <thead><tr><th>Test</th><th>Roll</th><th>Technician</th><th>Waiting</th></tr></thead>
            <tbody>
              {queues.indexTestsToReview.map((t) => (
                <tr key={t.id}><td><Link href={`/index-tests/${t.id}`}>ASTM {t.methodCode}</Link></td><td className="mono">{t.roll.labNumber}</td><td>{t.performedBy.name}</td><td>{formatAge(t.testedAt, now)}</td></tr>
              ))}
            </tbody>
          </table>
        </QueueCard>
      )}
      {queues.runs && (
        <QueueCard title="Runs in progress" count={queues.runs.length} empty="No run is in progress." testId="queue-runs">
          <table className="list">
            <thead><tr><th>Run</th><th>Cell</th><th>Specimen</th><th>State</th><th>By</th></tr></thead>
            <tbody>
              {queues.runs.map((r) => (
                <tr key={r.id}><td><Link className="mono" href={`/runs/${r.labNumber}`}>{r.labNumber}</Link><div className="muted">ASTM {r.methodCode}</div></td><td className="mono">{r.cell.assetTag}</td><td className="mono">{r.specimen.labNumber}</td><td><StateTag state={r.state} kind="run" /></td><td>{r.performedBy.name}</td></tr>
              ))}
            </tbody>
          </table>
        </QueueCard>
      )}
      {queues.reviews && (
        <QueueCard title="Results to review" count={queues.reviews.length} empty="Nothing is waiting for review." testId="queue-reviews">
          <table className="list">
            <thead><tr><th>Run</th><th>Specimen</th><th>Technician</th><th>Waiting</th></tr></thead>
            <tbody>
              {queues.reviews.map((r) => (
                <tr key={r.id}><td><Link className="mono" href={`/review/${r.labNumber}`}>{r.labNumber}</Link><div className="muted">ASTM {r.methodCode}</div></td><td className="mono">{r.specimen.labNumber}</td><td>{r.performedBy.name}</td><td>{r.submittedAt ? formatAge(r.submittedAt, now) : "—"}</td></tr>
              ))}
            </tbody>
          </table>
        </QueueCard>
      )}
      {queues.calibrations && (
        <QueueCard title="Calibrations due within 30 days" count={queues.calibrations.length} empty="No calibration falls due in the next 30 days." testId="queue-calibrations">
          <table className="list">
            <thead><tr><th>Asset</th><th>Kind</th><th>Due</th></tr></thead>
            <tbody>
              {queues.calibrations.map((e) => (
                <tr key={e.id}><td><Link className="mono" href={`/equipment/${e.assetTag}`}>{e.assetTag}</Link></td><td>{EQUIPMENT_KIND_LABELS[e.kind]}</td><td>{e.dueAt && e.dueAt < now ? <span className="state state-bad">overdue {formatDate(e.dueAt, zone)}</span> : formatDate(e.dueAt, zone)}</td></tr>
              ))}
            </tbody>
          </table>
        </QueueCard>
      )}
    </div>
  );
}
