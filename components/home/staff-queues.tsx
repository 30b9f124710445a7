import Link from "next/link";
import { formatAge, formatDate } from "@/lib/format/dates";
import { EQUIPMENT_KIND_LABELS } from "@/lib/format/states";
import type { HomeQueues } from "@/lib/server/queues/get-home-queues";
import { QueueTable } from "@/components/ui/queue-table";
import { StateTag } from "@/components/ui/state-tag";

/** The home page's work queues; each role is given only the queues its policy allows (the others are null). */
export function StaffQueues({ queues, now, zone = "UTC" }: { queues: HomeQueues; now: Date; zone?: string }) {
  return (
    <div className="grid">
      {queues.shipments && (
        <QueueTable title="Shipments to acknowledge" empty="Every shipment logged has been acknowledged." testId="queue-shipments"
          headings={["Shipment", "Client / project", "Rolls", "Waiting"]} items={queues.shipments}
          row={(s) => <tr key={s.id}><td><Link className="mono" href={`/intake/shipments/${s.labNumber}`}>{s.labNumber}</Link></td><td>{s.clientOrganization.name}<div className="muted">{s.project.name}</div></td><td>{s._count.rolls}</td><td>{formatAge(s.receivedAt, now)}</td></tr>} />
      )}
      {queues.rollsToCut && (
        <QueueTable title="Rolls waiting to be cut" empty="No roll is waiting for coupons." testId="queue-rolls"
          headings={["Roll", "Project", "State"]} items={queues.rollsToCut}
          row={(r) => <tr key={r.id}><td><Link className="mono" href={`/samples/rolls/${r.labNumber}`}>{r.labNumber}</Link><div className="muted">{r.rollNumber}</div></td><td>{r.project.name}</td><td><StateTag state={r.state} /></td></tr>} />
      )}
      {queues.specimens && (
        <QueueTable title="Specimens waiting for a cell" empty="No prepared specimen is waiting." testId="queue-specimens"
          headings={["Specimen", "From roll", "Method", "Prepared"]} items={queues.specimens}
          row={(s) => <tr key={s.id}><td><Link className="mono" href={`/runs/new?specimen=${s.id}`}>{s.labNumber}</Link></td><td className="mono">{s.coupon.roll.labNumber}<div className="muted">{s.coupon.roll.project.name}</div></td><td>ASTM {s.intendedMethodCode}</td><td>{formatDate(s.preparedAt, zone)}</td></tr>} />
      )}
      {queues.indexTestsWaiting && (
        <QueueTable title="Index tests waiting" empty="No roll is waiting for an index test its specification asks for." testId="queue-index-tests"
          headings={["Roll", "Project", "Tests the specification asks for"]} items={queues.indexTestsWaiting}
          row={(r) => (
            <tr key={r.rollLabNumber} data-roll={r.rollLabNumber}>
              <td><Link className="mono" href={`/samples/rolls/${r.rollLabNumber}`}>{r.rollLabNumber}</Link><div className="muted">{r.rollNumber}</div></td>
              <td>{r.projectName}</td>
              <td>{r.methods.map((m, i) => <span key={m.code}>{i > 0 && ", "}<Link href={`/index-tests/new/${r.rollLabNumber}/${m.code}`}>{m.title}</Link></span>)}</td>
            </tr>
          )} />
      )}
      {queues.indexTestsToReview && (
        <QueueTable title="Index tests to review" empty="No index test is waiting for review." testId="queue-index-reviews"
          headings={["Test", "Roll", "Technician", "Waiting"]} items={queues.indexTestsToReview}
          row={(t) => <tr key={t.id}><td><Link href={`/index-tests/${t.id}`}>ASTM {t.methodCode}</Link></td><td className="mono">{t.roll.labNumber}</td><td>{t.performedBy.name}</td><td>{formatAge(t.createdAt, now)}</td></tr>} />
      )}
      {queues.runs && (
        <QueueTable title="Runs in progress" empty="No run is in progress." testId="queue-runs"
          headings={["Run", "Cell", "Specimen", "State", "By"]} items={queues.runs}
          row={(r) => <tr key={r.id}><td><Link className="mono" href={`/runs/${r.labNumber}`}>{r.labNumber}</Link><div className="muted">ASTM {r.methodCode}</div></td><td className="mono">{r.cell.assetTag}</td><td className="mono">{r.specimen.labNumber}</td><td><StateTag state={r.state} kind="run" /></td><td>{r.performedBy.name}</td></tr>} />
      )}
      {queues.reviews && (
        <QueueTable title="Results to review" empty="Nothing is waiting for review." testId="queue-reviews"
          headings={["Run", "Specimen", "Technician", "Waiting"]} items={queues.reviews}
          row={(r) => <tr key={r.id}><td><Link className="mono" href={`/review/${r.labNumber}`}>{r.labNumber}</Link><div className="muted">ASTM {r.methodCode}</div></td><td className="mono">{r.specimen.labNumber}</td><td>{r.performedBy.name}</td><td>{r.submittedAt ? formatAge(r.submittedAt, now) : "—"}</td></tr>} />
      )}
      {queues.calibrations && (
        <QueueTable title="Calibrations due within 30 days" empty="No calibration falls due in the next 30 days." testId="queue-calibrations"
          headings={["Asset", "Kind", "Due"]} items={queues.calibrations}
          row={(e) => <tr key={e.id}><td><Link className="mono" href={`/equipment/${e.assetTag}`}>{e.assetTag}</Link></td><td>{EQUIPMENT_KIND_LABELS[e.kind]}</td><td>{e.dueAt && e.dueAt < now ? <span className="state state-bad">overdue {formatDate(e.dueAt, zone)}</span> : formatDate(e.dueAt, zone)}</td></tr>} />
      )}
    </div>
  );
}
