"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Field } from "@/components/ui/field";
import { READING_CSV_TARGET_LABELS, READING_CSV_TARGETS, type ReadingCsvColumn, type ReadingsCsvMapping } from "@/lib/readings/readings-csv";
import type { ImportSampleRow, ImportSummary } from "@/lib/server/readings/import-readings-file";
import { PRESSURE_UNIT_SYMBOLS, type PressureUnit } from "@/lib/units/pressure-entry";
import { MAX_READINGS_FILE_BYTES, READINGS_FILE_LIMIT_TEXT } from "@/lib/validation/readings";
import { elapsedHours, fixed, pressureCell } from "./reading-format";
import styles from "./readings.module.css";
import { ScrollArea } from "@/components/ui/scroll-area";

export type CsvImportProps = { labNumber: string };

type Answer = { summary: ImportSummary | null; error: string | null };

/** Sends the file itself to the import route (no reading in the browser) and reads the answer, JSON or the front door's plain sentence. */
async function upload(labNumber: string, file: Blob, fileName: string, mapping: ReadingsCsvMapping | undefined, mode: "preview" | "save"): Promise<Answer> {
  const query = new URLSearchParams({ mode, fileName, ...(mapping && { mapping: JSON.stringify(mapping) }) });
  try {
    const response = await fetch(`/api/runs/${encodeURIComponent(labNumber)}/readings/import?${query}`, { method: "POST", body: file, headers: { "Content-Type": "text/csv" } });
    const type = response.headers.get("content-type") ?? "";
    if (!type.includes("json")) return { summary: null, error: (await response.text()).trim() || `The server answered ${response.status}; nothing was saved.` };
    const body = (await response.json()) as ImportSummary | { error: { message: string }; preview?: ImportSummary };
    if ("error" in body) return { summary: body.preview ?? null, error: body.error.message };
    return { summary: body, error: null };
  } catch {
    return { summary: null, error: "The file could not be sent; check the connection and try again. Nothing was saved." };
  }
}

/**
 * Import of a data-logger CSV: choose a file or paste its text, check the suggested column mapping on the
 * file's first and last rows, see every problem with its row, then save all rows or none. The file goes to
 * the server as it is; the server reads it as a stream and judges it against the run's saved readings,
 * exactly as the save will.
 */
export function CsvImport({ labNumber }: CsvImportProps) {
  const router = useRouter();
  const [source, setSource] = useState<{ fileName: string; file: Blob } | null>(null);
  const [pasted, setPasted] = useState("");
  const [preview, setPreview] = useState<ImportSummary | null>(null);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, setPending] = useState(false);

  const send = async (next: { fileName: string; file: Blob }, mapping: ReadingsCsvMapping | undefined, mode: "preview" | "save") => {
    setPending(true);
    const answer = await upload(labNumber, next.file, next.fileName, mapping, mode);
    setPending(false);
    if (answer.error) {
      setNotice({ ok: false, text: answer.error });
      setPreview(answer.summary);
      return;
    }
    if (mode === "save") {
      setNotice({ ok: true, text: `${answer.summary!.saved.toLocaleString("en-GB")} readings saved from ${answer.summary!.fileName}.` });
      setPreview(null);
      setSource(null);
      setPasted("");
      router.refresh();
    } else {
      setNotice(null);
      setPreview(answer.summary);
    }
  };

  const read = (next: { fileName: string; file: Blob }) => {
    if (next.file.size > MAX_READINGS_FILE_BYTES) {
      setPreview(null);
      setNotice({ ok: false, text: `${next.fileName} is ${(next.file.size / 1024 / 1024).toFixed(0)} MB. ${READINGS_FILE_LIMIT_TEXT} Nothing was saved.` });
      return;
    }
    setSource(next);
    void send(next, undefined, "preview");
  };
  const remap = (mapping: ReadingsCsvMapping) => source && void send(source, mapping, "preview");
  const setColumn = (index: number, column: ReadingCsvColumn) => preview && remap({ ...preview.mapping, columns: preview.mapping.columns.map((c, i) => (i === index ? column : c)) });

  return (
    <div data-testid="csv-import">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status" data-testid="csv-message">{notice.text}</div>}
      <div className={styles.importSource}>
        <Field label="Data-logger file (CSV)" hint={`Comma, semicolon or tab separated, with a header row. ${READINGS_FILE_LIMIT_TEXT}`}>
          <input
            type="file"
            accept=".csv,.txt,text/csv,text/plain"
            data-testid="csv-file"
            onChange={(e) => {
              const file = e.target.files?.[0];
              e.target.value = "";
              if (file) read({ fileName: file.name, file });
            }}
          />
        </Field>
        <div>
          <Field label="…or paste its text">
            <textarea rows={3} className="mono" spellCheck={false} value={pasted} onChange={(e) => setPasted(e.target.value)} data-testid="csv-paste" />
          </Field>
          <button type="button" className="button button-quiet" disabled={!pasted.trim() || pending} onClick={() => read({ fileName: "pasted text", file: new Blob([pasted], { type: "text/csv" }) })}>Read pasted text</button>
        </div>
      </div>
      {pending && <p className="muted" role="status">Reading the file…</p>}
      {preview && <ImportPreview preview={preview} pending={pending} setColumn={setColumn} remap={remap} onSave={() => source && void send(source, preview.mapping, "save")} onCancel={() => { setPreview(null); setSource(null); setNotice(null); }} />}
    </div>
  );
}

function ImportPreview({ preview, pending, setColumn, remap, onSave, onCancel }: { preview: ImportSummary; pending: boolean; setColumn: (i: number, c: ReadingCsvColumn) => void; remap: (m: ReadingsCsvMapping) => void; onSave: () => void; onCancel: () => void }) {
  const count = preview.rowCount;
  const rowsWithErrors = new Set(preview.errors.map((e) => e.row)).size;
  const row = (r: ImportSampleRow) => (
    <tr key={r.row} className={r.errors.length ? styles.badRow : undefined} data-row={r.row}>
      <td>{r.row}</td>
      {preview.header.map((_, i) => <td key={i} className={styles.num}>{r.cells[i] ?? ""}</td>)}
      <td className={styles.num}>{r.reading ? elapsedHours(r.reading.elapsedS) : "—"}</td>
      <td className={styles.num}>{fixed(r.reading?.inflowCumulativeMl, 3)}</td>
      <td className={styles.num}>{fixed(r.reading?.outflowCumulativeMl, 3)}</td>
      <td className={styles.num}>{r.reading ? pressureCell(r.reading.headPa, preview.mapping.pressureUnit) : "—"}</td>
    </tr>
  );
  return (
    <div data-testid="csv-preview">
      <p className="muted" data-testid="csv-summary">
        {preview.fileName}: {count.toLocaleString("en-GB")} row{count === 1 ? "" : "s"} of readings
        {preview.spanHours && `, ${preview.spanHours.from.toFixed(1)} h to ${preview.spanHours.to.toFixed(1)} h after permeation began`}
        {preview.errorCount === 0 ? ", no problems." : `, ${preview.errorCount.toLocaleString("en-GB")} problem${preview.errorCount === 1 ? "" : "s"}.`} Check which column holds what on the first and last rows.
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
      {(preview.mappingErrors.length > 0 || preview.errors.length > 0) && (
        <div className="notice notice-error" data-testid="csv-row-errors">
          <strong>{preview.mappingErrors.length ? "The column mapping is not complete." : `${rowsWithErrors.toLocaleString("en-GB")} row${rowsWithErrors === 1 ? " has" : "s have"} problems; nothing will be saved until they are fixed in the file.`}</strong>
          <ScrollArea className={styles.errorScroll} label="Problems in the file">
            <ul className={styles.errorList}>
              {preview.mappingErrors.map((m) => <li key={m}>{m}</li>)}
              {preview.errors.map((e) => <li key={`${e.row}-${e.field}-${e.message}`} data-row={e.row} data-field={e.field}>{e.message}</li>)}
            </ul>
          </ScrollArea>
          {preview.errorsNotListed > 0 && <p>…and {preview.errorsNotListed.toLocaleString("en-GB")} more; so many usually mean a column is mapped wrongly or in the wrong unit.</p>}
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
              <th>Elapsed (h)</th><th>Inflow (mL)</th><th>Outflow (mL)</th><th>Line Δp ({PRESSURE_UNIT_SYMBOLS[preview.mapping.pressureUnit]})</th>
            </tr>
          </thead>
          <tbody>
            {preview.first.map(row)}
            {preview.last.length > 0 && preview.first.length + preview.last.length < count && (
              <tr><td colSpan={preview.header.length + 5} className="muted">… {(count - preview.first.length - preview.last.length).toLocaleString("en-GB")} rows between …</td></tr>
            )}
            {preview.last.map(row)}
          </tbody>
        </table>
      </ScrollArea>
      <div className={styles.actions}>
        <button type="button" className="button" data-testid="csv-save" disabled={!preview.canSave || pending} onClick={onSave}>
          Save all {count.toLocaleString("en-GB")} readings
        </button>
        <button type="button" className="button button-quiet" onClick={onCancel}>Cancel</button>
        <span className="muted">All rows are saved, or none.</span>
      </div>
    </div>
  );
}
