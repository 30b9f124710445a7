import "server-only";
import { cache } from "react";
import type { Db } from "../db/client";
import { getBulkReader } from "../db/bulk-reader";
import type { Tx } from "../db/transaction";
import { cachedReadings, keepReadings } from "./current-readings-cache";

/** A current reading (one no other reading corrects) with the columns the evaluation and the readings panel use. */
export type CurrentReadingRow = {
  id: string;
  sequence: number;
  elapsedS: number;
  inflowLevelMm: number | null;
  outflowLevelMm: number | null;
  inflowCumulativeMl: number;
  outflowCumulativeMl: number;
  headPa: number;
  temperatureC: number;
  influentEcMsPerM: number | null;
  effluentEcMsPerM: number | null;
  influentPh: number | null;
  effluentPh: number | null;
  afterRefill: boolean;
  /** This reading corrects an earlier one. */
  corrected: boolean;
};

/**
 * A run's current readings by elapsed time, as plain rows of the columns needed: a data-logger run holds
 * 100,000 of them, and one narrow query reads them several times faster than the full records.
 */
export function loadCurrentReadings(db: Pick<Db, "$queryRaw"> | Tx, runId: string): Promise<CurrentReadingRow[]> {
  return db.$queryRaw<CurrentReadingRow[]>`
    SELECT r.id, r.sequence, r."elapsedS", r."inflowLevelMm", r."outflowLevelMm", r."inflowCumulativeMl", r."outflowCumulativeMl", r."headPa", r."temperatureC",
           r."influentEcMsPerM", r."effluentEcMsPerM", r."influentPh", r."effluentPh", r."afterRefill", r."correctsId" IS NOT NULL AS corrected
    FROM "Reading" r
    WHERE r."runId" = ${runId} AND NOT EXISTS (SELECT 1 FROM "Reading" c WHERE c."correctsId" = r.id)
    ORDER BY r."elapsedS", r.sequence`;
}

const COLUMNS = ["id", "sequence", "elapsedS", "inflowLevelMm", "outflowLevelMm", "inflowCumulativeMl", "outflowCumulativeMl", "headPa", "temperatureC",
  "influentEcMsPerM", "effluentEcMsPerM", "influentPh", "effluentPh", "afterRefill"] as const;

/**
 * The same outside a transaction, through the bulk reader: every row of the run in one index scan (a
 * NOT EXISTS over the Reading table would cost as much as the whole lab's readings), the corrected ones
 * dropped here, rows as arrays turned into objects. Kept between requests while the run's rows are the
 * same (current-readings-cache.ts), which a cheap count tells.
 */
async function readCurrentReadings(runId: string): Promise<CurrentReadingRow[]> {
  const reader = getBulkReader();
  const counted = await reader.query<{ rows: number; lastSequence: number }>({
    text: `SELECT count(*)::int AS rows, coalesce(max(sequence), 0)::int AS "lastSequence" FROM "Reading" WHERE "runId" = $1`,
    values: [runId],
  });
  const cached = cachedReadings<CurrentReadingRow>(runId, counted.rows[0]!);
  if (cached) return cached;
  const result = await reader.query<unknown[]>({
    text: `SELECT ${COLUMNS.map((c) => `r."${c}"`).join(", ")}, r."correctsId" FROM "Reading" r WHERE r."runId" = $1 ORDER BY r."elapsedS", r.sequence`,
    values: [runId],
    rowMode: "array",
  });
  const correctedOut = new Set<string>();
  let lastSequence = 0;
  for (const v of result.rows) {
    if (v[14] !== null) correctedOut.add(v[14] as string);
    lastSequence = Math.max(lastSequence, v[1] as number);
  }
  const readings: CurrentReadingRow[] = [];
  for (const v of result.rows) {
    if (correctedOut.has(v[0] as string)) continue;
    readings.push({
      id: v[0] as string, sequence: v[1] as number, elapsedS: v[2] as number, inflowLevelMm: v[3] as number | null, outflowLevelMm: v[4] as number | null,
      inflowCumulativeMl: v[5] as number, outflowCumulativeMl: v[6] as number, headPa: v[7] as number, temperatureC: v[8] as number,
      influentEcMsPerM: v[9] as number | null, effluentEcMsPerM: v[10] as number | null, influentPh: v[11] as number | null, effluentPh: v[12] as number | null,
      afterRefill: v[13] as boolean, corrected: v[14] !== null,
    });
  }
  // The key of what was read, not of the count before it: a reading saved in between only makes the next look miss.
  keepReadings(runId, { rows: result.rows.length, lastSequence }, readings);
  return readings;
}

/** The current readings read once per page request however many parts of the page ask (the run page's verdict and readings panel). */
export const loadCurrentReadingsOnce = cache(readCurrentReadings);
