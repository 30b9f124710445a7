import { formatDateTime } from "@/lib/format/dates";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { listRunReadings, type RunReadingView } from "@/lib/server/readings/list-run-readings";
import { PRESSURE_UNIT_SYMBOLS, type PressureUnit } from "@/lib/units/pressure-entry";
import { CorrectReadingForm } from "./correct-reading-form";
import { CsvImport } from "./csv-import";
import { ReadingsPager } from "./readings-pager";
import { elapsedHours, fixed, pressureCell, pressureInput } from "./reading-format";
import { ReadingsGrid } from "./readings-grid";
import styles from "./readings.module.css";
import { ScrollArea } from "@/components/ui/scroll-area";

/**
 * Props of the readings panel of the run page. `labNumber` is accepted for the page's convenience; the run is
 * found by id. `page` is the page of readings to show (the last when absent), `basePath` the page's address.
 */
export type ReadingsPanelProps = { runId: string; labNumber?: string; actor: CurrentUser; zone?: string; page?: number; basePath?: string };

const entryValues = (r: RunReadingView, unit: PressureUnit) => ({
  takenAt: new Date(r.takenAt).toISOString(),
  inflowLevelMm: r.inflowLevelMm === null ? "" : String(r.inflowLevelMm),
  outflowLevelMm: r.outflowLevelMm === null ? "" : String(r.outflowLevelMm),
  influentPressure: pressureInput(r.influentPressurePa, unit),
  effluentPressure: pressureInput(r.effluentPressurePa, unit),
  cellPressure: pressureInput(r.cellPressurePa, unit),
  temperatureC: String(r.temperatureC),
  influentEcMsPerM: r.influentEcMsPerM === null ? "" : String(r.influentEcMsPerM),
  effluentEcMsPerM: r.effluentEcMsPerM === null ? "" : String(r.effluentEcMsPerM),
  influentPh: r.influentPh === null ? "" : String(r.influentPh),
  effluentPh: r.effluentPh === null ? "" : String(r.effluentPh),
  afterRefill: r.afterRefill,
});

function versionText(v: RunReadingView, unit: PressureUnit, chemistry: boolean, zone: string): string {
  const p = PRESSURE_UNIT_SYMBOLS[unit];
  const parts = [
    `${formatDateTime(v.takenAt, zone)} (${elapsedHours(v.elapsedS)} h)`,
    `levels ${fixed(v.inflowLevelMm, 1)} / ${fixed(v.outflowLevelMm, 1)} mm`,
    `in ${pressureCell(v.influentPressurePa, unit)}, out ${pressureCell(v.effluentPressurePa, unit)}, cell ${pressureCell(v.cellPressurePa, unit)} ${p}`,
    `${v.temperatureC} °C`,
  ];
  if (chemistry) parts.push(`EC ${fixed(v.influentEcMsPerM, 1)} / ${fixed(v.effluentEcMsPerM, 1)} mS/m, pH ${fixed(v.influentPh, 2)} / ${fixed(v.effluentPh, 2)}`);
  return parts.join("; ");
}

/**
 * The readings of one run: the current set with raw levels, volumes, pressures in the person's unit and
 * temperature (EC and pH for D6766), each corrected reading with its earlier versions beside it; for the
 * technician performing a permeating run, the entry grid, the data-logger import and "Correct…".
 */
export async function ReadingsPanel({ runId, actor, zone = "UTC", page, basePath = "" }: ReadingsPanelProps) {
  const { run, current, last, window, history, canRecord, whyNot } = await listRunReadings({ actor, runId, ...(page !== undefined && { page }) });
  const unit = actor.pressureUnit;
  const p = PRESSURE_UNIT_SYMBOLS[unit];
  const chemistry = run.methodCode === "D6766";
  const versions = new Map(history.map((h) => [h.sequence, h.versions]));
  const columns = 13 + (chemistry ? 4 : 0);

  return (
    <section className={`card ${styles.panel}`} aria-label="Readings" id="readings">
      <h2>Readings <span className="count">{window.total.toLocaleString("en-GB")} current{run.burettePanel ? ` · burette panel ${run.burettePanel.assetTag}` : ""}{run.areasMm2 ? ` · areas ${fixed(run.areasMm2.inflow, 1)} / ${fixed(run.areasMm2.outflow, 1)} mm²` : ""}</span></h2>
      {window.pageCount > 1 && <ReadingsPager window={window} basePath={basePath} />}
      {current.length === 0 ? (
        <p className="empty">No readings yet.</p>
      ) : (
        <ScrollArea>
          <table className={`list wrap-heads ${styles.numbers}`} data-testid="readings-table">
            <thead>
              <tr>
                <th>#</th><th>Taken</th><th>Elapsed (h)</th><th>Inflow level (mm)</th><th>Outflow level (mm)</th><th>Inflow (mL)</th><th>Outflow (mL)</th>
                <th>Line Δp ({p})</th><th>Influent ({p})</th><th>Effluent ({p})</th><th>Cell ({p})</th><th>Temp. (°C)</th>
                {chemistry && <><th>EC in</th><th>EC out</th><th>pH in</th><th>pH out</th></>}
                <th>Recorded</th>
              </tr>
            </thead>
            <tbody>
              {current.flatMap((r) => {
                const earlier = (versions.get(r.sequence) ?? []).filter((v) => v.id !== r.id);
                const rowsOut = [
                  <tr key={r.id} data-sequence={r.sequence}>
                    <td>{r.sequence}{r.corrected && <span className={`state state-warn ${styles.correctedTag}`} data-testid="reading-corrected">corrected</span>}{r.afterRefill && <span className={`state ${styles.correctedTag}`} data-testid="reading-after-refill" title="Taken just after a refill or drain: no interval ends here">after refill</span>}</td>
                    <td className="mono">{formatDateTime(r.takenAt, zone)}</td>
                    <td className={styles.num}>{elapsedHours(r.elapsedS)}</td>
                    <td className={styles.num}>{fixed(r.inflowLevelMm, 1)}</td>
                    <td className={styles.num}>{fixed(r.outflowLevelMm, 1)}</td>
                    <td className={styles.num}>{fixed(r.inflowMl, 3)}</td>
                    <td className={styles.num}>{fixed(r.outflowMl, 3)}</td>
                    <td className={styles.num}>{pressureCell(r.headPa, unit)}</td>
                    <td className={styles.num}>{pressureCell(r.influentPressurePa, unit)}</td>
                    <td className={styles.num}>{pressureCell(r.effluentPressurePa, unit)}</td>
                    <td className={styles.num}>{pressureCell(r.cellPressurePa, unit)}</td>
                    <td className={styles.num}>{fixed(r.temperatureC, 1)}</td>
                    {chemistry && <><td className={styles.num}>{fixed(r.influentEcMsPerM, 1)}</td><td className={styles.num}>{fixed(r.effluentEcMsPerM, 1)}</td><td className={styles.num}>{fixed(r.influentPh, 2)}</td><td className={styles.num}>{fixed(r.effluentPh, 2)}</td></>}
                    <td className={styles.recorded}>
                      <span className="muted">{r.recordedBy.name} · {r.source === "manual" ? "entered" : r.source}</span>
                      {canRecord && <> <CorrectReadingForm readingId={r.id} sequence={r.sequence} pressureUnit={unit} withChemistry={chemistry} values={entryValues(r, unit)} zone={zone} /></>}
                    </td>
                  </tr>,
                ];
                if (earlier.length)
                  rowsOut.push(
                    <tr key={`${r.id}-history`} className={styles.historyRow} data-testid={`reading-history-${r.sequence}`}>
                      <td />
                      <td colSpan={columns - 1}>
                        <ol className={styles.history}>
                          {[...earlier, r].map((v, i) => (
                            <li key={v.id}>
                              <span className={v.id === r.id ? undefined : styles.struck}>{versionText(v, unit, chemistry, zone)}</span>
                              {" — "}
                              {i === 0 ? `original, recorded by ${v.recordedBy.name} on ${formatDateTime(v.createdAt, zone)} (${v.source === "manual" ? "entered" : v.source})` : `corrected by ${v.recordedBy.name} on ${formatDateTime(v.createdAt, zone)}: “${v.correctionReason}”`}
                            </li>
                          ))}
                        </ol>
                      </td>
                    </tr>,
                  );
                return rowsOut;
              })}
            </tbody>
          </table>
        </ScrollArea>
      )}
      {canRecord ? (
        <>
          <div>
            <h3>Enter readings</h3>
            <ReadingsGrid
              runId={run.id}
              pressureUnit={unit}
              withChemistry={chemistry}
              zone={zone}
              lastTimes={current.slice(-2).map((r) => new Date(r.takenAt).toISOString())}
              carryOver={last ? { influentPressure: pressureInput(last.influentPressurePa, unit), effluentPressure: pressureInput(last.effluentPressurePa, unit), cellPressure: pressureInput(last.cellPressurePa, unit), temperatureC: last.temperatureC.toFixed(1) } : {}}
            />
          </div>
          <div>
            <h3>Import a data-logger file</h3>
            <CsvImport labNumber={run.labNumber} />
          </div>
        </>
      ) : (
        <p className="muted">{whyNot}</p>
      )}
    </section>
  );
}
