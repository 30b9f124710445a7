/**
 * How long sign-in stays closed for an account after repeated failures. The first few mistakes cost
 * nothing; after that the wait doubles per failure up to a quarter of an hour (common practice for
 * slowing password guessing without locking people out for good).
 */
export const FREE_FAILURES = 4;
export const FIRST_BLOCK_S = 15;
export const MAX_BLOCK_S = 15 * 60;
/** Failures older than this are forgotten. */
export const FAILURE_MEMORY_S = 60 * 60;

/** Seconds to refuse sign-in after the given number of consecutive failures. */
export function blockSecondsAfter(failures: number): number {
  if (failures <= FREE_FAILURES) return 0;
  return Math.min(MAX_BLOCK_S, FIRST_BLOCK_S * 2 ** (failures - FREE_FAILURES - 1));
}
