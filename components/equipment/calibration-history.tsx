import { formatDate, formatDateTime } from "@/lib/format/dates";
import { readBurettePanel, readCalibrationValues, readLeakageCheck, UNCERTAINTY_BY_KIND } from "@/lib/equipment/calibration-values";
import { formatNumber } from "@/lib/results/format-result";
import type { EquipmentKind } from "@/lib/validation/equipment";
import styles from "./equipment.module.css";
import { ScrollArea } from "@/components/ui/scroll-area";

type CalibrationRow = {
  id: string; calibratedAt: Date; dueAt: Date; reference: string; performedBy: string; passed: boolean; values: unknown;
  createdAt: Date; recordedBy: { name: string };
};

const mm = (v: number, unit = "mm") => `${Number(v.toFixed(3))} ${unit}`;

/** What else the calibration records: burette zeros and range, standard uncertainty, leakage check. */
function extras(kind: EquipmentKind, values: unknown): string {
  const v = readCalibrationValues(values);
  const parts: string[] = [];
  const panel = readBurettePanel(values);
  if (panel && (v.inflowZeroAboveDatumMm !== undefined || v.outflowZeroAboveDatumMm !== undefined)) parts.push(`zeros above datum ${mm(panel.inflowZeroAboveDatumMm)} / ${mm(panel.outflowZeroAboveDatumMm)}`);
  if (panel?.scaleRangeMm) parts.push(`scale ${mm(panel.scaleRangeMm.min)} to ${mm(panel.scaleRangeMm.max)}`);
  const u = UNCERTAINTY_BY_KIND[kind];
  if (u && v.standardUncertainty !== undefined) parts.push(`u = ${v.standardUncertainty} ${u.unit}`);
  const leak = readLeakageCheck(values);
  if (leak) parts.push(`leakage ${leak.rateM3PerS !== undefined ? `${formatNumber(leak.rateM3PerS)} m³/s` : `${formatNumber(leak.fluxM3PerM2PerS!)} m³/m²/s`} (${leak.checkedAt.slice(0, 10)}, ${leak.method})`);
  return parts.join("; ");
}

/** Every calibration of one instrument, latest first; a burette panel's rows show the calibrated areas. */
export function CalibrationHistory({ kind, calibrations, zone = "UTC" }: { kind: EquipmentKind; calibrations: CalibrationRow[]; zone?: string }) {
  if (calibrations.length === 0) return <p className="empty">No calibration on record: it cannot be used for a run until one is recorded.</p>;
  const burettes = kind === "BURETTE_PANEL";
  return (
    <ScrollArea>
      <table className="list" data-testid="calibration-history">
        <thead>
          <tr>
            <th>Calibrated</th><th>Due</th><th>Reference</th><th>Performed by</th><th>Result</th>
            {burettes && <><th>Inflow burette</th><th>Outflow burette</th></>}
            <th>Also recorded</th>
            <th>Recorded</th>
          </tr>
        </thead>
        <tbody>
          {calibrations.map((c, index) => {
            const panel = readBurettePanel(c.values);
            return (
              <tr key={c.id}>
                <td className={styles.nowrap}>{formatDate(c.calibratedAt, zone)}{index === 0 && <span className="muted"> (latest)</span>}</td>
                <td className={styles.nowrap}>{formatDate(c.dueAt, zone)}</td>
                <td className="mono">{c.reference}</td>
                <td>{c.performedBy}</td>
                <td>{c.passed ? <span className="state state-ok">passed</span> : <span className="state state-bad">failed</span>}</td>
                {burettes && <><td className={styles.nowrap}>{panel ? mm(panel.inflowAreaMm2, "mm²") : "—"}</td><td className={styles.nowrap}>{panel ? mm(panel.outflowAreaMm2, "mm²") : "—"}</td></>}
                <td>{extras(kind, c.values) || "—"}</td>
                <td className="muted">{c.recordedBy.name}, {formatDateTime(c.createdAt, zone)}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </ScrollArea>
  );
}
