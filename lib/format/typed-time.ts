/**
 * A reading's time as a person types it into the readings grid, read as wall-clock time in the lab's zone
 * (lib/format/time-zone.ts). Pure: only Intl.
 */
import { fromWallTime, toWallTime } from "./time-zone";

const CLOCK = /^(\d{1,2})[:.h](\d{2})(?::(\d{2}))?$/;

/**
 * The instant `text` stands for, or null when it is not a time:
 * - "2026-11-30 14:30" or "2026-11-30T14:30" (seconds optional): that wall-clock time in `zone`;
 * - "14:30" (also "9:05", "14.30", "14:30:15"): the first such wall-clock time at or after `after` (the
 *   reading above, so a log typed down the page rolls over midnight by itself), or on the day of `day`
 *   when there is no reading above.
 */
export function readTypedTime(text: string, zone: string, context: { after?: Date | null; day?: Date }): Date | null {
  const typed = text.trim();
  const full = fromWallTime(typed, zone);
  if (full) return full;
  const clock = CLOCK.exec(typed);
  if (!clock) return null;
  const [hour, minute, second] = [Number(clock[1]), Number(clock[2]), Number(clock[3] ?? 0)];
  if (hour > 23 || minute > 59 || second > 59) return null;
  const time = `${String(hour).padStart(2, "0")}:${clock[2]}:${String(second).padStart(2, "0")}`;
  const anchor = context.after ?? context.day ?? new Date();
  const onDay = (day: string) => fromWallTime(`${day}T${time}`, zone);
  const sameDay = onDay(toWallTime(anchor, zone).slice(0, 10));
  if (!sameDay || !context.after || sameDay.getTime() >= context.after.getTime()) return sameDay;
  // Earlier in the day than the reading above: the next day (noon moves a day without meeting a clock change).
  const nextDay = new Date(fromWallTime(`${toWallTime(anchor, zone).slice(0, 10)}T12:00`, zone)!.getTime() + 86_400_000);
  return onDay(toWallTime(nextDay, zone).slice(0, 10));
}

/** "2026-11-30 14:30" (with ":SS" when the seconds are not zero): how the grid shows an instant in `zone`. */
export function formatTypedTime(instant: Date, zone: string): string {
  const withSeconds = toWallTime(instant, zone, { seconds: true });
  return (withSeconds.endsWith(":00") ? withSeconds.slice(0, -3) : withSeconds).replace("T", " ");
}
