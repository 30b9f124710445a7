/** The present local time as a datetime-local input wants it (YYYY-MM-DDTHH:MM). */
export function nowForDateTimeInput(): string {
  const d = new Date();
  d.setSeconds(0, 0);
  return new Date(d.getTime() - d.getTimezoneOffset() * 60_000).toISOString().slice(0, 16);
}
