/** Rows of the readings entry grid: which ones count, and when the next one was probably taken. Pure. */

/** What a person types into a grid row (as text); the time is ISO text when it could be read. */
export type GridRowText = {
  takenAt: string;
  inflowLevelMm: string;
  outflowLevelMm: string;
  influentEcMsPerM?: string;
  effluentEcMsPerM?: string;
  effluentPh?: string;
  afterRefill?: boolean;
};

/** Nothing typed that a new row does not start with (its time, pressures, temperature and influent pH carry over). */
export function isBlankRow(row: GridRowText): boolean {
  const typed = [row.inflowLevelMm, row.outflowLevelMm, row.influentEcMsPerM, row.effluentEcMsPerM, row.effluentPh];
  return typed.every((v) => !v || !String(v).trim()) && !row.afterRefill;
}

/** The rows to save: blank rows at the end are left out (Enter on the last cell adds one before the person saves). */
export function withoutTrailingBlankRows<T extends GridRowText>(rows: T[]): T[] {
  let end = rows.length;
  while (end > 0 && isBlankRow(rows[end - 1]!)) end--;
  return rows.slice(0, end);
}

/** When only one reading is known, the next is assumed an hour later. */
export const DEFAULT_READING_INTERVAL_MS = 3_600_000;

/**
 * The time a new row starts with (ISO text): the last known time plus the interval between the last two, so a
 * day of readings at a steady interval is entered without typing a time; never later than `now` (to the
 * minute), so live entry starts at the present. Null when no time is known. `times` are ISO texts, oldest first.
 */
export function nextReadingTime(times: string[], now: Date = new Date()): string | null {
  const known = times.map((t) => new Date(t).getTime()).filter((t) => Number.isFinite(t));
  const last = known.at(-1);
  if (last === undefined) return null;
  const before = known.at(-2);
  const interval = before !== undefined && last > before ? last - before : DEFAULT_READING_INTERVAL_MS;
  const present = Math.floor(now.getTime() / 60_000) * 60_000;
  return new Date(Math.min(last + interval, Math.max(present, last))).toISOString();
}
