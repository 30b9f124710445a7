/** Dates as the lab writes them: 2026-12-01, and 2026-12-01 14:05 with the time in UTC. */
export function formatDate(date: Date | null | undefined): string {
  return date ? date.toISOString().slice(0, 10) : "—";
}

export function formatDateTime(date: Date | null | undefined): string {
  return date ? `${date.toISOString().slice(0, 16).replace("T", " ")} UTC` : "—";
}

/** "3 d", "5 h", "40 min": how long ago, for queues. */
export function formatAge(date: Date, now: Date = new Date()): string {
  const minutes = Math.max(0, Math.round((now.getTime() - date.getTime()) / 60_000));
  if (minutes < 90) return `${minutes} min`;
  const hours = Math.round(minutes / 60);
  if (hours < 48) return `${hours} h`;
  return `${Math.round(hours / 24)} d`;
}
