import { zoneAbbreviation, zoneFormatter } from "./time-zone";

/**
 * Dates as the lab writes them: 2026-12-01, and 2026-12-01 14:05 CET with the zone named. Times are stored
 * as instants and shown in the lab's time zone (`zone`, an IANA name; UTC when none is given).
 */
export function formatDate(date: Date | null | undefined, zone = "UTC"): string {
  if (!date) return "—";
  if (zone === "UTC") return date.toISOString().slice(0, 10);
  return zoneFormatter("date", zone, () => new Intl.DateTimeFormat("en-CA", { timeZone: zone, year: "numeric", month: "2-digit", day: "2-digit" })).format(date);
}

export function formatDateTime(date: Date | null | undefined, zone = "UTC"): string {
  if (!date) return "—";
  if (zone === "UTC") return `${date.toISOString().slice(0, 16).replace("T", " ")} UTC`;
  const text = zoneFormatter("date-time", zone, () => new Intl.DateTimeFormat("en-CA", { timeZone: zone, year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit", hourCycle: "h23" }))
    .format(date)
    .replace(",", "");
  return `${text} ${zoneAbbreviation(date, zone)}`;
}

/** "3 d", "5 h", "40 min": how long ago, for queues. */
export function formatAge(date: Date, now: Date = new Date()): string {
  const minutes = Math.max(0, Math.round((now.getTime() - date.getTime()) / 60_000));
  if (minutes < 90) return `${minutes} min`;
  const hours = Math.round(minutes / 60);
  if (hours < 48) return `${hours} h`;
  return `${Math.round(hours / 24)} d`;
}
