// Invented permeation readings for the demo runs: burette levels of a specimen whose flux settles near a
// chosen value, with the cumulative volumes those levels give. Demo data only; never a check value.
import { cumulativeInflowMl, cumulativeOutflowMl } from "@/lib/hydraulics/burettes";

export type DemoReading = {
  elapsedS: number; inflowLevelMm: number; outflowLevelMm: number; inflowCumulativeMl: number; outflowCumulativeMl: number; headPa: number; temperatureC: number;
};

/**
 * Readings every `stepH` hours for `count` steps; flux in m^3/m^2/s, area in m^2, burette areas in mm^2.
 * Levels are rounded to 0.1 mm as a person reads them, and the volumes follow from the rounded levels
 * exactly as the app computes them, so a reading typed after these continues them.
 */
export function makeDemoReadings(options: {
  fluxM3PerM2PerS: number; areaM2: number; count: number; stepH: number; headPa: number;
  buretteAreasMm2: { inflow: number; outflow: number }; startLevelsMm: { inflow: number; outflow: number };
}): DemoReading[] {
  const inflowLevels: number[] = [];
  const outflowLevels: number[] = [];
  let inflowMl = 0;
  let outflowMl = 0;
  for (let n = 0; n < options.count; n++) {
    if (n > 0) {
      // A start-up transient that fades, and a small, repeatable wobble (no randomness: the demo is the same every time).
      const settle = 1 + 0.6 * Math.exp(-n / 2);
      const wobble = 1 + 0.04 * Math.sin(n * 1.7);
      const volumeMl = options.fluxM3PerM2PerS * settle * wobble * options.areaM2 * options.stepH * 3600 * 1e6;
      inflowMl += volumeMl * 1.03;
      outflowMl += volumeMl * 0.97;
    }
    // mL -> mm of burette: 1 mL is 1000 mm^3.
    inflowLevels.push(Number((options.startLevelsMm.inflow - (inflowMl * 1000) / options.buretteAreasMm2.inflow).toFixed(1)));
    outflowLevels.push(Number((options.startLevelsMm.outflow + (outflowMl * 1000) / options.buretteAreasMm2.outflow).toFixed(1)));
  }
  const inflow = cumulativeInflowMl(inflowLevels, options.buretteAreasMm2.inflow);
  const outflow = cumulativeOutflowMl(outflowLevels, options.buretteAreasMm2.outflow);
  return inflowLevels.map((inflowLevelMm, n) => ({
    elapsedS: n * options.stepH * 3600,
    inflowLevelMm,
    outflowLevelMm: outflowLevels[n]!,
    inflowCumulativeMl: inflow[n]!,
    outflowCumulativeMl: outflow[n]!,
    headPa: options.headPa,
    temperatureC: Number((20.5 + 0.6 * Math.sin(n / 3)).toFixed(1)),
  }));
}
