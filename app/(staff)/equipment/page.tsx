import { QueueCard } from "@/components/ui/queue-card";
import { formatDate } from "@/lib/format/dates";
import { formatPressure } from "@/lib/format/pressure";
import { EQUIPMENT_KIND_LABELS } from "@/lib/format/states";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listEquipment } from "@/lib/server/equipment/list-equipment";

export const metadata = { title: "Equipment" };

export default async function EquipmentPage() {
  const actor = await requirePageUser("equipment.view");
  const equipment = await listEquipment({ actor });
  const now = new Date();
  return (
    <>
      <h1>Equipment</h1>
      <p className="muted">Cells, burette panels, transducers and thermometers with their latest calibration. Equipment past its due date cannot be used for a new run.</p>
      <QueueCard title="Register" count={equipment.length} empty="No equipment registered yet." testId="equipment-list">
        <table className="list">
          <thead><tr><th>Asset</th><th>Kind</th><th>Name</th><th>Rated max.</th><th>Calibrated</th><th>Due</th></tr></thead>
          <tbody>
            {equipment.map((e) => {
              const due = e.lastCalibration?.dueAt;
              return (
                <tr key={e.id}>
                  <td className="mono">{e.assetTag}</td><td>{EQUIPMENT_KIND_LABELS[e.kind]}</td><td>{e.name}</td>
                  <td>{formatPressure(e.ratedMaxPressurePa, actor.pressureUnit)}</td><td>{formatDate(e.lastCalibration?.calibratedAt)}</td>
                  <td>{!due ? <span className="state state-bad">never</span> : due < now ? <span className="state state-bad">overdue {formatDate(due)}</span> : formatDate(due)}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </QueueCard>
    </>
  );
}
