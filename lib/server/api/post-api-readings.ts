import "server-only";
import { createHash } from "node:crypto";
import { AppError } from "@/lib/errors/app-error";
import { postReadingsSchema } from "@/lib/validation/api";
import { withActor } from "../db/transaction";
import { getDb } from "../db/client";
import { saveReadingEntries } from "../readings/record-readings";
import { parseOrThrow } from "../validation/parse";
import type { ApiCaller } from "./authenticate-api-request";

/** The same JSON for the same values whatever the order of their keys. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(",")}]`;
  if (value instanceof Date) return JSON.stringify(value.toISOString());
  if (value && typeof value === "object")
    return `{${Object.keys(value).sort().map((k) => `${JSON.stringify(k)}:${canonical((value as Record<string, unknown>)[k])}`).join(",")}}`;
  return JSON.stringify(value ?? null);
}

/**
 * Readings a data-logger posts to a run through its token, all or none. Each carries a key the logger chose:
 * a key already saved with the same values (and pressure unit) is a retry and saves nothing again; the same
 * key with other values is refused (409) and nothing of the request is saved. The rest go through the grid's
 * own checks and save (saveReadingEntries) in the same transaction as their keys, with the run locked, so two
 * retries arriving together cannot both save. The token's owner is the audit actor; the source names the token.
 */
export async function postApiReadings(options: { caller: ApiCaller; labNumber: string; body: unknown; now?: Date }) {
  const { caller } = options;
  const input = parseOrThrow(postReadingsSchema, options.body);
  const run = await getDb().run.findUnique({ where: { labNumber: options.labNumber }, select: { id: true, labNumber: true, cellId: true, cell: { select: { assetTag: true } } } });
  if (!run) throw new AppError("NOT_FOUND", `No run ${options.labNumber}.`);
  // Checked before the keys too, so a token cannot learn what another cell's logger posted (the save checks again).
  if (!caller.token.cellIds.includes(run.cellId))
    throw new AppError("FORBIDDEN", `${run.labNumber} is in cell ${run.cell.assetTag}, which this data-logger token does not name; it posts readings only to runs in its own cells.`);
  const hashed = input.readings.map(({ idempotencyKey, ...values }) => ({
    key: idempotencyKey,
    values,
    sha256: createHash("sha256").update(canonical({ pressureUnit: input.pressureUnit, values })).digest("hex"),
  }));

  return withActor(caller.user, async (tx) => {
    await tx.$queryRaw`SELECT id FROM "Run" WHERE id = ${run.id} FOR UPDATE`;
    const known = new Map(
      (await tx.apiReadingKey.findMany({ where: { runId: run.id, key: { in: hashed.map((h) => h.key) } }, select: { key: true, bodySha256: true, sequence: true } })).map((k) => [k.key, k]),
    );
    const clashes = hashed.map((h, i) => ({ h, i, k: known.get(h.key) })).filter((x) => x.k && x.k.bodySha256 !== x.h.sha256);
    if (clashes.length)
      throw new AppError("CONFLICT", `The key ${clashes[0]!.h.key} was already used for reading ${clashes[0]!.k!.sequence} of ${run.labNumber} with other values; nothing was saved. A retry must send the same values, a new reading a new key.`, {
        fieldErrors: Object.fromEntries(clashes.map((c) => [`readings.${c.i}.idempotencyKey`, `Already used for reading ${c.k!.sequence} with other values.`])),
      });
    const fresh = hashed.filter((h) => !known.has(h.key));
    const saved = fresh.length
      ? await saveReadingEntries(tx, { actor: caller.user, runId: run.id, pressureUnit: input.pressureUnit, entries: fresh.map((h) => h.values), now: options.now, source: `API token “${caller.token.name}”`, instrumentCellIds: caller.token.cellIds })
      : null;
    const sequenceOf = new Map(fresh.map((h, i) => [h.key, saved!.firstSequence + i]));
    if (fresh.length)
      await tx.apiReadingKey.createMany({ data: fresh.map((h) => ({ runId: run.id, key: h.key, bodySha256: h.sha256, sequence: sequenceOf.get(h.key)!, tokenId: caller.token.id })) });
    return {
      run: run.labNumber,
      saved: fresh.length,
      replayed: hashed.length - fresh.length,
      readings: hashed.map((h) => ({ idempotencyKey: h.key, sequence: known.get(h.key)?.sequence ?? sequenceOf.get(h.key)!, replayed: known.has(h.key) })),
    };
  });
}
