/**
 * A first-in, first-out gate that lets at most `concurrency` tasks run at once; the rest wait their turn.
 * Pure (no I/O), so it is unit-tested on its own; the PDF service puts one in front of Chromium.
 */
export function createFifoLimiter(concurrency: number) {
  if (!Number.isInteger(concurrency) || concurrency < 1) throw new RangeError(`concurrency must be a positive integer, got ${concurrency}`);
  let active = 0;
  const waiting: Array<() => void> = [];

  async function run<T>(task: () => Promise<T>): Promise<T> {
    if (active < concurrency) active += 1;
    // A finishing task hands its slot straight to the next waiter, so `active` stays the same then.
    else await new Promise<void>((resolve) => waiting.push(resolve));
    try {
      return await task();
    } finally {
      const next = waiting.shift();
      if (next) next();
      else active -= 1;
    }
  }

  return { run, stats: () => ({ active, waiting: waiting.length }) };
}
