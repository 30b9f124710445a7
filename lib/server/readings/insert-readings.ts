import "server-only";
import type { PreparedReading } from "@/lib/readings/prepare-readings";
import type { Tx } from "../db/transaction";

/** Rows per INSERT: each statement sends one array per column, so its size does not grow with the batch's parameters. */
const BATCH = 5_000;

/**
 * Inserts prepared readings in batches of multi-row INSERT … SELECT FROM unnest(column arrays), inside the
 * caller's transaction (so all or none are kept). Each row still goes through the table's triggers: the
 * audit trigger writes one AuditLog row per reading with the transaction's actor, as a one-row insert would.
 */
export async function insertReadings(tx: Tx, rows: readonly PreparedReading[], options: { runId: string; firstSequence: number; source: string; recordedById: string }): Promise<number> {
  for (let start = 0; start < rows.length; start += BATCH) {
    const batch = rows.slice(start, start + BATCH);
    const col = <K extends keyof PreparedReading>(key: K) => batch.map((r) => r[key]);
    await tx.$executeRaw`
      INSERT INTO "Reading" (id, "runId", sequence, "takenAt", "elapsedS", "inflowLevelMm", "outflowLevelMm", "inflowCumulativeMl", "outflowCumulativeMl",
        "headPa", "influentPressurePa", "effluentPressurePa", "cellPressurePa", "temperatureC", "influentEcMsPerM", "effluentEcMsPerM", "influentPh", "effluentPh",
        "afterRefill", source, "recordedById")
      SELECT gen_random_uuid()::text, ${options.runId}, ${options.firstSequence + start} + u.n - 1, u.t::timestamp, u.e, u.il, u.ol, u.ic, u.oc, u.h, u.ip, u.ep, u.cp, u.tc, u.iec, u.eec, u.iph, u.eph, u.ar,
        ${options.source}, ${options.recordedById}
      FROM unnest(${col("takenAt").map((d) => d.toISOString())}::text[], ${col("elapsedS")}::float8[], ${col("inflowLevelMm")}::float8[], ${col("outflowLevelMm")}::float8[],
        ${col("inflowCumulativeMl")}::float8[], ${col("outflowCumulativeMl")}::float8[], ${col("headPa")}::float8[], ${col("influentPressurePa")}::float8[],
        ${col("effluentPressurePa")}::float8[], ${col("cellPressurePa")}::float8[], ${col("temperatureC")}::float8[], ${col("influentEcMsPerM")}::float8[],
        ${col("effluentEcMsPerM")}::float8[], ${col("influentPh")}::float8[], ${col("effluentPh")}::float8[], ${col("afterRefill")}::boolean[])
        WITH ORDINALITY AS u(t, e, il, ol, ic, oc, h, ip, ep, cp, tc, iec, eec, iph, eph, ar, n)`;
  }
  return rows.length;
}
