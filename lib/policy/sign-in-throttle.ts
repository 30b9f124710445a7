/**
 * How password checks are slowed after failures (sign-in, and the checks inside a session: changing one's
 * own password, signing a certificate). Every attempt is counted before the password is compared, under
 * three keys, each with its own rule:
 * - one account from one network address: the first few mistakes cost nothing, then the wait doubles up
 *   to a quarter of an hour (common practice for slowing password guessing);
 * - one network address, whatever the account: the same, with more free mistakes for a shared office
 *   address (slows trying one password on many accounts);
 * - one account from anywhere: the same, but capped at one minute (the ceiling), and never applied to an
 *   address the account signed in from before, so nobody can lock a known user out by failing on purpose.
 * A success clears the account's counts.
 */
export type ThrottleRule = { freeFailures: number; firstBlockS: number; maxBlockS: number };

export const THROTTLE_RULES = {
  accountAtAddress: { freeFailures: 4, firstBlockS: 15, maxBlockS: 15 * 60 },
  address: { freeFailures: 20, firstBlockS: 15, maxBlockS: 15 * 60 },
  account: { freeFailures: 10, firstBlockS: 15, maxBlockS: 60 },
} as const satisfies Record<string, ThrottleRule>;
export type ThrottleKeyKind = keyof typeof THROTTLE_RULES;

/** The rule of one account at one address; kept under its old names for the tests and the sign-in form. */
export const FREE_FAILURES = THROTTLE_RULES.accountAtAddress.freeFailures;
export const FIRST_BLOCK_S = THROTTLE_RULES.accountAtAddress.firstBlockS;
export const MAX_BLOCK_S = THROTTLE_RULES.accountAtAddress.maxBlockS;
/** Failures older than this are forgotten. */
export const FAILURE_MEMORY_S = 60 * 60;
/** An address the account signed in from within this many days counts as known. */
export const KNOWN_ADDRESS_DAYS = 90;

/** Seconds to refuse attempts after the given number of consecutive failures under a rule. */
export function blockSecondsAfter(failures: number, rule: ThrottleRule = THROTTLE_RULES.accountAtAddress): number {
  if (failures <= rule.freeFailures) return 0;
  return Math.min(rule.maxBlockS, rule.firstBlockS * 2 ** (failures - rule.freeFailures - 1));
}

/** The counter keys of an attempt, in the order they are locked (always the same, so two attempts never deadlock). */
export function throttleKeys(email: string, address: string | null, addressKnown: boolean): Array<{ key: string; kind: ThrottleKeyKind }> {
  const account = email.trim().toLowerCase();
  const where = address ?? "unknown";
  const keys: Array<{ key: string; kind: ThrottleKeyKind }> = [{ key: `pair:${account}|${where}`, kind: "accountAtAddress" }];
  if (address) keys.push({ key: `address:${address}`, kind: "address" });
  if (!addressKnown) keys.push({ key: `account:${account}`, kind: "account" });
  return keys;
}

/** The sentence for a blocked attempt. */
export function throttleMessage(kind: ThrottleKeyKind, waitS: number): string {
  const wait = waitS >= 120 ? `${Math.ceil(waitS / 60)} minutes` : `${waitS} s`;
  if (kind === "address") return `Too many failed password attempts from this network address; try again in ${wait}.`;
  return `Too many failed password attempts for this account; try again in ${wait}.`;
}
