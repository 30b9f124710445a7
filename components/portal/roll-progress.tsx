import { formatDate } from "@/lib/format/dates";
import type { RollProgressStep } from "@/lib/portal/roll-progress";
import styles from "./roll-progress.module.css";

const SPOKEN: Record<RollProgressStep["status"], string> = { done: "done", current: "now", pending: "not yet" };

/** A roll's steps through the chain in one compact row: passed steps filled, the present one ringed. */
export function RollProgress({ steps, rollLabel, zone = "UTC" }: { steps: RollProgressStep[]; rollLabel: string; zone?: string }) {
  return (
    <ol className={styles.steps} aria-label={`Progress of roll ${rollLabel}`} data-testid="roll-progress">
      {steps.map((step) => (
        <li key={step.key} className={`${styles.step} ${styles[step.status]}`} data-step={step.key} data-status={step.status}>
          <span className={styles.marker} aria-hidden="true">{step.status === "done" ? "✓" : ""}</span>
          <span className={styles.label}>{step.label}</span>
          <span className={styles.date}>{step.at ? formatDate(step.at, zone) : step.status === "pending" ? "" : "—"}</span>
          <span className={styles.spoken}> ({SPOKEN[step.status]})</span>
        </li>
      ))}
    </ol>
  );
}
