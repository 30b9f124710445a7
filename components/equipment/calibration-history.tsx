import { formatDate, formatDateTime } from "@/lib/format/dates";
import { m2ToMm2, readBuretteAreasM2, type EquipmentKind } from "@/lib/validation/equipment";
import styles from "./equipment.module.css";

type CalibrationRow = {
  id: string; calibratedAt: Date; dueAt: Date; reference: string; performedBy: string; passed: boolean; values: unknown;
  createdAt: Date; recordedBy: { name: string };
};

/** mm² with up to three decimals and no trailing zeros: 31.4, 78.54. */
const mm2 = (m2: number) => `${Number(m2ToMm2(m2).toFixed(3))} mm²`;

/** Every calibration of one instrument, latest first; a burette panel's rows show the calibrated areas. */
export function CalibrationHistory({ kind, calibrations, zone = "UTC" }: { kind: EquipmentKind; calibrations: CalibrationRow[]; zone?: string }) {
  if (calibrations.length === 0) return <p className="empty">No calibration on record: it cannot be used for a run until one is recorded.</p>;
  const burettes = kind === "BURETTE_PANEL";
  return (
    <div className="table-wrap">
      <table className="list" data-testid="calibration-history">
        <thead>
          <tr>
            <th>Calibrated</th><th>Due</th><th>Reference</th><th>Performed by</th><th>Result</th>
            {burettes && <><th>Inflow burette</th><th>Outflow burette</th></>}
            <th>Recorded</th>
          </tr>
        </thead>
        <tbody>
          {calibrations.map((c, index) => {
            const areas = readBuretteAreasM2(c.values);
            return (
              <tr key={c.id}>
                <td className={styles.nowrap}>{formatDate(c.calibratedAt, zone)}{index === 0 && <span className="muted"> (latest)</span>}</td>
                <td className={styles.nowrap}>{formatDate(c.dueAt, zone)}</td>
                <td className="mono">{c.reference}</td>
                <td>{c.performedBy}</td>
                <td>{c.passed ? <span className="state state-ok">passed</span> : <span className="state state-bad">failed</span>}</td>
                {burettes && <><td className={styles.nowrap}>{areas ? mm2(areas.inflowBuretteAreaM2) : "—"}</td><td className={styles.nowrap}>{areas ? mm2(areas.outflowBuretteAreaM2) : "—"}</td></>}
                <td className="muted">{c.recordedBy.name}, {formatDateTime(c.createdAt, zone)}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
