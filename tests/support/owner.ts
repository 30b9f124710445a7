import { inject } from "vitest";
import { OWNER_ROLE } from "../../scripts/support/database-roles";
import { createDb, type Db } from "@/lib/server/db/client";
import type { Actor, Tx } from "@/lib/server/db/transaction";

let ownerDb: Db | null = null;

/**
 * Runs `work` in a transaction as the migration owner, for tests of what the database refuses even its
 * owner (triggers) and for set-up the runtime role may not do. SET LOCAL ROLE makes it the owner on the
 * embedded database too, where every connection shares one session (scripts/support/embedded-roles.ts).
 */
export async function withOwner<T>(actor: Actor, work: (tx: Tx) => Promise<T>): Promise<T> {
  ownerDb ??= createDb(inject("ownerDatabaseUrl"));
  return ownerDb.$transaction(async (tx) => {
    await tx.$executeRawUnsafe(`SET LOCAL ROLE ${OWNER_ROLE}`);
    await tx.$executeRaw`SELECT set_config('seepline.actor_id', ${actor.id}, true)`;
    return work(tx);
  });
}
