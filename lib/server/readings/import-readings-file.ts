import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { SequenceField } from "@/lib/readings/check-reading-sequence";
import { CsvRecordReader, type CsvRecord } from "@/lib/readings/csv-record-reader";
import type { PreparedReading } from "@/lib/readings/prepare-readings";
import type { ReadingDraft } from "@/lib/readings/reading-draft";
import { applyReadingsMapping, checkReadingsMapping, suggestReadingsMapping, type ReadingCsvTarget, type ReadingsCsvMapping } from "@/lib/readings/readings-csv";
import { importReadingsFileSchema, MAX_READINGS_FILE_BYTES, MAX_READINGS_FILE_ROWS } from "@/lib/validation/readings";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { withActor } from "../db/transaction";
import { readLabTimeZone } from "../lab/read-lab-time-zone";
import { parseOrThrow } from "../validation/parse";
import { insertReadings } from "./insert-readings";
import { loadReadingContext, nothingSavedMessage, prepareOnRun } from "./reading-context";

export type ImportRowError = { row: number; field: ReadingCsvTarget | "row"; message: string };
export type ImportSampleRow = { row: number; cells: string[]; reading: PreparedReading | null; errors: ImportRowError[] };

/** What a data-logger file holds, judged as the save would judge it: counts, first and last rows, every error. */
export type ImportSummary = {
  fileName: string;
  labNumber: string;
  header: string[];
  mapping: ReadingsCsvMapping;
  mappingErrors: string[];
  rowCount: number;
  errorCount: number;
  /** Every error with its row, up to MAX_LISTED_ERRORS; `errorsNotListed` counts the rest. */
  errors: ImportRowError[];
  errorsNotListed: number;
  first: ImportSampleRow[];
  last: ImportSampleRow[];
  /** Elapsed hours since permeation began of the first and last good rows. */
  spanHours: { from: number; to: number } | null;
  canSave: boolean;
  saved: number;
};

const SAMPLE_ROWS = 5;
/** A file with more errors than this is wrong throughout (a wrong column or unit); listing them all helps no one. */
export const MAX_LISTED_ERRORS = 2_000;
/** Up to two minutes for a long file's one transaction (the default is 15 s). */
const IMPORT_TRANSACTION_MS = 120_000;

function sequenceTarget(field: SequenceField, mapping: ReadingsCsvMapping): ReadingCsvTarget {
  if (field === "time") return mapping.columns.includes("elapsed") ? "elapsed" : "takenAt";
  return field === "head" ? "effluentPressure" : field;
}

/**
 * A data-logger file for a run, read from `body` as it arrives (bytes decoded as UTF-8, split into records,
 * each record mapped at once; the text is never held whole). "preview" judges every row against the others
 * and the run's saved readings and saves nothing; "save" does the same and then saves every row in one
 * transaction, or, if anything is wrong, nothing. Each saved reading's source is the file name.
 */
export async function importReadingsFile(options: { actor: CurrentUser; input: unknown; body: AsyncIterable<Uint8Array | string> | Iterable<Uint8Array | string>; now?: Date }): Promise<ImportSummary> {
  requirePermission(options.actor, "run.operate");
  const input = parseOrThrow(importReadingsFileSchema, options.input);
  const run = await getDb().run.findUnique({ where: { labNumber: input.labNumber }, select: { id: true } });
  if (!run) throw new AppError("NOT_FOUND");
  const timeZone = await readLabTimeZone(getDb());

  const file = await readFile(input.fileName, options.body, input.mapping ?? null, options.actor, timeZone);
  const mapping = file.mapping;
  const mappingErrors = checkReadingsMapping(file.header, mapping);
  if (file.header.length > 0 && file.rowCount === 0) mappingErrors.push("The file has a header row but no readings under it.");

  return withActor(
    options.actor,
    async (tx) => {
      const ctx = await loadReadingContext(tx, { actor: options.actor, runId: run.id });
      const { rows: prepared, problems } = mappingErrors.length ? { rows: [], problems: [] } : prepareOnRun(ctx, file.drafts.map((d) => ({ label: `Row ${d.row}`, draft: d.draft })), { ...(options.now && { now: options.now }), pressureUnit: mapping.pressureUnit });
      const errors = [...file.errors, ...problems.map((p) => ({ row: file.drafts[p.index]!.row, field: sequenceTarget(p.field, mapping), message: p.message }))].sort((a, b) => a.row - b.row);
      const byRow = new Map<number, ImportRowError[]>();
      for (const e of errors) byRow.set(e.row, [...(byRow.get(e.row) ?? []), e]);
      const draftIndex = new Map(file.drafts.map((d, i) => [d.row, i]));
      const sample = (r: CsvRecord): ImportSampleRow => {
        const i = draftIndex.get(r.line);
        return { row: r.line, cells: r.cells, reading: i === undefined ? null : (prepared[i] ?? null), errors: byRow.get(r.line) ?? [] };
      };
      const errorCount = errors.length + mappingErrors.length;
      const summary: ImportSummary = {
        fileName: input.fileName, labNumber: ctx.run.labNumber, header: file.header, mapping, mappingErrors,
        rowCount: file.rowCount, errorCount, errors: errors.slice(0, MAX_LISTED_ERRORS), errorsNotListed: Math.max(0, errors.length - MAX_LISTED_ERRORS),
        first: file.first.map(sample), last: file.last.filter((r) => !file.first.some((f) => f.line === r.line)).map(sample),
        spanHours: prepared.length ? { from: prepared[0]!.elapsedS / 3600, to: prepared[prepared.length - 1]!.elapsedS / 3600 } : null,
        canSave: errorCount === 0 && file.rowCount > 0, saved: 0,
      };
      if (input.mode === "preview") return summary;
      if (!summary.canSave)
        throw new AppError("INVALID_INPUT", nothingSavedMessage([...mappingErrors, ...errors.map((e) => e.message)], `Nothing was saved from ${input.fileName}.`), { details: { preview: summary } });
      const saved = await insertReadings(tx, prepared, { runId: ctx.run.id, firstSequence: ctx.nextSequence, source: input.fileName, recordedById: options.actor.id });
      return { ...summary, saved };
    },
    { timeoutMs: IMPORT_TRANSACTION_MS },
  );
}

type ReadFile = {
  header: string[];
  mapping: ReadingsCsvMapping;
  rowCount: number;
  drafts: Array<{ row: number; draft: ReadingDraft }>;
  errors: ImportRowError[];
  first: CsvRecord[];
  last: CsvRecord[];
};

const notText = (fileName: string) =>
  new AppError("INVALID_INPUT", `${fileName} is not a text file (it holds bytes that are not UTF-8 text); export the logger's readings as CSV text and choose that file.`);

/** Decodes, splits and maps the file as it arrives, keeping only the drafts, the errors and a few sample rows. */
async function readFile(fileName: string, body: AsyncIterable<Uint8Array | string> | Iterable<Uint8Array | string>, chosen: ReadingsCsvMapping | null, actor: CurrentUser, timeZone: string): Promise<ReadFile> {
  const decoder = new TextDecoder("utf-8", { fatal: true });
  const reader = new CsvRecordReader();
  const out: ReadFile = { header: [], mapping: chosen ?? { columns: [], elapsedUnit: "h", pressureUnit: actor.pressureUnit }, rowCount: 0, drafts: [], errors: [], first: [], last: [] };
  let headerSeen = false;
  let mappingFixed = false;
  let bytes = 0;
  const take = (records: CsvRecord[]) => {
    if (!records.length) return;
    const rows: CsvRecord[] = [];
    for (const r of records) {
      const cells = r.cells.map((c) => c.trim());
      if (!headerSeen) {
        out.header = cells;
        headerSeen = true;
      } else rows.push({ line: r.line, cells });
    }
    if (!rows.length) return;
    out.rowCount += rows.length;
    if (out.rowCount > MAX_READINGS_FILE_ROWS)
      throw new AppError("INVALID_INPUT", `${fileName} has more than ${MAX_READINGS_FILE_ROWS.toLocaleString("en-GB")} rows, the most one import takes; split it by date and import each part in order. Nothing was saved.`);
    if (!mappingFixed) {
      out.mapping = chosen ?? suggestReadingsMapping({ header: out.header, rows: [{ row: rows[0]!.line, cells: rows[0]!.cells }] }, actor.pressureUnit);
      mappingFixed = true;
    }
    for (const r of rows) {
      if (out.first.length < SAMPLE_ROWS) out.first.push(r);
      out.last.push(r);
      if (out.last.length > SAMPLE_ROWS) out.last.shift();
    }
    if (checkReadingsMapping(out.header, out.mapping).length) return;
    const mapped = applyReadingsMapping({ separator: reader.separator ?? ",", header: out.header, rows: rows.map((r) => ({ row: r.line, cells: r.cells })) }, out.mapping, { timeZone });
    for (const m of mapped) {
      if (m.values) out.drafts.push({ row: m.row, draft: m.values });
      for (const e of m.errors) out.errors.push({ row: e.row, field: e.field, message: e.message });
    }
  };
  for await (const chunk of body) {
    let text: string;
    if (typeof chunk === "string") text = chunk;
    else {
      bytes += chunk.byteLength;
      if (bytes > MAX_READINGS_FILE_BYTES)
        throw new AppError("INVALID_INPUT", `${fileName} is larger than ${MAX_READINGS_FILE_BYTES / 1024 / 1024} MB, the most one import takes; split it by date and import each part in order. Nothing was saved.`);
      try {
        text = decoder.decode(chunk, { stream: true });
      } catch {
        throw notText(fileName);
      }
    }
    if (text.includes("\u0000")) throw notText(fileName);
    take(reader.push(text));
  }
  try {
    const rest = decoder.decode();
    if (rest) take(reader.push(rest));
  } catch {
    throw notText(fileName);
  }
  take(reader.end());
  if (!mappingFixed && chosen === null) out.mapping = suggestReadingsMapping({ header: out.header, rows: [] }, actor.pressureUnit);
  return out;
}
