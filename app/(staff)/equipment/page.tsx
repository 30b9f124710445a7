import Link from "next/link";
import { CalibrationTag } from "@/components/equipment/calibration-tag";
import { KindFilter } from "@/components/equipment/kind-filter";
import { PressureCaution } from "@/components/equipment/pressure-caution";
import styles from "@/components/equipment/equipment.module.css";
import { QueueCard } from "@/components/ui/queue-card";
import { formatDate } from "@/lib/format/dates";
import { EQUIPMENT_KIND_LABELS } from "@/lib/format/states";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listEquipment } from "@/lib/server/equipment/list-equipment";
import { formatPressure } from "@/lib/units/pressure-entry";
import { EQUIPMENT_KINDS, EQUIPMENT_STATUS_LABELS, type EquipmentKind } from "@/lib/validation/equipment";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Equipment" };

type Props = { searchParams: Promise<{ kind?: string | string[] }> };

export default async function EquipmentPage({ searchParams }: Props) {
  const actor = await requirePageUser("equipment.view");
  const zone = await getLabTimeZone();
  const asked = (await searchParams).kind;
  const kind = EQUIPMENT_KINDS.find((k) => k === asked) ?? null;
  const equipment = await listEquipment({ actor, kind: kind ?? undefined });
  const unusable = equipment.filter((e) => !e.calibration.usable && e.status !== "RETIRED").length;
  return (
    <>
      <div className="page-head">
        <div className={styles.headText}>
          <h1>Equipment</h1>
          <p className="muted">Cells, burette panels, transducers and thermometers with their latest calibration. Equipment that is out of service, overdue, failed or never calibrated cannot be used for a new run.</p>
        </div>
        {can(actor.role, "equipment.manage") && <div className="links"><Link className="button" href="/equipment/new">Register equipment</Link></div>}
      </div>
      <KindFilter active={kind} />
      <PressureCaution />
      <QueueCard title={kind ? pluralKind(kind) : "Register"} count={equipment.length} empty={kind ? "None of this kind registered." : "No equipment registered yet."} testId="equipment-list">
        {unusable > 0 && <p className="muted">{unusable} not usable for a new run.</p>}
        <table className="list">
          <thead>
            <tr><th>Asset</th><th>Kind</th><th>Name</th><th>Status</th><th>Rated max.</th><th>Calibrated</th><th>Due</th><th>Calibration</th></tr>
          </thead>
          <tbody>
            {equipment.map((e) => (
              <tr key={e.id} data-asset-tag={e.assetTag}>
                <td><Link className="mono" href={`/equipment/${encodeURIComponent(e.assetTag)}`}>{e.assetTag}</Link></td>
                <td>{EQUIPMENT_KIND_LABELS[e.kind]}</td>
                <td>{e.name}</td>
                <td>{EQUIPMENT_STATUS_LABELS[e.status]}</td>
                <td>{formatPressure(e.ratedMaxPressurePa, actor.pressureUnit)}</td>
                <td>{formatDate(e.lastCalibration?.calibratedAt, zone)}</td>
                <td>{formatDate(e.lastCalibration?.dueAt, zone)}</td>
                <td><CalibrationTag status={e.calibration} retired={e.status === "RETIRED"} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </QueueCard>
    </>
  );
}

function pluralKind(kind: EquipmentKind): string {
  return `${EQUIPMENT_KIND_LABELS[kind]}s`;
}
