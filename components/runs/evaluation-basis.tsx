import type { RunVerdict } from "@/lib/evaluation/run-evaluation-context";
import { unitWeightWords } from "@/lib/results/basis-words";

/** How the run's numbers are computed: the calculation, the settings version, the gradient's thickness, refills, leakage. */
export function EvaluationBasis({ verdict }: { verdict: RunVerdict }) {
  const { calculation, settings, evaluation, leakage } = verdict;
  return (
    <section className="card" data-testid="evaluation-basis">
      <h2>How this is computed</h2>
      <p data-testid="calculation"><strong>{calculation.key === "falling-head-rising-tail" ? "Falling head, rising tail (ASTM D5084 method C)." : "Constant head."}</strong> {calculation.text}</p>
      <p className="muted">
        Criteria from {settings.label}{settings.chosen ? `, chosen by ${settings.chosen.by}: ${settings.chosen.reason}` : " (in force when the run started)"}. Gradient from the{" "}
        {verdict.thicknessBasis === "post-test" ? "post-test bentonite layer thickness" : "initial specimen thickness (until the post-test thickness is recorded)"}
        {evaluation ? `; unit weight of water: ${unitWeightWords(evaluation.unitWeightBasis)}` : ""}.
        {verdict.refillsAtS.length ? ` ${verdict.refillsAtS.length} refill${verdict.refillsAtS.length === 1 ? "" : "s"} or drain${verdict.refillsAtS.length === 1 ? "" : "s"}: no interval spans one.` : ""}
      </p>
      {leakage && <p className={leakage.flagged ? "notice notice-caution" : "muted"} data-testid="leakage-statement">{leakage.statement}</p>}
    </section>
  );
}
