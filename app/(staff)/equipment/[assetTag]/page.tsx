import Link from "next/link";
import { notFound } from "next/navigation";
import { CalibrationHistory } from "@/components/equipment/calibration-history";
import { CalibrationTag } from "@/components/equipment/calibration-tag";
import { EditEquipmentForm } from "@/components/equipment/edit-equipment-form";
import { EquipmentStatusForm } from "@/components/equipment/equipment-status-form";
import { CorrectionHistory } from "@/components/custody/correction-history";
import { PressureCaution } from "@/components/equipment/pressure-caution";
import { RecordCalibrationForm } from "@/components/equipment/record-calibration-form";
import { RecordFacts } from "@/components/samples/record-facts";
import { StateTag } from "@/components/ui/state-tag";
import { isAppError } from "@/lib/errors/app-error";
import { formatDate, formatDateTime } from "@/lib/format/dates";
import { EQUIPMENT_KIND_LABELS } from "@/lib/format/states";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getEquipment } from "@/lib/server/equipment/get-equipment";
import { listEquipmentChanges } from "@/lib/server/equipment/list-equipment-changes";
import { formatPressure, paToEnteredPressure } from "@/lib/units/pressure-entry";
import { EQUIPMENT_STATUS_LABELS } from "@/lib/validation/equipment";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";
import { ScrollArea } from "@/components/ui/scroll-area";

type Props = { params: Promise<{ assetTag: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: decodeURIComponent((await params).assetTag) };
}

export default async function EquipmentItemPage({ params }: Props) {
  const actor = await requirePageUser("equipment.view");
  const zone = await getLabTimeZone();
  const assetTag = decodeURIComponent((await params).assetTag);
  const equipment = await getEquipment({ actor, assetTag }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const manage = can(actor.role, "equipment.manage");
  const changes = await listEquipmentChanges({ actor, equipmentId: equipment.id });
  const otherUnit = actor.pressureUnit === "PSI" ? "KPA" : "PSI";
  return (
    <>
      <p className="muted"><Link href="/equipment">Equipment</Link> ›</p>
      <div className="page-head">
        <div>
          <h1><span className="mono">{equipment.assetTag}</span> <CalibrationTag status={equipment.calibration} retired={equipment.status === "RETIRED"} /></h1>
          <p className="muted">{EQUIPMENT_KIND_LABELS[equipment.kind]} · {equipment.name}</p>
        </div>
      </div>
      <div className="stack-gap">
        <section className="card" data-testid="equipment-details">
          <RecordFacts facts={[
            ["Kind", EQUIPMENT_KIND_LABELS[equipment.kind]],
            ["Serial number", equipment.serialNumber ?? "—"],
            ["Status", EQUIPMENT_STATUS_LABELS[equipment.status]],
            ["Rated maximum", equipment.ratedMaxPressurePa === null ? "—" : <>{formatPressure(equipment.ratedMaxPressurePa, actor.pressureUnit)} <span className="muted">({formatPressure(equipment.ratedMaxPressurePa, otherUnit)})</span></>],
            ["Calibration due", formatDate(equipment.calibrations[0]?.dueAt, zone)],
            ["Registered", formatDateTime(equipment.createdAt, zone)],
          ]} />
          <p className={equipment.calibration.usable ? "muted" : "notice notice-error"} data-testid="calibration-message">
            {equipment.calibration.message} {usability(equipment.calibration.state)}
          </p>
          {equipment.ratedMaxPressurePa !== null && <PressureCaution />}
        </section>
        <section className="card">
          <h2>Calibrations <span className="count">{equipment.calibrations.length}</span></h2>
          <CalibrationHistory zone={zone} kind={equipment.kind} calibrations={equipment.calibrations} />
        </section>
        {manage && (
          <div className="grid">
            <section className="card"><h2>Record a calibration</h2>
              {equipment.status === "RETIRED" ? <p className="empty">Retired equipment takes no new calibrations; put it back in service first.</p> : <RecordCalibrationForm equipmentId={equipment.id} kind={equipment.kind} />}
            </section>
            <section className="card"><h2>Status</h2><EquipmentStatusForm equipmentId={equipment.id} version={equipment.version} status={equipment.status} /></section>
            <section className="card"><h2>Register entry</h2>
              <EditEquipmentForm
                equipmentId={equipment.id} version={equipment.version} name={equipment.name} serialNumber={equipment.serialNumber}
                ratedMaxPressure={equipment.ratedMaxPressurePa === null ? "" : String(+paToEnteredPressure(equipment.ratedMaxPressurePa, actor.pressureUnit).toFixed(3))} pressureUnit={actor.pressureUnit}
              />
            </section>
          </div>
        )}
        <section className="card"><h2>Changes <span className="count">{changes.length}</span></h2><CorrectionHistory zone={zone} corrections={changes.map((c) => ({ ...c, field: CHANGE_LABELS[c.field] ?? c.field, oldValue: changeValue(c.field, c.oldValue, actor.pressureUnit), newValue: changeValue(c.field, c.newValue, actor.pressureUnit) }))} /></section>
        <section className="card">
          <h2>Runs that used it <span className="count">{equipment.runs.length}</span></h2>
          {equipment.runs.length === 0 ? <p className="empty">No run has used it yet.</p> : (
            <ScrollArea>
              <table className="list" data-testid="equipment-runs">
                <thead><tr><th>Run</th><th>Used as</th><th>Method</th><th>Specimen</th><th>Assigned</th><th>Calibration used</th><th>State</th></tr></thead>
                <tbody>{equipment.runs.map((r) => (
                  <tr key={`${r.id}-${r.role}`}>
                    <td><Link className="mono" href={`/runs/${r.labNumber}`}>{r.labNumber}</Link></td><td>{r.role}</td><td>ASTM {r.methodCode}</td>
                    <td className="mono">{r.specimen.labNumber}</td><td>{formatDate(r.assignedAt, zone)}</td>
                    <td>{r.calibrationId ? equipment.calibrations.find((c) => c.id === r.calibrationId)?.reference ?? "—" : "—"}</td>
                    <td><StateTag state={r.state} kind="run" /></td>
                  </tr>
                ))}</tbody>
              </table>
            </ScrollArea>
          )}
        </section>
      </div>
    </>
  );
}

const CHANGE_LABELS: Record<string, string> = { status: "Status", name: "Name", serialNumber: "Serial number", ratedMaxPressurePa: "Rated maximum" };

/** A changed value as stored (text) for reading: statuses in words, pressures in the person's unit. */
function changeValue(field: string, value: string, unit: "KPA" | "PSI"): string {
  if (field === "status") return EQUIPMENT_STATUS_LABELS[value as keyof typeof EQUIPMENT_STATUS_LABELS] ?? value;
  if (field === "ratedMaxPressurePa" && value !== "") return formatPressure(Number(value), unit);
  return value;
}

function usability(state: string): string {
  if (state === "current" || state === "due-soon") return "It may be used for a new run.";
  // Out-of-service equipment is never overridden; a calibration problem may be, by a QA manager with a reason.
  if (state === "out-of-service") return "It cannot be used for a new run.";
  return "It cannot be used for a new run unless a QA manager allows it with a recorded reason.";
}
