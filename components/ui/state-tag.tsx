import { ITEM_STATE_LABELS, RUN_STATE_LABELS } from "@/lib/format/states";

const TONE: Record<string, string> = {
  RETURNED: "state-warn", SUBMITTED: "state-warn", APPROVED: "state-ok", TESTED: "state-ok", DISPOSED: "state-bad", ABANDONED: "state-bad",
};

/** A state's label and its tone's class (lists pass these to their rows as plain strings). */
export function stateTagParts(state: string, kind: "item" | "run" = "item"): readonly [string, string] {
  return [(kind === "run" ? RUN_STATE_LABELS : ITEM_STATE_LABELS)[state] ?? state, TONE[state] ?? ""];
}

export function StateTag({ state, kind = "item" }: { state: string; kind?: "item" | "run" }) {
  const [label, tone] = stateTagParts(state, kind);
  return <span className={`state ${tone}`}>{label}</span>;
}
