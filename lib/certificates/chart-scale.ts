/**
 * Axis arithmetic for the certificate's charts (drawn as plain SVG, so the PDF needs no chart library):
 * round tick values and short labels that share one power of ten. Pure.
 */

export type AxisScale = {
  /** Lowest and highest tick: the axis runs exactly between them. */
  min: number;
  max: number;
  ticks: number[];
  /** The power of ten every label is divided by (0 when the labels need none). */
  exponent: number;
  labels: string[];
};

// Round steps are 1, 2, 2.5 and 5 times a power of ten (common practice for chart axes).
const STEPS = [1, 2, 2.5, 5, 10];

function clean(value: number): number {
  return Number(value.toPrecision(12));
}

function niceStep(range: number, targetTicks: number): number {
  const rough = range / Math.max(1, targetTicks - 1);
  const power = 10 ** Math.floor(Math.log10(rough));
  const step = STEPS.find((s) => s * power >= rough * (1 - 1e-9)) ?? 10;
  return clean(step * power);
}

function decimalsOf(value: number): number {
  const text = clean(value).toString();
  if (text.includes("e")) return 0;
  return text.split(".")[1]?.length ?? 0;
}

/**
 * A scale covering the values (non-finite ones ignored) with about `targetTicks` round ticks. With
 * `includeZero` the axis starts at zero for positive data, so a steady flow looks steady.
 */
export function axisScale(values: readonly number[], options: { targetTicks?: number; includeZero?: boolean } = {}): AxisScale {
  const finite = values.filter(Number.isFinite);
  let lo = finite.length ? Math.min(...finite) : 0;
  let hi = finite.length ? Math.max(...finite) : 1;
  if (options.includeZero) [lo, hi] = [Math.min(lo, 0), Math.max(hi, 0)];
  if (lo === hi) [lo, hi] = lo === 0 ? [0, 1] : [lo - Math.abs(lo) * 0.1, hi + Math.abs(hi) * 0.1];
  const step = niceStep(hi - lo, options.targetTicks ?? 5);
  const first = Math.floor(lo / step + 1e-9);
  const last = Math.ceil(hi / step - 1e-9);
  const ticks: number[] = [];
  for (let k = first; k <= last; k++) ticks.push(clean(k * step));

  const largest = Math.max(...ticks.map(Math.abs));
  const magnitude = largest === 0 ? 0 : Math.floor(Math.log10(largest));
  // Plain labels read best from 0.01 to 9999; beyond that one factor goes into the axis title.
  const exponent = magnitude >= -2 && magnitude <= 3 ? 0 : magnitude;
  const decimals = decimalsOf(step / 10 ** exponent);
  const labels = ticks.map((t) => (t / 10 ** exponent).toFixed(decimals).replace(/^-(0\.?0*)$/, "$1"));
  return { min: ticks[0]!, max: ticks[ticks.length - 1]!, ticks, exponent, labels };
}

const SUPERSCRIPTS: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };

/** "10⁻⁹" for -9: the factor an axis title states, e.g. "Flux (×10⁻⁹ m³/m²/s)". */
export function powerOfTen(exponent: number): string {
  return `10${String(exponent).replace(/[-0-9]/g, (c) => SUPERSCRIPTS[c]!)}`;
}
