/**
 * The chain of custody as an explicit state machine: which custody action may happen to a roll, coupon
 * or specimen in each state, and the state it leaves the item in. Pure; the database operations ask it
 * before every change and record the answer as a custody event.
 */
export const ITEM_STATES = ["RECEIVED", "STORED", "CUT", "PREPARED", "ASSIGNED", "UNDER_TEST", "TESTED", "RETAINED", "DISPOSED"] as const;
export type ItemStateName = (typeof ITEM_STATES)[number];

export const CUSTODY_ACTIONS = ["RECEIVED", "STORED", "MOVED", "CUT", "PREPARED", "ASSIGNED", "TEST_STARTED", "TESTED", "RETAINED", "DISPOSED", "WITHDRAWN"] as const;
export type CustodyActionName = (typeof CUSTODY_ACTIONS)[number];

export type ItemKind = "roll" | "coupon" | "specimen";

type Table = Partial<Record<ItemStateName, Partial<Record<CustodyActionName, ItemStateName>>>>;

// MOVED changes only the location, so it keeps the state; it is allowed wherever the item still exists.
const ROLL: Table = {
  RECEIVED: { STORED: "STORED", MOVED: "RECEIVED", CUT: "CUT", RETAINED: "RETAINED" },
  STORED: { MOVED: "STORED", CUT: "CUT", RETAINED: "RETAINED" },
  CUT: { MOVED: "CUT", CUT: "CUT", TEST_STARTED: "UNDER_TEST", RETAINED: "RETAINED" },
  UNDER_TEST: { MOVED: "UNDER_TEST", CUT: "UNDER_TEST", TEST_STARTED: "UNDER_TEST", TESTED: "TESTED" },
  TESTED: { MOVED: "TESTED", CUT: "TESTED", TEST_STARTED: "UNDER_TEST", RETAINED: "RETAINED" },
  RETAINED: { MOVED: "RETAINED", DISPOSED: "DISPOSED" },
  DISPOSED: {},
};

// A coupon cut for an index test (a tensile strip, a mass-per-area square) is itself the test item: TESTED.
const COUPON: Table = {
  CUT: { MOVED: "CUT", PREPARED: "CUT", TESTED: "TESTED", RETAINED: "RETAINED" },
  TESTED: { MOVED: "TESTED", RETAINED: "RETAINED" },
  RETAINED: { MOVED: "RETAINED", DISPOSED: "DISPOSED" },
  DISPOSED: {},
};

// WITHDRAWN takes a specimen out of its cell when its run is abandoned; it is kept (retained) or then disposed of.
const SPECIMEN: Table = {
  PREPARED: { MOVED: "PREPARED", ASSIGNED: "ASSIGNED", RETAINED: "RETAINED" },
  ASSIGNED: { TEST_STARTED: "UNDER_TEST", PREPARED: "PREPARED", WITHDRAWN: "RETAINED" },
  UNDER_TEST: { TESTED: "TESTED", WITHDRAWN: "RETAINED" },
  TESTED: { MOVED: "TESTED", RETAINED: "RETAINED" },
  RETAINED: { MOVED: "RETAINED", DISPOSED: "DISPOSED" },
  DISPOSED: {},
};

const TABLES: Record<ItemKind, Table> = { roll: ROLL, coupon: COUPON, specimen: SPECIMEN };

/** The state an item starts in when it is created. */
export const INITIAL_STATE: Record<ItemKind, ItemStateName> = { roll: "RECEIVED", coupon: "CUT", specimen: "PREPARED" };

export const ACTION_WORDS: Record<CustodyActionName, string> = {
  RECEIVED: "receive", STORED: "store", MOVED: "move", CUT: "cut a coupon from", PREPARED: "prepare a specimen from",
  ASSIGNED: "assign to a cell", TEST_STARTED: "start testing", TESTED: "finish testing", RETAINED: "retain", DISPOSED: "dispose of",
  WITHDRAWN: "take out of its cell",
};

export const STATE_WORDS: Record<ItemStateName, string> = {
  RECEIVED: "received", STORED: "stored", CUT: "cut", PREPARED: "prepared", ASSIGNED: "in a cell",
  UNDER_TEST: "under test", TESTED: "tested", RETAINED: "retained", DISPOSED: "disposed of",
};

/** The actions allowed for an item of `kind` in `state`. */
export function allowedActions(kind: ItemKind, state: ItemStateName): CustodyActionName[] {
  return Object.keys(TABLES[kind][state] ?? {}) as CustodyActionName[];
}

export type TransitionResult =
  | { ok: true; toState: ItemStateName }
  | { ok: false; allowed: CustodyActionName[]; message: string };

/** Whether `action` may happen to an item of `kind` in `state`, and the state it leads to. */
export function transition(kind: ItemKind, state: ItemStateName, action: CustodyActionName): TransitionResult {
  const toState = TABLES[kind][state]?.[action];
  if (toState) return { ok: true, toState };
  const allowed = allowedActions(kind, state);
  // Taking a specimen out of its cell is not a step of its own: abandoning the run does it, so it is not offered.
  const offered = allowed.filter((a) => a !== "WITHDRAWN");
  const allowedText = offered.length === 0 ? "nothing more can happen to it" : `from here it can only ${offered.map((a) => ACTION_WORDS[a]).join(", ")}`;
  return {
    ok: false,
    allowed,
    message: `A ${kind} that is ${STATE_WORDS[state]} cannot ${ACTION_WORDS[action]}; ${allowedText}.`,
  };
}
