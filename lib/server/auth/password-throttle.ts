import "server-only";
import { AppError } from "@/lib/errors/app-error";
import {
  blockSecondsAfter, FAILURE_MEMORY_S, KNOWN_ADDRESS_DAYS, THROTTLE_RULES, throttleKeys, throttleMessage, type ThrottleKeyKind,
} from "@/lib/policy/sign-in-throttle";
import { getDb, type Db } from "../db/client";
import type { Tx } from "../db/transaction";

// Parallel attempts on one account queue on its counter row; under load the default 2 s wait for a
// connection is too short and would turn a counted attempt into a server error. Same limits as withActor.
const LOCK_WAIT = { maxWait: 10_000, timeout: 15_000 };

/** Who is trying a password: the account's e-mail and the client's network address (null when unknown). */
export type PasswordAttempt = { email: string; address: string | null };

/**
 * Checks a password under the throttle (lib/policy/sign-in-throttle.ts). The attempt is counted before
 * `compare` runs, by one atomic statement per counter, so parallel attempts see each other's counts and
 * a blocked attempt never reaches the (slow) password hash. A success clears the account's counts and
 * remembers the address. Throws AppError TOO_MANY_ATTEMPTS while blocked; returns what `compare` says.
 */
export async function checkPasswordThrottled(attempt: PasswordAttempt, compare: () => Promise<boolean>, options: { db?: Db; now?: Date } = {}): Promise<boolean> {
  const db = options.db ?? getDb();
  const now = options.now ?? new Date();
  const email = attempt.email.trim().toLowerCase();
  const known = attempt.address ? await isKnownAddress(db, email, attempt.address, now) : false;
  const keys = throttleKeys(email, attempt.address, known);

  // One transaction: when any counter is blocked, none of this attempt's counts are kept.
  await db.$transaction(async (tx) => {
    for (const { key, kind } of keys) await countAttempt(tx, key, kind, now);
  }, LOCK_WAIT);

  const ok = await compare();
  if (ok) await recordSuccess(db, email, attempt.address, now);
  return ok;
}

async function isKnownAddress(db: Db, email: string, address: string, now: Date): Promise<boolean> {
  const since = new Date(now.getTime() - KNOWN_ADDRESS_DAYS * 86_400_000);
  const row = await db.signInKnownAddress.findUnique({ where: { accountEmail_address: { accountEmail: email, address } } });
  return !!row && row.lastSuccessAt >= since;
}

// Counts one attempt under `key` unless the key is blocked; the row stays locked until the transaction ends.
async function countAttempt(tx: Tx, key: string, kind: ThrottleKeyKind, now: Date): Promise<void> {
  const staleBefore = new Date(now.getTime() - FAILURE_MEMORY_S * 1000);
  const counted = await tx.$queryRaw<Array<{ failures: number }>>`
    INSERT INTO "SignInThrottle" AS t ("key", "failures", "lastFailureAt", "blockedUntil") VALUES (${key}, 1, ${now}, NULL)
    ON CONFLICT ("key") DO UPDATE SET
      "failures" = CASE WHEN t."lastFailureAt" < ${staleBefore} THEN 1 ELSE t."failures" + 1 END,
      "lastFailureAt" = ${now}
    WHERE t."blockedUntil" IS NULL OR t."blockedUntil" <= ${now}
    RETURNING "failures"`;
  const failures = counted[0]?.failures;
  if (failures === undefined) {
    const blocked = await tx.signInThrottle.findUnique({ where: { key }, select: { blockedUntil: true } });
    const waitS = Math.max(1, Math.ceil(((blocked?.blockedUntil?.getTime() ?? now.getTime()) - now.getTime()) / 1000));
    throw new AppError("TOO_MANY_ATTEMPTS", throttleMessage(kind, waitS), { details: { retryAfterS: waitS, key: kind } });
  }
  const blockS = blockSecondsAfter(failures, THROTTLE_RULES[kind]);
  if (blockS > 0) await tx.signInThrottle.update({ where: { key }, data: { blockedUntil: new Date(now.getTime() + blockS * 1000) } });
}

async function recordSuccess(db: Db, email: string, address: string | null, now: Date): Promise<void> {
  const keys = throttleKeys(email, address, false);
  await db.$transaction(async (tx) => {
    const own = keys.filter((k) => k.kind !== "address").map((k) => k.key);
    await tx.signInThrottle.deleteMany({ where: { key: { in: own } } });
    // The address's count is shared with other accounts; this attempt's share is given back.
    const shared = keys.find((k) => k.kind === "address");
    if (shared) await tx.signInThrottle.updateMany({ where: { key: shared.key, failures: { gt: 0 } }, data: { failures: { decrement: 1 } } });
    if (address)
      await tx.signInKnownAddress.upsert({
        where: { accountEmail_address: { accountEmail: email, address } },
        create: { accountEmail: email, address, lastSuccessAt: now },
        update: { lastSuccessAt: now },
      });
  }, LOCK_WAIT);
}

/** Clears an account's counts (an administrator's password reset lets the person in at once). */
export async function clearPasswordThrottle(tx: Tx, email: string): Promise<void> {
  const account = email.trim().toLowerCase();
  await tx.signInThrottle.deleteMany({ where: { OR: [{ key: `account:${account}` }, { key: { startsWith: `pair:${account}|` } }] } });
}
