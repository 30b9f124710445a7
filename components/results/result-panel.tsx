import type { RunVerdict } from "@/lib/evaluation/run-evaluation-context";
import type { TestMethod } from "@/lib/hydraulics";
import { UNIT_SYSTEM_LABELS, type UnitSystem } from "@/lib/format/result-numbers";
import { reportedResults, type PreviewLimits } from "@/lib/results/reported-results";
import { ScrollArea } from "@/components/ui/scroll-area";

type Props = { verdict: RunVerdict; method: TestMethod; earlyEnd: boolean; unitSystem: UnitSystem; limits: PreviewLimits };

/**
 * The reported values of a run, once it has them: each result in the reader's units with its expanded
 * uncertainty, a conformance preview against the project's specification, and what the numbers rest on.
 * Its own component so the run page's readings and charts can change around it.
 */
export function ResultPanel({ verdict, method, earlyEnd, unitSystem, limits }: Props) {
  const reported = reportedResults(verdict, method, { earlyEnd, unitSystem, limits });
  if (!reported.ok) return null;
  return (
    <section className="card" data-testid="result-panel">
      <h2>Reported result</h2>
      <p className="muted">Shown in {UNIT_SYSTEM_LABELS[unitSystem]} (change under My account).{limits ? ` Conformance preview against ${limits.specificationName}.` : ""}</p>
      <ScrollArea>
        <table className="list">
          <thead><tr><th>Property</th><th>Result</th><th>Expanded uncertainty (k = 2, about 95 %)</th><th>Limit</th><th>Preview</th></tr></thead>
          <tbody>
            {reported.lines.map((l) => (
              <tr key={l.property} data-testid={`reported-${l.property}`}>
                <td>{l.label}{l.earlyEnd && <span className="state state-warn"> ended early</span>}</td>
                <td className="mono" data-testid="reported-value">{l.value}</td>
                <td className="mono">{l.uncertainty ? l.uncertainty : <span className="muted">{l.uncertaintyNote}</span>}</td>
                <td className="mono">{l.conformance.limit ?? "—"}</td>
                <td>
                  {l.conformance.limit === null
                    ? <span className="muted">not assessed</span>
                    : <span className={`state ${l.conformance.conforms ? "state-ok" : "state-bad"}`}>{l.conformance.conforms ? "conforms" : "does not conform"}</span>}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollArea>
      <ul className="muted" data-testid="reported-decisions">
        {reported.lines.map((l) => <li key={l.property}>{l.label}: {l.conformance.limit === null ? l.conformance.note : l.conformance.statement}</li>)}
      </ul>
      <dl className="facts" data-testid="reported-bases">
        {reported.bases.map(([label, text]) => <div key={label}><dt>{label}</dt><dd>{text}</dd></div>)}
      </dl>
    </section>
  );
}
