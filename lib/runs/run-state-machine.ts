/**
 * A test run as an explicit state machine: set up, saturating (back-pressure stages), equilibrating,
 * permeating, terminated, post-test recorded, submitted for review; a QA return sends it back to the
 * technician, an approval ends it. Before approval a run can be abandoned (a membrane leak, a blocked line):
 * it keeps its record, frees its cell and never reaches review. Pure; the run operations ask it before every change.
 */
export const RUN_STATES = ["SET_UP", "SATURATING", "EQUILIBRATING", "PERMEATING", "TERMINATED", "POST_TEST_RECORDED", "SUBMITTED", "RETURNED", "APPROVED", "ABANDONED"] as const;
export type RunStateName = (typeof RUN_STATES)[number];

export const RUN_STEPS = [
  "start-saturation", "add-stage", "start-equilibration", "start-permeation", "record-reading", "terminate", "record-post-test", "submit", "return", "approve", "reopen", "abandon",
] as const;
export type RunStep = (typeof RUN_STEPS)[number];

const TABLE: Record<RunStateName, Partial<Record<RunStep, RunStateName>>> = {
  SET_UP: { "start-saturation": "SATURATING", "add-stage": "SATURATING", abandon: "ABANDONED" },
  SATURATING: { "add-stage": "SATURATING", "start-equilibration": "EQUILIBRATING", abandon: "ABANDONED" },
  EQUILIBRATING: { "add-stage": "EQUILIBRATING", "start-permeation": "PERMEATING", abandon: "ABANDONED" },
  PERMEATING: { "record-reading": "PERMEATING", terminate: "TERMINATED", abandon: "ABANDONED" },
  TERMINATED: { "record-post-test": "POST_TEST_RECORDED", abandon: "ABANDONED" },
  POST_TEST_RECORDED: { "record-post-test": "POST_TEST_RECORDED", submit: "SUBMITTED", abandon: "ABANDONED" },
  SUBMITTED: { return: "RETURNED", approve: "APPROVED", abandon: "ABANDONED" },
  // Returned work is corrected by the technician (post-test data, reading corrections) and submitted again.
  RETURNED: { "record-post-test": "RETURNED", "record-reading": "RETURNED", submit: "SUBMITTED", abandon: "ABANDONED" },
  APPROVED: {},
  ABANDONED: {},
};

export const RUN_STEP_WORDS: Record<RunStep, string> = {
  "start-saturation": "start saturation", "add-stage": "record a back-pressure stage", "start-equilibration": "start the equilibration hold",
  "start-permeation": "start permeation", "record-reading": "record readings", terminate: "terminate the run", "record-post-test": "record post-test data",
  submit: "submit for review", return: "return it to the technician", approve: "approve it", reopen: "reopen it", abandon: "abandon it",
};

export const RUN_STATE_WORDS: Record<RunStateName, string> = {
  SET_UP: "set up", SATURATING: "saturating", EQUILIBRATING: "equilibrating", PERMEATING: "permeating", TERMINATED: "terminated",
  POST_TEST_RECORDED: "post-test recorded", SUBMITTED: "awaiting review", RETURNED: "returned for changes", APPROVED: "approved", ABANDONED: "abandoned",
};

export function allowedRunSteps(state: RunStateName): RunStep[] {
  return Object.keys(TABLE[state]) as RunStep[];
}

export type RunTransition = { ok: true; toState: RunStateName } | { ok: false; allowed: RunStep[]; message: string };

/** Whether `step` may be taken on a run in `state`, and the state it leads to. */
export function runTransition(state: RunStateName, step: RunStep): RunTransition {
  const toState = TABLE[state][step];
  if (toState) return { ok: true, toState };
  const allowed = allowedRunSteps(state);
  const rest = allowed.length ? `from here you can ${allowed.map((s) => RUN_STEP_WORDS[s]).join(", ")}` : "nothing more can be done to it";
  return { ok: false, allowed, message: `A run that is ${RUN_STATE_WORDS[state]} cannot ${RUN_STEP_WORDS[step]}; ${rest}.` };
}

/** Runs that hold their cell: the cell is not free until the run is terminated. */
export function holdsCell(state: RunStateName): boolean {
  return state === "SET_UP" || state === "SATURATING" || state === "EQUILIBRATING" || state === "PERMEATING";
}
