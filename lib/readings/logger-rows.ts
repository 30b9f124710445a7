/**
 * What the data-logger bridge (scripts/logger-bridge.ts) posts for lines a logger appended to its CSV: each
 * complete line read as the file import reads it (parseReadingsCsv, suggestReadingsMapping,
 * applyReadingsMapping), turned into a reading of the API with an idempotency key derived from the file's
 * identity, the line's number and its content, so a line posted twice is the same reading both times. Pure.
 */
import { applyReadingsMapping, parseReadingsCsv, suggestReadingsMapping, type ReadingsCsvMapping } from "./readings-csv";

export type LoggerLine = { lineNumber: number; text: string };
export type LoggerReading = {
  idempotencyKey: string;
  takenAt: string;
  inflowLevelMm: number;
  outflowLevelMm: number;
  influentPressure: number;
  effluentPressure: number;
  cellPressure?: number | null;
  temperatureC: number;
  influentEcMsPerM?: number | null;
  effluentEcMsPerM?: number | null;
  influentPh?: number | null;
  effluentPh?: number | null;
  afterRefill: boolean;
};

const TIME_WORDS = /\b(date|time|timestamp|datetime|clock)\b/i;

/**
 * The mapping of a logger's header, reading the clock column for the time: the API takes the time of each
 * reading, not its elapsed time (the bridge does not know when permeation began). Null with a sentence
 * when the file has no usable clock column or lacks a column every reading needs.
 */
export function loggerMapping(header: readonly string[], sampleLine: string | null): { mapping: ReadingsCsvMapping } | { problem: string } {
  const parsed = parseReadingsCsv([header.join(","), sampleLine ?? ""].join("\n"));
  const suggested = suggestReadingsMapping(parsed, "KPA");
  const columns = [...suggested.columns];
  if (!columns.includes("takenAt")) {
    const clock = header.findIndex((h, i) => columns[i] === "ignore" && TIME_WORDS.test(h));
    if (clock < 0) return { problem: "The logger's file has no date-and-time column; the bridge posts each reading with the time it was taken." };
    columns[clock] = "takenAt";
  }
  const elapsed = columns.indexOf("elapsed");
  if (elapsed >= 0) columns[elapsed] = "ignore";
  for (const needed of ["inflowLevelMm", "outflowLevelMm", "influentPressure", "effluentPressure", "temperatureC"] as const)
    if (!columns.includes(needed)) return { problem: `No column of the logger's file reads as ${needed}; name its columns as the file import expects.` };
  return { mapping: { ...suggested, columns } };
}

/**
 * The readings of complete lines after the header, each keyed `<fileId>:<line number>:<content hash>`;
 * a line that does not read as a reading stops the batch there (later lines wait, so nothing is skipped).
 * `hash` is a hex digest of a line (SHA-256 in the bridge). Pressures are sent in kPa.
 */
export function loggerLinesToReadings(options: { header: readonly string[]; separator?: string; lines: readonly LoggerLine[]; fileId: string; mapping: ReadingsCsvMapping; timeZone?: string; hash: (text: string) => string }): {
  readings: Array<{ lineNumber: number; reading: LoggerReading }>;
  stoppedAt: { lineNumber: number; message: string } | null;
} {
  const lines = options.lines.filter((l) => l.text.trim() !== "");
  const separator = options.separator ?? ",";
  const parsed = parseReadingsCsv([options.header.join(separator), ...lines.map((l) => l.text)].join("\n"));
  const mapped = applyReadingsMapping(parsed, options.mapping, { timeZone: options.timeZone });
  const readings: Array<{ lineNumber: number; reading: LoggerReading }> = [];
  for (const [i, row] of mapped.entries()) {
    const line = lines[i]!;
    if (!row.values || row.errors.length || !row.values.takenAt)
      return { readings, stoppedAt: { lineNumber: line.lineNumber, message: row.errors.map((e) => e.message.replace(/^Row \d+/, `Line ${line.lineNumber}`)).join(" ") || `Line ${line.lineNumber} has no time.` } };
    const v = row.values;
    readings.push({
      lineNumber: line.lineNumber,
      reading: {
        idempotencyKey: `${options.fileId}:${line.lineNumber}:${options.hash(line.text.trim()).slice(0, 16)}`,
        takenAt: v.takenAt!.toISOString(),
        inflowLevelMm: v.inflowLevelMm,
        outflowLevelMm: v.outflowLevelMm,
        influentPressure: v.influentPressurePa / 1000,
        effluentPressure: v.effluentPressurePa / 1000,
        cellPressure: v.cellPressurePa === undefined || v.cellPressurePa === null ? null : v.cellPressurePa / 1000,
        temperatureC: v.temperatureC,
        influentEcMsPerM: v.influentEcMsPerM ?? null,
        effluentEcMsPerM: v.effluentEcMsPerM ?? null,
        influentPh: v.influentPh ?? null,
        effluentPh: v.effluentPh ?? null,
        afterRefill: v.afterRefill ?? false,
      },
    });
  }
  return { readings, stoppedAt: null };
}
