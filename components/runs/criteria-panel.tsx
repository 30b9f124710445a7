import type { Criterion } from "@/lib/hydraulics";

function valueText(c: Criterion): string {
  if (c.value === null) return "—";
  return Math.abs(c.value) >= 1e-3 && Math.abs(c.value) < 1e4 ? c.value.toPrecision(3) : c.value.toExponential(2);
}

/** Each termination criterion: met or not, its value against its limit, and why in one sentence. */
export function CriteriaPanel({ met, criteria }: { met: boolean; criteria: Criterion[] }) {
  return (
    <section className="card" data-testid="criteria-panel">
      <h2>Termination criteria {met ? <span className="state state-ok" data-testid="criteria-verdict">all met</span> : <span className="state state-warn" data-testid="criteria-verdict">not yet met</span>}</h2>
      <table className="list">
        <thead><tr><th>Criterion</th><th>Value</th><th>Limit</th><th /></tr></thead>
        <tbody>
          {criteria.map((c) => (
            <tr key={c.key}>
              <td>{c.name}<div className="muted">{c.message}</div></td>
              <td className="mono">{valueText(c)}</td>
              <td>{c.limit}</td>
              <td>{c.met ? <span className="state state-ok">met</span> : <span className="state state-bad">not met</span>}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
