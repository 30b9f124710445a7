import type { CalibrationStatus } from "@/lib/equipment/calibration-status";
import styles from "./equipment.module.css";

const TAGS: Record<CalibrationStatus["state"], { label: string; tone: string }> = {
  current: { label: "current", tone: "state-ok" },
  "due-soon": { label: "due soon", tone: "state-warn" },
  overdue: { label: "overdue", tone: "state-bad" },
  never: { label: "never calibrated", tone: "state-bad" },
  failed: { label: "failed", tone: "state-bad" },
  "out-of-service": { label: "out of service", tone: styles.tagIdle! },
};

/** The calibration state as a tag; the full sentence (with the due date) is its tooltip. */
export function CalibrationTag({ status, retired = false }: { status: CalibrationStatus; retired?: boolean }) {
  const tag = TAGS[status.state];
  return (
    <span className={`state ${tag.tone}`} title={status.message} data-calibration={status.state}>
      {retired && status.state === "out-of-service" ? "retired" : tag.label}
    </span>
  );
}
