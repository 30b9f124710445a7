import { axisScale, powerOfTen, type AxisScale } from "@/lib/certificates/chart-scale";
import type { CertificateTest } from "@/lib/certificates/certificate-snapshot";

// One panel's drawing box in SVG units; it is scaled to half the page width (about 0.78 pt per unit).
const W = 320;
const H = 176;
const PAD = { left: 40, right: 12, top: 24, bottom: 30 };
const PLOT_W = W - PAD.left - PAD.right;
const PLOT_H = H - PAD.top - PAD.bottom;
const FONT = "DejaVu Sans, Liberation Sans, sans-serif";
// Markers help read a short series and only clutter a long one.
const MAX_MARKED_POINTS = 40;

type Point = { x: number; y: number };

function position(value: number, scale: AxisScale, length: number): number {
  return scale.max === scale.min ? 0 : ((value - scale.min) / (scale.max - scale.min)) * length;
}

function axisTitle(name: string, scale: AxisScale, unit: string): string {
  return scale.exponent === 0 ? `${name} (${unit})` : `${name} (×${powerOfTen(scale.exponent)} ${unit})`;
}

/** One line chart panel with labelled ticks on both axes. */
function Panel({ title, points, colour, unit, testId, refills = [] }: { title: string; points: Point[]; colour: string; unit: string; testId: string; refills?: number[] }) {
  const x = axisScale(points.map((p) => p.x), { includeZero: true, targetTicks: 6 });
  const inside = refills.filter((h) => h >= x.min && h <= x.max);
  const y = axisScale(points.map((p) => p.y), { includeZero: true, targetTicks: 5 });
  const px = (v: number) => PAD.left + position(v, x, PLOT_W);
  const py = (v: number) => PAD.top + PLOT_H - position(v, y, PLOT_H);
  const line = points.map((p) => `${px(p.x).toFixed(1)},${py(p.y).toFixed(1)}`).join(" ");
  return (
    <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={title} data-testid={testId} fontFamily={FONT}>
      <text x={PAD.left} y={12} fontSize={10} fontWeight={700} fill="#1d2a30">{axisTitle(title, y, unit)}</text>
      {y.ticks.map((t, i) => (
        <g key={`y${i}`}>
          <line x1={PAD.left} x2={W - PAD.right} y1={py(t)} y2={py(t)} stroke="#e4e1d9" strokeWidth={0.7} />
          <text x={PAD.left - 4} y={py(t) + 3.2} fontSize={9} textAnchor="end" fill="#4f5f66">{y.labels[i]}</text>
        </g>
      ))}
      {x.ticks.map((t, i) => (
        <g key={`x${i}`}>
          <line x1={px(t)} x2={px(t)} y1={PAD.top + PLOT_H} y2={PAD.top + PLOT_H + 3} stroke="#1d2a30" strokeWidth={0.7} />
          <text x={px(t)} y={PAD.top + PLOT_H + 13} fontSize={9} textAnchor="middle" fill="#4f5f66">{x.labels[i]}</text>
        </g>
      ))}
      <line x1={PAD.left} x2={PAD.left} y1={PAD.top} y2={PAD.top + PLOT_H} stroke="#1d2a30" strokeWidth={0.8} />
      <line x1={PAD.left} x2={W - PAD.right} y1={PAD.top + PLOT_H} y2={PAD.top + PLOT_H} stroke="#1d2a30" strokeWidth={0.8} />
      <text x={PAD.left + PLOT_W / 2} y={H - 3} fontSize={9} textAnchor="middle" fill="#1d2a30">{axisTitle("Elapsed time", x, "h")}</text>
      {inside.map((h, i) => <line key={`r${i}`} x1={px(h)} x2={px(h)} y1={PAD.top} y2={PAD.top + PLOT_H} stroke="#8a8f94" strokeWidth={0.7} strokeDasharray="2 2" data-refill="" />)}
      {points.length > 1 ? <polyline points={line} fill="none" stroke={colour} strokeWidth={1.4} strokeLinejoin="round" /> : null}
      {points.length <= MAX_MARKED_POINTS ? points.map((p, i) => <circle key={i} cx={px(p.x)} cy={py(p.y)} r={1.9} fill={colour} />) : null}
      {points.length === 0 ? <text x={PAD.left + PLOT_W / 2} y={PAD.top + PLOT_H / 2} fontSize={10} textAnchor="middle" fill="#4f5f66">no intervals recorded</text> : null}
    </svg>
  );
}

/** Flux and hydraulic conductivity at 20 °C over elapsed time, one panel each, drawn as inline SVG. */
export function CertificateChart({ test }: { test: CertificateTest }) {
  const valid = test.chart.filter((p) => Number.isFinite(p.hours));
  const flux = valid.filter((p) => Number.isFinite(p.flux)).map((p) => ({ x: p.hours, y: p.flux }));
  const k20 = valid.filter((p) => Number.isFinite(p.k20)).map((p) => ({ x: p.hours, y: p.k20 }));
  return (
    <figure className="cert-figure">
      <figcaption>
        Per permeation interval, {valid.length === 1 ? "1 interval" : `${valid.length} intervals`}: flux through the specimen (left) and hydraulic
        conductivity corrected to 20 °C (right), against elapsed time.{test.refillHours?.length ? " Dashed lines mark burette refills and drains; no interval spans one." : ""}
      </figcaption>
      <div className="cert-panels">
        <Panel title="Flux" points={flux} colour="#1f6f78" unit="m³/m²/s" testId="chart-flux" refills={test.refillHours} />
        <Panel title="k at 20 °C" points={k20} colour="#9a5b2f" unit="m/s" testId="chart-k20" refills={test.refillHours} />
      </div>
    </figure>
  );
}
