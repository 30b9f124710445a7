/**
 * A roll's progress through the chain as a client sees it: six steps, each done, current or pending, with
 * the date it was reached. Computed from the records (coupons, specimens, runs, issued certificates), never
 * from who did the work. Pure: no framework imports.
 */
export const ROLL_PROGRESS_STEPS = [
  { key: "received", label: "Received" },
  { key: "cut", label: "Cut" },
  { key: "prepared", label: "Specimen prepared" },
  { key: "testing", label: "Under test" },
  { key: "tested", label: "Tested" },
  { key: "certified", label: "On a certificate" },
] as const;

export type RollProgressKey = (typeof ROLL_PROGRESS_STEPS)[number]["key"];
/** done: passed; current: where the roll is now; pending: still ahead. */
export type RollProgressStatus = "done" | "current" | "pending";
export type RollProgressStep = { key: RollProgressKey; label: string; status: RollProgressStatus; at: Date | null };

export type RollChainFacts = {
  receivedAt: Date;
  coupons: Array<{
    cutAt: Date;
    specimens: Array<{ preparedAt: Date; runs: Array<{ state: string; assignedAt: Date; terminatedAt: Date | null }> }>;
  }>;
  /** Issue dates of the issued certificate revisions that report a result of this roll. */
  certificateIssuedAt: Date[];
};

// Run states in which the specimen is still in its cell (lib/runs state machine: before termination).
const RUNNING_STATES = new Set(["SET_UP", "SATURATING", "EQUILIBRATING", "PERMEATING"]);

function earliest(dates: Array<Date | null>): Date | null {
  const known = dates.filter((d): d is Date => d !== null);
  return known.length === 0 ? null : new Date(Math.min(...known.map((d) => d.getTime())));
}

function latest(dates: Array<Date | null>): Date | null {
  const known = dates.filter((d): d is Date => d !== null);
  return known.length === 0 ? null : new Date(Math.max(...known.map((d) => d.getTime())));
}

/** The six steps of one roll, in order; the last step reached is "current" unless it is the final one. */
export function computeRollProgress(facts: RollChainFacts): RollProgressStep[] {
  const specimens = facts.coupons.flatMap((c) => c.specimens);
  const runs = specimens.flatMap((s) => s.runs);
  const ended = runs.filter((r) => !RUNNING_STATES.has(r.state));
  // "Tested" only once no run of the roll is still in a cell, so a client is never told too early.
  const testedAt = ended.length > 0 && ended.length === runs.length ? (latest(ended.map((r) => r.terminatedAt)) ?? latest(ended.map((r) => r.assignedAt))) : null;
  const reached: Record<RollProgressKey, Date | null> = {
    received: facts.receivedAt,
    cut: earliest(facts.coupons.map((c) => c.cutAt)),
    prepared: earliest(specimens.map((s) => s.preparedAt)),
    testing: earliest(runs.map((r) => r.assignedAt)),
    tested: testedAt,
    certified: earliest(facts.certificateIssuedAt),
  };
  // A later step implies the earlier ones, whatever records are missing (the date then stays unknown).
  let last = 0;
  ROLL_PROGRESS_STEPS.forEach((step, index) => {
    if (reached[step.key]) last = index;
  });
  const final = ROLL_PROGRESS_STEPS.length - 1;
  return ROLL_PROGRESS_STEPS.map((step, index) => ({
    key: step.key,
    label: step.label,
    status: index < last || (index === last && last === final) ? "done" : index === last ? "current" : "pending",
    at: index <= last ? reached[step.key] : null,
  }));
}

/** The label of the step a roll is at now (the current step, or the final one when all are done). */
export function describeRollProgress(steps: RollProgressStep[]): string {
  return (steps.find((s) => s.status === "current") ?? steps[steps.length - 1])?.label ?? "";
}
