"use client";

import { useId, useState } from "react";
import { explainConformance } from "@/lib/results/conformance-summary";
import { formatUnit } from "@/lib/results/format-result";
import { PROPERTY_UNITS, TEST_PROPERTY_LABELS } from "@/lib/results/property-units";
import type { LimitRow } from "./limits-table";
import styles from "./specifications.module.css";

/**
 * "Try a value": the conformance decision the certificate would state for a result, with the numbers
 * that decided it, computed in the browser by the same pure module certificate issuing uses.
 */
export function TryValue({ limits }: { limits: LimitRow[] }) {
  const id = useId();
  const [limitId, setLimitId] = useState(limits[0]?.id ?? "");
  const limit = limits.find((l) => l.id === limitId) ?? limits[0];
  const units = limit ? PROPERTY_UNITS[limit.property] : [];
  const [unit, setUnit] = useState<string>(limit?.unit ?? "");
  const [text, setText] = useState("");
  if (!limit) return <p className="empty">Add a limit to try values against it.</p>;
  const resultUnit = units.includes(unit) ? unit : limit.unit;

  let outcome: { error: string } | ReturnType<typeof explainConformance> | null = null;
  const typed = text.trim().replace(",", ".");
  if (typed !== "") {
    const value = Number(typed);
    if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(typed) || !Number.isFinite(value)) outcome = { error: "Type the result as a number, e.g. 5.4e-11 or 23.5." };
    else {
      try {
        outcome = explainConformance({ value, unit: resultUnit }, limit);
      } catch (error) {
        outcome = { error: error instanceof Error ? error.message : String(error) };
      }
    }
  }

  return (
    <div className={styles.tryBox} data-testid="try-value">
      <div className="field">
        <label htmlFor={`${id}-limit`}>Against</label>
        <select id={`${id}-limit`} value={limit.id} onChange={(e) => { const next = limits.find((l) => l.id === e.target.value); setLimitId(e.target.value); if (next) setUnit(next.unit); }}>
          {limits.map((l) => <option key={l.id} value={l.id}>{TEST_PROPERTY_LABELS[l.property]} {l.direction === "MAXIMUM" ? "≤" : "≥"} {l.limitText} {formatUnit(l.unit)}</option>)}
        </select>
      </div>
      <div className={styles.valueRow}>
        <div className="field">
          <label htmlFor={`${id}-value`}>Result</label>
          <input id={`${id}-value`} className="mono" inputMode="decimal" autoComplete="off" placeholder="e.g. 5.4e-11" value={text} onChange={(e) => setText(e.target.value)} />
        </div>
        <div className="field">
          <label htmlFor={`${id}-unit`}>Unit</label>
          <select id={`${id}-unit`} value={resultUnit} onChange={(e) => setUnit(e.target.value)}>{units.map((u) => <option key={u} value={u}>{formatUnit(u)}</option>)}</select>
        </div>
      </div>
      {outcome === null && <p className="hint">Type a result to see how it would be judged and stated on a certificate.</p>}
      {outcome && "error" in outcome && <div className="notice notice-error" role="status">{outcome.error}</div>}
      {outcome && !("error" in outcome) && (
        <div role="status">
          <dl className={styles.working}>
            <dt>Result</dt><dd>{outcome.value} {formatUnit(resultUnit)}</dd>
            {outcome.converted && <><dt>In the limit's unit</dt><dd>{outcome.valueInLimitUnit} {formatUnit(limit.unit)}</dd></>}
            <dt>Rounded to the place of</dt><dd>{outcome.roundingPlace ?? "not rounded (absolute method)"}</dd>
            <dt>Compared value</dt><dd>{outcome.summary.comparedValue} {formatUnit(limit.unit)}</dd>
            <dt>Limit</dt><dd>{limit.direction === "MAXIMUM" ? "≤" : "≥"} {limit.limitText} {formatUnit(limit.unit)}</dd>
          </dl>
          <p className={`${styles.verdict} ${outcome.summary.conforms ? styles.verdictOk : styles.verdictBad}`}>{outcome.summary.conforms ? "Conforms" : "Does not conform"}</p>
          <p className="muted">Certificate statement: {outcome.summary.statement}</p>
        </div>
      )}
    </div>
  );
}
