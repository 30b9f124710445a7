import { ITEM_STATE_LABELS, RUN_STATE_LABELS } from "@/lib/format/states";

const TONE: Record<string, string> = {
  RETURNED: "state-warn", SUBMITTED: "state-warn", APPROVED: "state-ok", TESTED: "state-ok", DISPOSED: "state-bad", ABANDONED: "state-bad",
};

export function StateTag({ state, kind = "item" }: { state: string; kind?: "item" | "run" }) {
  const label = (kind === "run" ? RUN_STATE_LABELS : ITEM_STATE_LABELS)[state] ?? state;
  return <span className={`state ${TONE[state] ?? ""}`}>{label}</span>;
}
