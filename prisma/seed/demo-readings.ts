// Invented permeation readings for the demo runs: cumulative inflow and outflow of a specimen whose flux
// settles near a chosen value. Demo data only; never a check value.
export type DemoReading = {
  elapsedS: number; inflowCumulativeMl: number; outflowCumulativeMl: number; headPa: number; temperatureC: number;
};

/** Readings every `stepH` hours for `count` steps; flux in m^3/m^2/s, area in m^2. */
export function makeDemoReadings(options: { fluxM3PerM2PerS: number; areaM2: number; count: number; stepH: number; headPa: number }): DemoReading[] {
  const readings: DemoReading[] = [];
  let inflow = 0;
  let outflow = 0;
  for (let n = 0; n < options.count; n++) {
    const elapsedS = n * options.stepH * 3600;
    if (n > 0) {
      // A start-up transient that fades, and a small, repeatable wobble (no randomness: the demo is the same every time).
      const settle = 1 + 0.6 * Math.exp(-n / 2);
      const wobble = 1 + 0.04 * Math.sin(n * 1.7);
      const volumeMl = options.fluxM3PerM2PerS * settle * wobble * options.areaM2 * options.stepH * 3600 * 1e6;
      inflow += volumeMl * 1.03;
      outflow += volumeMl * 0.97;
    }
    readings.push({
      elapsedS,
      inflowCumulativeMl: Number(inflow.toFixed(3)),
      outflowCumulativeMl: Number(outflow.toFixed(3)),
      headPa: options.headPa,
      temperatureC: 20.5 + 0.6 * Math.sin(n / 3),
    });
  }
  return readings;
}
