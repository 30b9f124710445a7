import "server-only";
import type { Db } from "./client";
import { getDb } from "./client";

export type Tx = Parameters<Parameters<Db["$transaction"]>[0]>[0];

/** Who is acting; the audit trigger records this id on every row the transaction writes. */
export type Actor = { id: string };

/**
 * Runs `work` in one transaction whose audit rows name `actor`. Every write of an operation goes
 * through here, so the database's audit trail always knows who made a change.
 */
export async function withActor<T>(
  actor: Actor,
  work: (tx: Tx) => Promise<T>,
  options: { db?: Db; timeoutMs?: number } = {},
): Promise<T> {
  const db = options.db ?? getDb();
  return db.$transaction(
    async (tx) => {
      await tx.$executeRaw`SELECT set_config('seepline.actor_id', ${actor.id}, true)`;
      return work(tx);
    },
    { timeout: options.timeoutMs ?? 15_000, maxWait: 10_000 },
  );
}
