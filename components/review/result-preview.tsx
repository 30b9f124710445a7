import type { RunVerdict } from "@/lib/evaluation/run-evaluation-context";
import { TEST_PROPERTY_LABELS } from "@/lib/results/property-units";
import { formatPropertyUncertainty, formatPropertyValue, type UnitSystem } from "@/lib/format/result-numbers";
import { formatPercent, resultUncertainty } from "@/lib/results/result-record";
import { resultsOfVerdict } from "@/lib/results/results-of-verdict";
import type { TestMethod } from "@/lib/hydraulics";
import { ScrollArea } from "@/components/ui/scroll-area";

/**
 * The results approval would record, each with its expanded uncertainty (k = 2) and the full budget:
 * every input's standard uncertainty, where it comes from, and what it adds; the three largest are the
 * ones the certificate prints.
 */
export function ResultPreview({ verdict, method, earlyEnd, unitSystem = "SI" }: { verdict: RunVerdict; method: TestMethod; earlyEnd: boolean; unitSystem?: UnitSystem }) {
  let results: ReturnType<typeof resultsOfVerdict>;
  try {
    results = resultsOfVerdict(verdict, method, { earlyEnd });
  } catch (error) {
    return <section className="card" data-testid="result-preview"><h2>Results</h2><p className="notice notice-caution">{error instanceof Error ? error.message : String(error)}</p></section>;
  }
  return (
    <section className="card" data-testid="result-preview">
      <h2>Uncertainty budget of the results approval would record</h2>
      {results.map((r) => {
        const u = resultUncertainty(r.property, r.uncertaintyBudget, verdict);
        return (
          <div key={r.property} className="stack-gap">
            <p>
              <strong>{TEST_PROPERTY_LABELS[r.property]}</strong>: {formatPropertyValue(r.property, r.value, r.unit, unitSystem).text}{" "}
              {r.expandedUncertainty !== null ? `${formatPropertyUncertainty(r.property, r.expandedUncertainty, r.value, r.unit, unitSystem)} (k = 2)` : "(uncertainty not stated)"}
              {r.earlyEnd && <span className="state state-warn"> ended early</span>}
            </p>
            {u.stated ? (
              <ScrollArea>
                <table className="list" data-testid={`uncertainty-budget-${r.property}`}>
                  <thead><tr><th>Input</th><th>Standard uncertainty</th><th>From</th><th>Adds (relative)</th></tr></thead>
                  <tbody>
                    {u.contributors.map((c, i) => (
                      <tr key={c.quantity}>
                        <td>{c.label}{i < 3 && <span className="muted"> · on the certificate</span>}</td>
                        <td className="mono">{c.standardUncertainty} {c.unit}</td>
                        <td>{c.source}</td>
                        <td className="mono">{formatPercent(c.relative)}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
                <p className="muted">Expanded relative uncertainty {formatPercent(u.expandedRelative)} (k = 2), first-order propagation (GUM) of the inputs above.</p>
              </ScrollArea>
            ) : <p className="muted" data-testid="uncertainty-not-stated">{u.reason}</p>}
          </div>
        );
      })}
    </section>
  );
}
