"use client";

import { CartesianGrid, Legend, Line, LineChart, ReferenceArea, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

import type { ChartPoint } from "@/lib/runs/chart-series";

export type { ChartPoint };

const sci = (v: number) => (Number.isFinite(v) ? v.toExponential(2) : "");
const COLOURS = { inflow: "#1f6f78", outflow: "#9a5b2f", k: "#4f5f66" };

function Chart({ title, children, testId }: { title: string; children: React.ReactElement; testId: string }) {
  return (
    <figure className="card" data-testid={testId} style={{ margin: 0 }}>
      <figcaption style={{ fontWeight: 600, marginBottom: "0.4rem" }}>{title}</figcaption>
      <div style={{ width: "100%", height: 220 }}>
        <ResponsiveContainer>{children}</ResponsiveContainer>
      </div>
    </figure>
  );
}

/**
 * Flux, outflow/inflow ratio with its acceptance band, k at 20 °C, cumulative volumes and (when the
 * specimen's pore volume is known) pore volumes of flow over elapsed time; each refill or drain is a
 * dashed vertical line, with no interval across it.
 */
export function RunCharts({ points, ratioBand, refillHours = [], minPoreVolumes }: { points: ChartPoint[]; ratioBand: [number, number]; refillHours?: number[]; minPoreVolumes?: number }) {
  const axis = <XAxis dataKey="hours" type="number" domain={["dataMin", "dataMax"]} tickFormatter={(h: number) => `${Math.round(h)} h`} />;
  // Functions, not elements with keys of their own: recharts reads its children's props directly.
  const refills = () => refillHours.map((h, i) => <ReferenceLine key={`refill-${i}`} x={h} stroke="#8a8f94" strokeDasharray="4 3" label={i === 0 ? { value: "refill", position: "insideTopLeft", fontSize: 11 } : undefined} />);
  const withPoreVolumes = points.some((p) => Number.isFinite(p.poreVolumes));
  // A dot per point helps a short run; on a long one it is thousands of shapes and hides the line.
  const dot = points.length <= 150;
  return (
    <div className="grid">
      <Chart title="Flux (m³/m²/s)" testId="chart-flux">
        <LineChart data={points} margin={{ left: 10, right: 10 }}>
          <CartesianGrid strokeDasharray="3 3" />{axis}<YAxis tickFormatter={sci} width={70} /><Tooltip formatter={(v) => sci(Number(v))} labelFormatter={(h) => `${Number(h).toFixed(1)} h`} /><Legend />
          <Line type="monotone" dataKey="inflowFlux" name="inflow" stroke={COLOURS.inflow} dot={dot} isAnimationActive={false} />
          <Line type="monotone" dataKey="outflowFlux" name="outflow" stroke={COLOURS.outflow} dot={dot} isAnimationActive={false} />
          {refills()}
        </LineChart>
      </Chart>
      <Chart title={`Outflow / inflow (accepted ${ratioBand[0]} to ${ratioBand[1]})`} testId="chart-ratio">
        <LineChart data={points} margin={{ left: 10, right: 10 }}>
          <CartesianGrid strokeDasharray="3 3" />{axis}<YAxis domain={[0, 2]} width={40} />
          <ReferenceArea y1={ratioBand[0]} y2={ratioBand[1]} fill="#e3f1e5" fillOpacity={0.8} />
          <Tooltip formatter={(v) => Number(v).toFixed(3)} labelFormatter={(h) => `${Number(h).toFixed(1)} h`} />
          <Line type="monotone" dataKey="ratio" name="ratio" stroke={COLOURS.k} dot={dot} isAnimationActive={false} />
        </LineChart>
      </Chart>
      <Chart title="Hydraulic conductivity at 20 °C (m/s)" testId="chart-k20">
        <LineChart data={points} margin={{ left: 10, right: 10 }}>
          <CartesianGrid strokeDasharray="3 3" />{axis}<YAxis tickFormatter={sci} width={70} /><Tooltip formatter={(v) => sci(Number(v))} labelFormatter={(h) => `${Number(h).toFixed(1)} h`} />
          <Line type="monotone" dataKey="k20" name="k20" stroke={COLOURS.k} dot={dot} isAnimationActive={false} />
          {refills()}
        </LineChart>
      </Chart>
      <Chart title="Cumulative volume (mL)" testId="chart-volumes">
        <LineChart data={points} margin={{ left: 10, right: 10 }}>
          <CartesianGrid strokeDasharray="3 3" />{axis}<YAxis width={50} /><Tooltip formatter={(v) => Number(v).toFixed(3)} labelFormatter={(h) => `${Number(h).toFixed(1)} h`} /><Legend />
          <Line type="monotone" dataKey="inflowMl" name="inflow" stroke={COLOURS.inflow} dot={dot} isAnimationActive={false} />
          <Line type="monotone" dataKey="outflowMl" name="outflow" stroke={COLOURS.outflow} dot={dot} isAnimationActive={false} />
          {refills()}
        </LineChart>
      </Chart>
      {withPoreVolumes && (
        <Chart title={`Pore volumes of flow${minPoreVolumes !== undefined ? ` (at least ${minPoreVolumes})` : ""}`} testId="chart-pore-volumes">
          <LineChart data={points} margin={{ left: 10, right: 10 }}>
            <CartesianGrid strokeDasharray="3 3" />{axis}<YAxis width={40} /><Tooltip formatter={(v) => Number(v).toFixed(2)} labelFormatter={(h) => `${Number(h).toFixed(1)} h`} />
            {minPoreVolumes !== undefined && <ReferenceLine y={minPoreVolumes} stroke="#4f7f55" strokeDasharray="4 3" />}
            <Line type="monotone" dataKey="poreVolumes" name="pore volumes" stroke={COLOURS.outflow} dot={dot} isAnimationActive={false} />
            {refills()}
          </LineChart>
        </Chart>
      )}
    </div>
  );
}
