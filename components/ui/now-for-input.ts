/**
 * Now, to the whole minute, as ISO text: the default of the app's date-and-time inputs (which show
 * minutes). Without the seconds, a time typed later in the same minute is never "before" this one.
 */
export function nowToTheMinute(): string {
  const d = new Date();
  d.setSeconds(0, 0);
  return d.toISOString();
}

/** The present local time as a date input wants it (YYYY-MM-DD, browser's zone), for date-only fields. */
export function nowForDateTimeInput(): string {
  const d = new Date();
  d.setSeconds(0, 0);
  return new Date(d.getTime() - d.getTimezoneOffset() * 60_000).toISOString().slice(0, 16);
}
