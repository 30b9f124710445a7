/**
 * Reading a data-logger CSV of permeation readings: split it (comma, semicolon or tab separated, a
 * header row, optionally quoted cells, decimal comma when the separator is not a comma), suggest which
 * column holds what from the header names, and apply the mapping the person chose. Every problem names
 * the row as the person counts it in a spreadsheet (the header is row 1) and the column. Pure.
 */
import { enteredPressureToPa, type PressureUnit } from "@/lib/units/pressure-entry";
import type { ReadingDraft } from "./reading-draft";
import { fromWallTime } from "../format/time-zone";
import { readCalendarDate } from "../validation/record-dates";
import { CsvRecordReader } from "./csv-record-reader";

export const READING_CSV_TARGETS = [
  "takenAt", "elapsed", "inflowLevelMm", "outflowLevelMm", "influentPressure", "effluentPressure", "cellPressure",
  "temperatureC", "influentEcMsPerM", "effluentEcMsPerM", "influentPh", "effluentPh", "afterRefill",
] as const;
export type ReadingCsvTarget = (typeof READING_CSV_TARGETS)[number];
export type ReadingCsvColumn = ReadingCsvTarget | "ignore";
export type ElapsedUnit = "s" | "min" | "h";

export const READING_CSV_TARGET_LABELS: Record<ReadingCsvTarget, string> = {
  takenAt: "date and time",
  elapsed: "elapsed time",
  inflowLevelMm: "inflow burette level (mm)",
  outflowLevelMm: "outflow burette level (mm)",
  influentPressure: "influent pressure",
  effluentPressure: "effluent pressure",
  cellPressure: "cell pressure",
  temperatureC: "temperature (°C)",
  influentEcMsPerM: "influent EC (mS/m)",
  effluentEcMsPerM: "effluent EC (mS/m)",
  influentPh: "influent pH",
  effluentPh: "effluent pH",
  afterRefill: "refill or drain mark",
};

/** Which column holds what (one entry per header column), and the units of the time and pressure columns. */
export type ReadingsCsvMapping = { columns: ReadingCsvColumn[]; elapsedUnit: ElapsedUnit; pressureUnit: PressureUnit };

export type ParsedReadingsCsv = {
  separator: "," | ";" | "\t";
  header: string[];
  /** Data rows; `row` is the spreadsheet row number (header = 1), blank lines counted but skipped. */
  rows: Array<{ row: number; cells: string[] }>;
};

/** A problem with one row; `field` is the mapped target, or "row" for the shape of the row itself. */
export type ReadingCsvRowError = { row: number; field: ReadingCsvTarget | "row"; message: string };

export type MappedCsvRow = { row: number; values: ReadingDraft | null; errors: ReadingCsvRowError[] };

const REQUIRED: readonly ReadingCsvTarget[] = ["inflowLevelMm", "outflowLevelMm", "influentPressure", "effluentPressure", "temperatureC"];

/** Splits the text into a header and data rows (CsvRecordReader, all at once). Throws nothing; an empty file gives an empty header. */
export function parseReadingsCsv(text: string): ParsedReadingsCsv {
  const reader = new CsvRecordReader();
  const records = [...reader.push(text), ...reader.end()];
  const [head, ...rest] = records;
  return { separator: reader.separator ?? ",", header: head ? head.cells.map((c) => c.trim()) : [], rows: rest.map((r) => ({ row: r.line, cells: r.cells.map((c) => c.trim()) })) };
}

const words = (header: string) => header.toLowerCase().replace(/°/g, " ").split(/[^a-z0-9µ]+/).filter(Boolean);
const has = (ws: string[], ...options: string[]) => options.some((o) => ws.includes(o));
const startsWithAny = (ws: string[], ...prefixes: string[]) => ws.some((w) => prefixes.some((p) => w.startsWith(p)));

function guessTarget(header: string, sample: string): ReadingCsvTarget | null {
  const ws = words(header);
  if (startsWithAny(ws, "refill", "drain", "event", "mark", "note")) return "afterRefill";
  const inSide = has(ws, "in", "inflow", "influent", "inlet", "inf");
  const outSide = has(ws, "out", "outflow", "effluent", "outlet", "eff");
  if (has(ws, "ph")) return outSide ? "effluentPh" : inSide ? "influentPh" : null;
  if (has(ws, "ec", "conductivity", "cond")) return outSide ? "effluentEcMsPerM" : inSide ? "influentEcMsPerM" : null;
  if (startsWithAny(ws, "temp")) return "temperatureC";
  if (has(ws, "elapsed", "duration", "runtime")) return "elapsed";
  if (has(ws, "date", "timestamp", "datetime", "clock")) return "takenAt";
  if (has(ws, "time")) return /^[+-]?[\d.,]+$/.test(sample) ? "elapsed" : "takenAt";
  if (has(ws, "cell", "confining", "chamber")) return "cellPressure";
  const pressure = has(ws, "kpa", "psi", "pressure", "press", "p", "bar");
  const level = has(ws, "burette", "level", "mm", "scale");
  if (has(ws, "inflow", "in", "inlet") && !pressure) return "inflowLevelMm";
  if (has(ws, "outflow", "out", "outlet") && !pressure) return "outflowLevelMm";
  if (has(ws, "influent", "inf") && !level) return "influentPressure";
  if (has(ws, "effluent", "eff") && !level) return "effluentPressure";
  if (inSide) return level ? "inflowLevelMm" : "influentPressure";
  if (outSide) return level ? "outflowLevelMm" : "effluentPressure";
  return null;
}

function guessElapsedUnit(header: string): ElapsedUnit {
  const ws = words(header);
  if (has(ws, "s", "sec", "secs", "second", "seconds")) return "s";
  if (has(ws, "min", "mins", "minute", "minutes")) return "min";
  return "h";
}

/**
 * A first guess at the mapping from the header names (and the first data row, to tell a clock time
 * from an elapsed time). Each target goes to at most one column; when both a date-time and an elapsed
 * column exist the elapsed one is used, since it does not depend on the logger's clock or time zone.
 * Pressures are taken as psi or kPa when a header says so, otherwise in `fallbackPressureUnit`.
 */
export function suggestReadingsMapping(parsed: Pick<ParsedReadingsCsv, "header" | "rows">, fallbackPressureUnit: PressureUnit = "KPA"): ReadingsCsvMapping {
  const sample = parsed.rows[0]?.cells ?? [];
  const taken = new Set<ReadingCsvTarget>();
  const columns: ReadingCsvColumn[] = parsed.header.map((h, i) => {
    const target = guessTarget(h, sample[i] ?? "");
    if (!target || taken.has(target)) return "ignore";
    taken.add(target);
    return target;
  });
  if (taken.has("elapsed") && taken.has("takenAt")) columns[columns.indexOf("takenAt")] = "ignore";
  const elapsedIndex = columns.indexOf("elapsed");
  const pressureHeaders = parsed.header.filter((_, i) => ["influentPressure", "effluentPressure", "cellPressure"].includes(columns[i]!));
  return {
    columns,
    elapsedUnit: elapsedIndex >= 0 ? guessElapsedUnit(parsed.header[elapsedIndex]!) : "h",
    pressureUnit: pressureHeaders.some((h) => has(words(h), "psi")) ? "PSI" : pressureHeaders.some((h) => has(words(h), "kpa")) ? "KPA" : fallbackPressureUnit,
  };
}

/** Problems with the mapping itself: a missing column, a target chosen twice, a length mismatch. */
export function checkReadingsMapping(header: readonly string[], mapping: ReadingsCsvMapping): string[] {
  const problems: string[] = [];
  if (header.length === 0) return ["The file is empty: it needs a header row and at least one row of readings."];
  if (mapping.columns.length !== header.length) problems.push(`The mapping has ${mapping.columns.length} columns but the file's header has ${header.length}; choose again.`);
  const where = new Map<ReadingCsvTarget, number[]>();
  mapping.columns.forEach((c, i) => {
    if (c !== "ignore") where.set(c, [...(where.get(c) ?? []), i]);
  });
  for (const [target, cols] of where)
    if (cols.length > 1) problems.push(`Columns ${cols.map((i) => `"${header[i] ?? i + 1}"`).join(" and ")} are all mapped to ${READING_CSV_TARGET_LABELS[target]}; choose one.`);
  if (where.has("takenAt") && where.has("elapsed")) problems.push("Map either a date-and-time column or an elapsed-time column, not both.");
  if (!where.has("takenAt") && !where.has("elapsed")) problems.push("No column is mapped to the time: choose the date-and-time or the elapsed-time column.");
  for (const target of REQUIRED) if (!where.has(target)) problems.push(`No column is mapped to the ${READING_CSV_TARGET_LABELS[target]}, which every reading needs.`);
  return problems;
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** A number cell; with `decimalComma`, "12,5" is 12.5. Blank is null. */
export function parseDecimalCell(text: string, decimalComma: boolean): number | null | "invalid" {
  const t = text.trim().replace(/\s/g, "");
  if (t === "") return null;
  const normal = decimalComma ? t.replace(",", ".") : t;
  return NUMBER.test(normal) ? Number(normal) : "invalid";
}

/**
 * A date-time cell: ISO 8601 (2026-03-02 08:00[:00], with a T, optionally a Z or offset) or day-first
 * with dots (02.03.2026 08:00). A time without a zone is wall-clock time in `timeZone` (the lab's; the
 * runtime's own zone when none is given). Slashed dates are refused: 03/04/2026 is the 3rd of April or the
 * 4th of March depending on the logger.
 */
export function parseDateTimeCell(text: string, timeZone?: string): Date | string {
  const t = text.trim();
  if (/^\d{1,2}\/\d{1,2}\/\d{2,4}/.test(t)) return "dates with slashes are ambiguous (day/month or month/day); export them as YYYY-MM-DD hh:mm, or map the elapsed-time column instead";
  let m = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{1,2}):(\d{2})(?::(\d{2})(?:\.(\d+))?)?\s*(Z|[+-]\d{2}:?\d{2})?$/i.exec(t);
  let parts: number[] | null = null;
  if (m) {
    if (m[8]) return readCalendarDate(t) ?? "is not a real date and time";
    parts = [m[1], m[2], m[3], m[4], m[5], m[6] ?? "0"].map(Number);
  } else if ((m = /^(\d{1,2})\.(\d{1,2})\.(\d{4})[ T](\d{1,2}):(\d{2})(?::(\d{2}))?$/.exec(t))) {
    parts = [m[3], m[2], m[1], m[4], m[5], m[6] ?? "0"].map(Number);
  }
  if (!parts) return "is not a date and time (write it as YYYY-MM-DD hh:mm)";
  const [y, mo, d, h, mi, s] = parts as [number, number, number, number, number, number];
  if (timeZone) {
    const pad = (n: number, w = 2) => String(n).padStart(w, "0");
    return fromWallTime(`${pad(y, 4)}-${pad(mo)}-${pad(d)}T${pad(h)}:${pad(mi)}:${pad(s)}`, timeZone) ?? "is not a real date and time";
  }
  const date = new Date(y, mo - 1, d, h, mi, s);
  if (date.getFullYear() !== y || date.getMonth() !== mo - 1 || date.getDate() !== d || h > 23 || mi > 59 || s > 59) return "is not a real date and time";
  return date;
}

const ELAPSED_S: Record<ElapsedUnit, number> = { s: 1, min: 60, h: 3600 };

/**
 * A refill or drain mark: a refill column (1, yes, true, x) or a marked row in an event or note column
 * (any text with "refill", "refilled", "drain" or "drained"). Blank, 0, no and false leave the row unmarked;
 * anything else is refused so that a note is never silently taken for a refill.
 */
export function parseRefillMark(text: string): boolean | "invalid" {
  const t = text.trim().toLowerCase();
  if (t === "" || ["0", "no", "n", "false", "-"].includes(t)) return false;
  if (["1", "yes", "y", "true", "x", "after", "after refill"].includes(t)) return true;
  return /\b(refill(ed)?|drain(ed)?)\b/.test(t) ? true : "invalid";
}
const PRESSURE_TARGETS = { influentPressure: "influentPressurePa", effluentPressure: "effluentPressurePa", cellPressure: "cellPressurePa" } as const;
const CHEMISTRY = ["influentEcMsPerM", "effluentEcMsPerM", "influentPh", "effluentPh"] as const;

/**
 * Reads every data row with the chosen mapping into a ReadingDraft (pressures converted to Pa with the
 * exact psi factor), or the list of what is wrong with it. Order, volume and temperature checks across
 * rows are checkReadingSequence's job; this judges each cell on its own.
 */
export function applyReadingsMapping(parsed: ParsedReadingsCsv, mapping: ReadingsCsvMapping, options: { timeZone?: string } = {}): MappedCsvRow[] {
  const decimalComma = parsed.separator !== ",";
  const toPa = (value: number) => enteredPressureToPa(value, mapping.pressureUnit);
  return parsed.rows.map(({ row, cells }) => {
    const errors: ReadingCsvRowError[] = [];
    if (cells.length !== parsed.header.length) {
      errors.push({ row, field: "row", message: `Row ${row} has ${cells.length} cell${cells.length === 1 ? "" : "s"} but the header has ${parsed.header.length} columns; check for a missing or extra separator.` });
      return { row, values: null, errors };
    }
    const where = (target: ReadingCsvTarget) => mapping.columns.indexOf(target);
    const at = (i: number) => `Row ${row}, column "${parsed.header[i]}"`;
    const number = (target: ReadingCsvTarget, options: { required: boolean; min?: number; max?: number }): number | null => {
      const i = where(target);
      if (i < 0) return null;
      const label = READING_CSV_TARGET_LABELS[target];
      const value = parseDecimalCell(cells[i]!, decimalComma);
      if (value === null) {
        if (options.required) errors.push({ row, field: target, message: `${at(i)} (${label}): the cell is empty; every reading needs it.` });
        return null;
      }
      if (value === "invalid") {
        errors.push({ row, field: target, message: `${at(i)} (${label}): "${cells[i]}" is not a number.` });
        return null;
      }
      if (options.min !== undefined && value < options.min) {
        errors.push({ row, field: target, message: `${at(i)} (${label}): ${value} is below ${options.min}, which is not possible.` });
        return null;
      }
      if (options.max !== undefined && value > options.max) {
        errors.push({ row, field: target, message: `${at(i)} (${label}): ${value} is above ${options.max}, which is not possible.` });
        return null;
      }
      return value;
    };

    const draft: Partial<ReadingDraft> = {};
    const takenAtIndex = where("takenAt");
    if (takenAtIndex >= 0) {
      const cell = cells[takenAtIndex]!;
      const parsedDate = cell === "" ? null : parseDateTimeCell(cell, options.timeZone);
      if (parsedDate instanceof Date) draft.takenAt = parsedDate;
      else if (parsedDate === null) errors.push({ row, field: "takenAt", message: `${at(takenAtIndex)} (date and time): the cell is empty; every reading needs its time.` });
      else errors.push({ row, field: "takenAt", message: `${at(takenAtIndex)} (date and time): "${cell}" ${parsedDate}.` });
    }
    const elapsed = number("elapsed", { required: true, min: 0 });
    if (elapsed !== null) draft.elapsedS = elapsed * ELAPSED_S[mapping.elapsedUnit];
    const inflow = number("inflowLevelMm", { required: true, min: 0 });
    const outflow = number("outflowLevelMm", { required: true, min: 0 });
    if (inflow !== null) draft.inflowLevelMm = inflow;
    if (outflow !== null) draft.outflowLevelMm = outflow;
    for (const [target, key] of Object.entries(PRESSURE_TARGETS) as Array<[keyof typeof PRESSURE_TARGETS, (typeof PRESSURE_TARGETS)[keyof typeof PRESSURE_TARGETS]]>) {
      const value = number(target, { required: target !== "cellPressure", min: 0 });
      if (value !== null) draft[key] = toPa(value);
    }
    const temperature = number("temperatureC", { required: true });
    if (temperature !== null) draft.temperatureC = temperature;
    const refillIndex = where("afterRefill");
    if (refillIndex >= 0) {
      const mark = parseRefillMark(cells[refillIndex]!);
      if (mark === "invalid") errors.push({ row, field: "afterRefill", message: `${at(refillIndex)} (refill or drain mark): "${cells[refillIndex]}" is neither a refill mark (1, yes, refill, drain) nor blank.` });
      else if (mark) draft.afterRefill = true;
    }
    for (const key of CHEMISTRY) {
      const value = number(key, { required: false, min: 0, ...(key.endsWith("Ph") ? { max: 14 } : {}) });
      if (value !== null) draft[key] = value;
    }
    return { row, values: errors.length ? null : (draft as ReadingDraft), errors };
  });
}
