/**
 * The cell board's head line. A cell counts as free only when it can take a run now: no run in it and a
 * usable calibration. An empty cell that is overdue or out of service is counted apart, so the head line
 * never promises more cells than a technician can load.
 */
export function summariseCellBoard(cells: readonly { run: unknown; calibration: { usable: boolean } }[]) {
  const empty = cells.filter((c) => !c.run);
  const free = empty.filter((c) => c.calibration.usable).length;
  return { total: cells.length, free, notUsable: empty.length - free };
}

export function cellBoardHeadline(summary: ReturnType<typeof summariseCellBoard>) {
  const parts = [`${summary.total} ${summary.total === 1 ? "cell" : "cells"}`, `${summary.free} free`];
  if (summary.notUsable > 0) parts.push(`${summary.notUsable} not usable`);
  return parts.join(" · ");
}
