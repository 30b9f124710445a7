"use client";

import { useMemo, useState } from "react";
import { columnsToPoints, type ChartSeries } from "@/lib/runs/chart-series";
import { RunCharts } from "./run-charts";

type Props = { labNumber: string; initial: ChartSeries; ratioBand: [number, number]; refillHours: number[]; minPoreVolumes?: number };

const MAX_REFILL_LINES = 200;

/**
 * The run charts over the whole run (downsampled on the server) with a zoom into a range of hours, which
 * asks the server for that range's own series, so detail hidden by downsampling shows when zoomed in.
 */
export function ZoomableRunCharts({ labNumber, initial, ratioBand, refillHours, minPoreVolumes }: Props) {
  const [series, setSeries] = useState(initial);
  const [from, setFrom] = useState("");
  const [to, setTo] = useState("");
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const points = useMemo(() => columnsToPoints(series.columns), [series]);
  const refills = refillHours.filter((h) => h >= series.shown.fromHours && h <= series.shown.toHours).slice(0, MAX_REFILL_LINES);
  const zoomed = series.shown.fromHours > series.span.fromHours || series.shown.toHours < series.span.toHours;

  async function load(range: { from: string; to: string } | null) {
    setBusy(true);
    setMessage(null);
    try {
      const query = range ? `?${new URLSearchParams({ fromHours: range.from.replace(",", "."), toHours: range.to.replace(",", ".") })}` : "";
      const response = await fetch(`/api/runs/${encodeURIComponent(labNumber)}/chart${query}`, { headers: { Accept: "application/json" } });
      const body = (await response.json()) as ChartSeries | { error: { message: string } };
      if ("error" in body) setMessage(body.error.message);
      else setSeries(body);
    } catch {
      setMessage("The chart data could not be loaded; check the connection and try again.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <section className="card" aria-label="Charts" data-testid="run-charts" aria-busy={busy}>
      <h2>Charts</h2>
      <form
        className="inline-form"
        onSubmit={(event) => {
          event.preventDefault();
          void load({ from, to });
        }}
        style={{ display: "flex", gap: "0.6rem", alignItems: "flex-end", flexWrap: "wrap", marginBottom: "0.6rem" }}
      >
        <div className="field">
          <label htmlFor="zoom-from">From (h)</label>
          <input id="zoom-from" inputMode="decimal" value={from} onChange={(e) => setFrom(e.target.value)} size={8} />
        </div>
        <div className="field">
          <label htmlFor="zoom-to">To (h)</label>
          <input id="zoom-to" inputMode="decimal" value={to} onChange={(e) => setTo(e.target.value)} size={8} />
        </div>
        <button type="submit" className="button button-quiet" disabled={busy}>Zoom</button>
        {zoomed && <button type="button" className="button button-quiet" disabled={busy} onClick={() => void load(null)}>Whole run</button>}
      </form>
      {message && <p className="notice notice-caution" role="alert" data-testid="zoom-message">{message}</p>}
      <p className="muted" data-testid="chart-coverage">
        {series.shown.fromHours.toFixed(1)} h to {series.shown.toHours.toFixed(1)} h of {series.span.fromHours.toFixed(1)} h to {series.span.toHours.toFixed(1)} h;{" "}
        {series.drawn < series.pointsInRange
          ? `${series.drawn.toLocaleString("en-GB")} of ${series.pointsInRange.toLocaleString("en-GB")} intervals drawn (largest-triangle-three-buckets); zoom in for every one. The criteria use every reading.`
          : `every interval drawn (${series.pointsInRange.toLocaleString("en-GB")}).`}
      </p>
      <RunCharts points={points} ratioBand={ratioBand} refillHours={refills} {...(minPoreVolumes !== undefined && { minPoreVolumes })} />
    </section>
  );
}
