/**
 * One order of events for every sample: received <= cut <= prepared <= mounted <= each stage's start <=
 * readings, and nothing in the future. Each operation that takes a time asks this before saving, with the
 * events the new time must follow (or, for a correction, precede); the answer names the event it conflicts
 * with, so the person can see which record to check. Pure.
 */
import { formatDateTime } from "../format/dates";

/** Another record's time: "roll R26-00004 was received (shipment S26-00002)" at `at`. */
export type OrderedEvent = { at: Date; what: string };

/** A clock a few minutes ahead of the server's is not the future. */
export const FUTURE_TOLERANCE_MS = 5 * 60_000;

/**
 * The sentence that refuses `at` (what the person entered as `label`, e.g. "The cut time"), or null when it
 * keeps the order: not before any of `after`, not after any of `before`, not in the future.
 */
export function eventOrderProblem(input: {
  label: string;
  at: Date;
  after?: ReadonlyArray<OrderedEvent | null | undefined>;
  before?: ReadonlyArray<OrderedEvent | null | undefined>;
  now: Date;
  zone: string;
}): string | null {
  const when = (d: Date) => formatDateTime(d, input.zone);
  if (input.at.getTime() > input.now.getTime() + FUTURE_TOLERANCE_MS)
    return `${input.label} (${when(input.at)}) is in the future; enter when it happened.`;
  const latestEarlier = (input.after ?? []).filter((e): e is OrderedEvent => !!e).reduce<OrderedEvent | null>((l, e) => (!l || e.at > l.at ? e : l), null);
  if (latestEarlier && input.at < latestEarlier.at)
    return `${input.label} (${when(input.at)}) is before ${latestEarlier.what} (${when(latestEarlier.at)}); it cannot be earlier than that.`;
  const earliestLater = (input.before ?? []).filter((e): e is OrderedEvent => !!e).reduce<OrderedEvent | null>((f, e) => (!f || e.at < f.at ? e : f), null);
  if (earliestLater && input.at > earliestLater.at)
    return `${input.label} (${when(input.at)}) is after ${earliestLater.what} (${when(earliestLater.at)}); it cannot be later than that.`;
  return null;
}
