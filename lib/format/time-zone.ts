/**
 * The lab's time zone: times are stored as instants (UTC) and shown, typed and printed as wall-clock time
 * in the zone the lab administrator chose (an IANA name such as "Europe/Dublin"). Pure: only Intl.
 */

// Building an Intl.DateTimeFormat costs far more than using one (a list page formats a hundred times), so
// each kind is built once per zone and kept; the lab has one zone, so the maps stay tiny.
const cached = new Map<string, Intl.DateTimeFormat>();

/** The formatter `name` for `zone`, built by `make` the first time. */
export function zoneFormatter(name: string, zone: string, make: () => Intl.DateTimeFormat): Intl.DateTimeFormat {
  const key = `${name} ${zone}`;
  let formatter = cached.get(key);
  if (!formatter) {
    formatter = make();
    cached.set(key, formatter);
  }
  return formatter;
}

function partsFormatter(zone: string): Intl.DateTimeFormat {
  return zoneFormatter("parts", zone, () => new Intl.DateTimeFormat("en-GB", {
    timeZone: zone, hourCycle: "h23", year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit", second: "2-digit",
  }));
}

const knownZones = new Set<string>();

/** Whether `zone` is a time zone this runtime knows (IANA name, or "UTC"). */
export function isTimeZone(zone: string): boolean {
  if (!zone || zone.length > 64) return false;
  if (knownZones.has(zone)) return true;
  try {
    new Intl.DateTimeFormat("en-GB", { timeZone: zone });
    knownZones.add(zone);
    return true;
  } catch {
    return false;
  }
}

/**
 * The time zones to offer in a list: the runtime's IANA names, with UTC first, and `current` (the zone
 * saved now) even where the runtime lists it under another name (e.g. Asia/Kolkata as Asia/Calcutta).
 */
export function listTimeZones(current?: string): string[] {
  const names = typeof Intl.supportedValuesOf === "function" ? Intl.supportedValuesOf("timeZone") : [];
  const zones = ["UTC", ...names.filter((n) => n !== "UTC")];
  return current && !zones.includes(current) && isTimeZone(current) ? [current, ...zones] : zones;
}

type WallParts = { year: number; month: number; day: number; hour: number; minute: number; second: number };

function wallParts(date: Date, zone: string): WallParts {
  const parts: Record<string, number> = {};
  for (const p of partsFormatter(zone).formatToParts(date)) if (p.type !== "literal") parts[p.type] = Number(p.value);
  return { year: parts.year!, month: parts.month!, day: parts.day!, hour: parts.hour!, minute: parts.minute!, second: parts.second! };
}

/** How far the zone's wall clock is ahead of UTC at `date`, in milliseconds (negative west of Greenwich). */
export function zoneOffsetMs(date: Date, zone: string): number {
  const p = wallParts(date, zone);
  const asUtc = Date.UTC(p.year, p.month - 1, p.day, p.hour, p.minute, p.second);
  return asUtc - Math.floor(date.getTime() / 1000) * 1000;
}

const pad = (n: number, width = 2) => String(n).padStart(width, "0");

/** "2026-12-01T14:05" (or with ":SS"): the wall-clock time in `zone`, as a datetime-local input wants it. */
export function toWallTime(date: Date, zone: string, options: { seconds?: boolean } = {}): string {
  const p = wallParts(date, zone);
  const text = `${pad(p.year, 4)}-${pad(p.month)}-${pad(p.day)}T${pad(p.hour)}:${pad(p.minute)}`;
  return options.seconds ? `${text}:${pad(p.second)}` : text;
}

const WALL_TIME = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.\d+)?)?$/;

/**
 * The instant a wall-clock time in `zone` stands for ("2026-12-01T14:05" typed in a datetime-local input),
 * or null when the text is not such a time. In the hour a clock goes back, the earlier instant is taken;
 * a time skipped when it goes forward is read with the offset from before the change.
 */
export function fromWallTime(text: string, zone: string): Date | null {
  const m = WALL_TIME.exec(text.trim());
  if (!m) return null;
  const [year, month, day, hour, minute, second] = m.slice(1, 7).map((v) => Number(v ?? 0)) as [number, number, number, number, number, number];
  if (month < 1 || month > 12 || day < 1 || day > 31 || hour > 23 || minute > 59 || second > 59) return null;
  const asUtc = Date.UTC(year, month - 1, day, hour, minute, second);
  if (new Date(asUtc).getUTCDate() !== day) return null; // 31 April and the like
  // A zone has at most two offsets within a day of any time; try the one before and the one after.
  const before = asUtc - zoneOffsetMs(new Date(asUtc - 86_400_000), zone);
  const after = asUtc - zoneOffsetMs(new Date(asUtc + 86_400_000), zone);
  // A candidate fits when the zone's offset at that instant is the one it was computed with.
  const fits = [before, after].filter((t) => zoneOffsetMs(new Date(t), zone) === asUtc - t);
  return new Date(fits.length ? Math.min(...fits) : before);
}

/** The zone's short name at `date` ("GMT", "CET", "UTC", or "GMT+8" where there is no abbreviation). */
export function zoneAbbreviation(date: Date, zone: string): string {
  const part = zoneFormatter("name", zone, () => new Intl.DateTimeFormat("en-GB", { timeZone: zone, timeZoneName: "short" })).formatToParts(date).find((p) => p.type === "timeZoneName");
  return part?.value ?? zone;
}

/** "UTC+01:00": the zone's offset at `date`. */
export function formatOffset(date: Date, zone: string): string {
  const minutes = Math.round(zoneOffsetMs(date, zone) / 60_000);
  const sign = minutes < 0 ? "-" : "+";
  const abs = Math.abs(minutes);
  return `UTC${sign}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`;
}

/** The sentence documents carry so a reader knows which clock their times are on. */
export function timeZoneStatement(zone: string, at: Date = new Date()): string {
  return zone === "UTC" ? "Times are given in UTC." : `Times are given in the laboratory's time zone, ${zone} (${formatOffset(at, zone)} on the date of this document).`;
}
