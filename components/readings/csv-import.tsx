"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { importReadingsCsvAction } from "@/app/(staff)/runs/[labNumber]/readings-actions";
import { Field } from "@/components/ui/field";
import { READING_CSV_TARGET_LABELS, READING_CSV_TARGETS, type ReadingCsvColumn, type ReadingsCsvMapping } from "@/lib/readings/readings-csv";
import type { CsvPreview } from "@/lib/server/readings/import-readings-csv";
import { PRESSURE_UNIT_SYMBOLS, type PressureUnit } from "@/lib/units/pressure-entry";
import { elapsedHours, fixed, pressureCell } from "./reading-format";
import styles from "./readings.module.css";
import { ScrollArea } from "@/components/ui/scroll-area";

export type CsvImportProps = { runId: string };

/** Rows shown in the preview besides every row with an error. */
const PREVIEW_ROWS = 50;

// Leaves room under the 1 MB request limit for the rest of the request (mapping, escapes).
const MAX_FILE_BYTES = 900_000;

/**
 * Import of a data-logger CSV: choose a file or paste its text, check the suggested column mapping,
 * see every row as it would be saved with the problems of each, then save all rows or none. The preview
 * is judged by the server against the run's saved readings, exactly as the save will be.
 */
export function CsvImport({ runId }: CsvImportProps) {
  const router = useRouter();
  const [source, setSource] = useState<{ fileName: string; text: string } | null>(null);
  const [pasted, setPasted] = useState("");
  const [preview, setPreview] = useState<CsvPreview | null>(null);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, startTransition] = useTransition();

  const send = (next: { fileName: string; text: string }, mapping: ReadingsCsvMapping | undefined, mode: "preview" | "save") =>
    startTransition(async () => {
      const result = await importReadingsCsvAction({ runId, fileName: next.fileName, text: next.text, mapping, mode });
      if (result.ok) {
        if (mode === "save") {
          setNotice({ ok: true, text: `${result.data.saved} readings saved from ${result.data.fileName}.` });
          setPreview(null);
          setSource(null);
          setPasted("");
          router.refresh();
        } else {
          setNotice(null);
          setPreview(result.data);
        }
        return;
      }
      setNotice({ ok: false, text: result.message });
      const failed = result.details?.preview as CsvPreview | undefined;
      if (failed) setPreview(failed);
    });

  const read = (next: { fileName: string; text: string }) => {
    // The app accepts at most 1 MB in one request (scripts/app-server.mjs); say so before sending more.
    if (new Blob([next.text]).size > MAX_FILE_BYTES) {
      setNotice({ ok: false, text: `${next.fileName} is larger than Seepline accepts at once (about 900 kB); split it by date into parts and import each.` });
      return;
    }
    setSource(next);
    send(next, undefined, "preview");
  };
  const remap = (mapping: ReadingsCsvMapping) => source && send(source, mapping, "preview");
  const setColumn = (index: number, column: ReadingCsvColumn) => preview && remap({ ...preview.mapping, columns: preview.mapping.columns.map((c, i) => (i === index ? column : c)) });

  const rowsWithErrors = preview?.rows.filter((r) => r.errors.length) ?? [];
  const shown = preview ? preview.rows.filter((r, i) => i < PREVIEW_ROWS || r.errors.length) : [];
  const count = preview?.rows.length ?? 0;

  return (
    <div data-testid="csv-import">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status" data-testid="csv-message">{notice.text}</div>}
      <div className={styles.importSource}>
        <Field label="Data-logger file (CSV)" hint="Comma, semicolon or tab separated, with a header row.">
          <input
            type="file"
            accept=".csv,.txt,text/csv,text/plain"
            data-testid="csv-file"
            onChange={async (e) => {
              const file = e.target.files?.[0];
              e.target.value = "";
              if (file) read({ fileName: file.name, text: await file.text() });
            }}
          />
        </Field>
        <div>
          <Field label="…or paste its text">
            <textarea rows={3} className="mono" spellCheck={false} value={pasted} onChange={(e) => setPasted(e.target.value)} data-testid="csv-paste" />
          </Field>
          <button type="button" className="button button-quiet" disabled={!pasted.trim() || pending} onClick={() => read({ fileName: "pasted text", text: pasted })}>Read pasted text</button>
        </div>
      </div>
      {pending && <p className="muted">Reading…</p>}
      {preview && (
        <div data-testid="csv-preview">
          <p className="muted">
            {preview.fileName}: {count} row{count === 1 ? "" : "s"} of readings. Check which column holds what; rows with problems are marked.
            {count > shown.length && ` Showing the first ${PREVIEW_ROWS} rows and every row with a problem.`}
          </p>
          <div className={styles.units}>
            <label>Elapsed time in{" "}
              <select value={preview.mapping.elapsedUnit} onChange={(e) => remap({ ...preview.mapping, elapsedUnit: e.target.value as ReadingsCsvMapping["elapsedUnit"] })} aria-label="Unit of the elapsed time">
                <option value="s">seconds</option><option value="min">minutes</option><option value="h">hours</option>
              </select>
            </label>
            <label>Pressures in{" "}
              <select value={preview.mapping.pressureUnit} onChange={(e) => remap({ ...preview.mapping, pressureUnit: e.target.value as PressureUnit })} aria-label="Unit of the pressures">
                <option value="KPA">kPa</option><option value="PSI">psi</option>
              </select>
            </label>
          </div>
          {(preview.mappingErrors.length > 0 || rowsWithErrors.length > 0) && (
            <div className="notice notice-error" data-testid="csv-row-errors">
              <strong>{preview.mappingErrors.length ? "The column mapping is not complete." : `${rowsWithErrors.length} row${rowsWithErrors.length === 1 ? " has" : "s have"} problems; nothing will be saved until they are fixed in the file.`}</strong>
              <ScrollArea className={styles.errorScroll} label="Problems in the file">
                <ul className={styles.errorList}>
                  {preview.mappingErrors.map((m) => <li key={m}>{m}</li>)}
                  {rowsWithErrors.flatMap((r) => r.errors.map((e) => <li key={`${r.row}-${e.field}-${e.message}`} data-row={r.row} data-field={e.field}>{e.message}</li>))}
                </ul>
              </ScrollArea>
            </div>
          )}
          <ScrollArea>
            <table className={`list ${styles.mapping} ${styles.numbers}`}>
              <thead>
                <tr>
                  <th>Row</th>
                  {preview.header.map((h, i) => (
                    <th key={`${h}-${i}`}>
                      <span className={styles.columnName}>{h || `column ${i + 1}`}</span>
                      <select value={preview.mapping.columns[i] ?? "ignore"} onChange={(e) => setColumn(i, e.target.value as ReadingCsvColumn)} aria-label={`Column "${h}" holds`} data-testid={`csv-map-${i}`}>
                        <option value="ignore">(not used)</option>
                        {READING_CSV_TARGETS.map((t) => <option key={t} value={t}>{READING_CSV_TARGET_LABELS[t]}</option>)}
                      </select>
                    </th>
                  ))}
                  <th>Elapsed (h)</th><th>Inflow (mL)</th><th>Outflow (mL)</th><th>Head ({PRESSURE_UNIT_SYMBOLS[preview.mapping.pressureUnit]})</th>
                </tr>
              </thead>
              <tbody>
                {shown.map((r) => (
                  <tr key={r.row} className={r.errors.length ? styles.badRow : undefined} data-row={r.row}>
                    <td>{r.row}</td>
                    {preview.header.map((_, i) => <td key={i} className={styles.num}>{r.cells[i] ?? ""}</td>)}
                    <td className={styles.num}>{r.reading ? elapsedHours(r.reading.elapsedS) : "—"}</td>
                    <td className={styles.num}>{fixed(r.reading?.inflowCumulativeMl, 3)}</td>
                    <td className={styles.num}>{fixed(r.reading?.outflowCumulativeMl, 3)}</td>
                    <td className={styles.num}>{r.reading ? pressureCell(r.reading.headPa, preview.mapping.pressureUnit) : "—"}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollArea>
          <div className={styles.actions}>
            <button type="button" className="button" data-testid="csv-save" disabled={!preview.canSave || pending} onClick={() => source && send(source, preview.mapping, "save")}>
              Save all {count} readings
            </button>
            <button type="button" className="button button-quiet" onClick={() => { setPreview(null); setSource(null); setNotice(null); }}>Cancel</button>
            <span className="muted">All rows are saved, or none.</span>
          </div>
        </div>
      )}
    </div>
  );
}
