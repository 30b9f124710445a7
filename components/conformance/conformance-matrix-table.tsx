import type { MatrixLimit, MatrixRow } from "@/lib/conformance/conformance-matrix";
import { formatNumber, formatResultValue, formatUnit } from "@/lib/results/format-result";
import { TEST_PROPERTY_LABELS } from "@/lib/results/property-units";
import { ScrollArea } from "@/components/ui/scroll-area";

// Plain words and a tone per cell; a failure is always shown in full, never folded away.
const TONE: Record<string, string> = {
  conforms: "state-ok", fails: "state-bad", "awaiting review": "state-warn", returned: "state-warn", "in progress": "", "not tested": "", "not required": "",
};
const VERDICT: Record<MatrixRow["verdict"], { text: string; tone: string }> = {
  conforms: { text: "Conforms", tone: "state-ok" }, fails: { text: "Does not conform", tone: "state-bad" }, pending: { text: "Pending", tone: "state-warn" },
};

function limitText(l: MatrixLimit): string {
  return `${l.direction === "MAXIMUM" ? "≤" : "≥"} ${l.limitText} ${formatUnit(l.unit)}`;
}

/**
 * The conformance matrix: one row per roll, one column per property the specification lists, each cell the
 * approved result with its E29 decision or what is still pending. `rollHref` links each roll (staff only).
 */
export function ConformanceMatrixTable({ limits, rows, rollHref }: { limits: MatrixLimit[]; rows: MatrixRow[]; rollHref?: (labNumber: string) => string }) {
  if (limits.length === 0) return <p className="empty">The project has no specification with limits yet, so there is nothing to conform to.</p>;
  if (rows.length === 0) return <p className="empty">No rolls yet.</p>;
  return (
    <ScrollArea>
      <table className="list wrap-heads" data-testid="conformance-matrix">
        <thead>
          <tr>
            <th>Roll</th><th>Lot</th>
            {limits.map((l) => <th key={l.property} data-property={l.property}>{TEST_PROPERTY_LABELS[l.property]}<br /><span className="muted">{limitText(l)}</span></th>)}
            <th>Verdict</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.roll.id} data-roll={row.roll.labNumber}>
              <td>{rollHref ? <a className="mono" href={rollHref(row.roll.labNumber)}>{row.roll.labNumber}</a> : <span className="mono">{row.roll.labNumber}</span>}<br /><span className="muted">{row.roll.rollNumber}</span></td>
              <td>{row.roll.lotNumber}</td>
              {row.cells.map((c) => (
                <td key={c.property} data-property={c.property} data-status={c.status} title={c.decision ?? undefined}>
                  {c.value !== null && c.unit !== null && <div className="mono">{formatResultValue(c.value, c.unit, { significantDigits: 3 })}{c.standardDeviation !== null && <span className="muted"> (s {formatNumber(c.standardDeviation, { significantDigits: 2 })})</span>}{c.expandedUncertainty !== null && <span className="muted" style={{ display: "block" }}> ± {formatNumber(c.expandedUncertainty, { significantDigits: 2 })}</span>}</div>}
                  <span className={`state ${TONE[c.status] ?? ""}`}>{c.status}</span>
                  {c.status === "fails" && c.decision && <div className="hint" data-testid="failing-decision">{c.decision}</div>}
                  {c.source && c.status !== "conforms" && c.status !== "fails" && <div className="muted">{c.source}</div>}
                </td>
              ))}
              <td><span className={`state ${VERDICT[row.verdict].tone}`} data-testid="roll-verdict">{VERDICT[row.verdict].text}</span></td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="hint">Each result is judged against the limit as the specification writes it (ASTM E29: rounded to the limit&apos;s last place, halves to even, unless the limit is absolute); hover a result for the decision in words. A roll conforms when every property it is asked for has an approved result that conforms.</p>
    </ScrollArea>
  );
}
