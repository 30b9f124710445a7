import "server-only";
import { formatLabNumber, sequenceKey, type LabNumberKind } from "@/lib/numbering/lab-number";
import type { Tx } from "./transaction";

/**
 * Takes the next lab number of a kind inside the caller's transaction. The counter row is locked by the
 * upsert until the transaction ends, so two instances never hand out the same number; a rolled-back
 * transaction leaves a gap, never a reuse.
 */
export async function allocateLabNumber(tx: Tx, kind: LabNumberKind, at: Date = new Date()): Promise<string> {
  const year = at.getUTCFullYear();
  const key = sequenceKey(kind, year);
  const rows = await tx.$queryRaw<Array<{ lastValue: number }>>`
    INSERT INTO "NumberSequence" ("key", "lastValue", "updatedAt") VALUES (${key}, 1, now())
    ON CONFLICT ("key") DO UPDATE SET "lastValue" = "NumberSequence"."lastValue" + 1, "updatedAt" = now()
    RETURNING "lastValue"`;
  const value = rows[0]?.lastValue;
  if (value === undefined) throw new Error(`could not allocate a ${kind} number`);
  return formatLabNumber(kind, year, value);
}
