import "server-only";

/**
 * A run's current readings kept in this process between requests, keyed on the run and on what identifies
 * its set of readings: how many rows the run holds and its highest sequence number. Readings are never
 * changed or deleted (the database refuses it); a new reading or a correction adds a row, so the key changes
 * with every change to the set, and a page never sees an old set. Each app instance keeps its own copy.
 * Bounded by the readings held: a data-logger run of 100,000 readings takes a few tens of MB with its verdict.
 */
export type ReadingsKey = { rows: number; lastSequence: number };

const MAX_READINGS_HELD = 250_000;

type Entry<T> = { key: ReadingsKey; readings: T[] };
// On globalThis: the pages and the route handlers are bundled apart, and should share one copy.
const globalForReadings = globalThis as unknown as { seeplineCurrentReadings?: Map<string, Entry<unknown>> };
const entries = (globalForReadings.seeplineCurrentReadings ??= new Map<string, Entry<unknown>>());

const sameKey = (a: ReadingsKey, b: ReadingsKey) => a.rows === b.rows && a.lastSequence === b.lastSequence;

/** The cached readings of `runId` when its key is still `key`, most recently used kept last. */
export function cachedReadings<T>(runId: string, key: ReadingsKey): T[] | null {
  const entry = entries.get(runId);
  if (!entry || !sameKey(entry.key, key)) return null;
  entries.delete(runId);
  entries.set(runId, entry);
  return entry.readings as T[];
}

/** Keeps `readings` for `runId` under `key`, letting the least recently used runs go past the bound. */
export function keepReadings<T>(runId: string, key: ReadingsKey, readings: T[]): void {
  entries.delete(runId);
  entries.set(runId, { key, readings });
  let held = 0;
  for (const entry of entries.values()) held += entry.readings.length;
  for (const [id, entry] of entries) {
    if (held <= MAX_READINGS_HELD || id === runId) break;
    entries.delete(id);
    held -= entry.readings.length;
  }
}
