import { z } from "zod";

/**
 * Dates on the lab's records, read strictly and kept within sense: between the start of the year the
 * laboratory's records begin (SEEPLINE_FOUNDED_YEAR on the server, 2000 when not set) and shortly after
 * now for things that have happened. A date that does not exist (2026-02-30) is refused rather than moved
 * to another day, as JavaScript's Date would. Lab numbers carry two-digit years (lib/numbering), which stay
 * unique because no record date can fall outside one century.
 */
export const DEFAULT_FOUNDED_YEAR = 2000;
const EARLIEST_ALLOWED_YEAR = 2000;

/** The first year a record may carry: the configured founding year, never before 2000 nor after this year. */
export function earliestRecordYear(now: Date = new Date()): number {
  const configured = Number(typeof process === "undefined" ? undefined : process.env?.SEEPLINE_FOUNDED_YEAR);
  const year = Number.isInteger(configured) ? configured : DEFAULT_FOUNDED_YEAR;
  return Math.min(Math.max(year, EARLIEST_ALLOWED_YEAR), now.getUTCFullYear());
}

const ISO = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{1,2}):(\d{2})(?::(\d{2})(\.\d{1,9})?)?)?\s*(Z|[+-]\d{2}:?\d{2})?$/i;

/**
 * A Date from a Date or from ISO 8601 text (date, date and time, with or without a zone), or null when the
 * text is not one or names a day or time that does not exist. Text without a zone is local time.
 */
export function readCalendarDate(value: unknown): Date | null {
  if (value instanceof Date) return Number.isNaN(value.getTime()) ? null : value;
  if (typeof value !== "string") return null;
  const match = ISO.exec(value.trim());
  if (!match) return null;
  const [, y, mo, d, h, mi = "00", s = "00", fraction = "", zone] = match;
  const year = Number(y), month = Number(mo), day = Number(d);
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return null;
  if (Number(h ?? 0) > 23 || Number(mi) > 59 || Number(s) > 59) return null;
  // Rebuilt in the one form every JavaScript engine reads the same way (a date alone is UTC midnight).
  const time = h === undefined ? "" : `T${h.padStart(2, "0")}:${mi}:${s}${fraction.slice(0, 4)}`;
  const offset = zone ? (zone.toUpperCase() === "Z" ? "Z" : zone.replace(/^([+-]\d{2})(\d{2})$/, "$1:$2")) : "";
  const date = new Date(`${y}-${mo}-${d}${time}${offset}`);
  return Number.isNaN(date.getTime()) ? null : date;
}

function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** A real date no earlier than the records begin and no later than `latest()` (with its sentence). */
export function recordDate(label: string, latest: { at: () => number; message: string }) {
  return z.unknown().transform((value, ctx) => {
    const date = readCalendarDate(value);
    if (!date) {
      ctx.addIssue({ code: "custom", message: `Enter ${label} as a real date and time (for example 2026-03-14 09:30).` });
      return z.NEVER;
    }
    const earliest = earliestRecordYear();
    if (date.getTime() < Date.UTC(earliest, 0, 1) - 14 * 3_600_000) {
      ctx.addIssue({ code: "custom", message: `${capitalise(label)} cannot be before ${earliest}, when the laboratory's records begin.` });
      return z.NEVER;
    }
    if (date.getTime() > latest.at()) {
      ctx.addIssue({ code: "custom", message: latest.message });
      return z.NEVER;
    }
    return date;
  });
}

/** When something happened: a real date, not before the records begin, not in the future (5 minutes' grace). */
export const pastDateTime = (label: string) => recordDate(label, { at: () => Date.now() + 5 * 60_000, message: `${capitalise(label)} cannot be in the future.` });

/** A date ahead, such as when a calibration falls due: a real date, at most `years` years from now. */
export const futureDate = (label: string, years = 20) =>
  recordDate(label, { at: () => Date.now() + years * 366 * 86_400_000, message: `${capitalise(label)} is more than ${years} years ahead; check the year.` });
