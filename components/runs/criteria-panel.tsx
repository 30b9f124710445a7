import type { Criterion } from "@/lib/hydraulics";
import type { TrendAssessment } from "@/lib/hydraulics/termination";

function valueText(c: Criterion): string {
  if (c.value === null) return "—";
  return Math.abs(c.value) >= 1e-3 && Math.abs(c.value) < 1e4 ? c.value.toPrecision(3) : c.value.toExponential(2);
}

const pct = (f: number) => `${+(f * 100).toPrecision(2)} %`;

/** The trend row shows both tests: the slope's p-value and the fitted change across the window. */
function TrendValue({ c, trend }: { c: Criterion; trend: TrendAssessment | null }) {
  if (!trend) return <>{valueText(c)}</>;
  return (
    <span data-testid="trend-numbers">
      p = {trend.pValue.toPrecision(2)}{trend.statistical ? " (significant)" : ""}
      <br />change {pct(trend.relativeChange)}{trend.practical === null ? "" : trend.practical ? " (counts)" : " (too small to count)"}
    </span>
  );
}

/** Each termination criterion: met or not, its value against its limit, and why in one sentence; the settings version that set them. */
export function CriteriaPanel({ met, criteria, trend = null, settingsLabel }: { met: boolean; criteria: Criterion[]; trend?: TrendAssessment | null; settingsLabel?: string }) {
  return (
    <section className="card" data-testid="criteria-panel">
      <h2>Termination criteria {met ? <span className="state state-ok" data-testid="criteria-verdict">all met</span> : <span className="state state-warn" data-testid="criteria-verdict">not yet met</span>}</h2>
      {settingsLabel && <p className="muted" data-testid="criteria-settings">Judged by {settingsLabel}.</p>}
      <table className="list">
        <thead><tr><th>Criterion</th><th>Value</th><th>Limit</th><th>Met</th></tr></thead>
        <tbody>
          {criteria.map((c) => (
            <tr key={c.key}>
              <td>{c.name}<div className="muted">{c.message}</div></td>
              <td className="mono">{c.key === "trend" ? <TrendValue c={c} trend={trend} /> : valueText(c)}</td>
              <td>{c.limit}</td>
              <td>{c.met ? <span className="state state-ok">met</span> : <span className="state state-bad">not met</span>}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
