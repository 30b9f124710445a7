// Invented permeation readings for the demo runs: burette levels of a specimen whose flux settles near a
// chosen value, read to 0.1 mm, with cumulative volumes from the levels. Demo data only; never a check value.
import { cumulativeVolumesAcrossRefillsMl } from "@/lib/hydraulics/burettes";

export type DemoReading = {
  elapsedS: number; inflowLevelMm: number; outflowLevelMm: number; inflowCumulativeMl: number; outflowCumulativeMl: number;
  headPa: number; influentPressurePa: number; effluentPressurePa: number; cellPressurePa: number; temperatureC: number; afterRefill: boolean;
};

/**
 * Readings every `stepH` hours for `count` steps; flux in m^3/m^2/s, specimen area in m^2, burette areas in
 * mm^2. With `refillAfter`, the technician refills the inflow burette and drains the outflow one five
 * minutes after that reading, and records the levels just after.
 */
export function makeDemoReadings(options: {
  fluxM3PerM2PerS: number; areaM2: number; count: number; stepH: number;
  pressuresPa: { cell: number; influent: number; effluent: number };
  buretteAreasMm2: { inflow: number; outflow: number };
  startLevelsMm?: { inflow: number; outflow: number };
  refillAfter?: number;
}): DemoReading[] {
  const start = options.startLevelsMm ?? { inflow: 480, outflow: 20 };
  const rows: Array<Omit<DemoReading, "inflowCumulativeMl" | "outflowCumulativeMl">> = [];
  let inflow = start.inflow;
  let outflow = start.outflow;
  const p = options.pressuresPa;
  const common = { headPa: p.influent - p.effluent, influentPressurePa: p.influent, effluentPressurePa: p.effluent, cellPressurePa: p.cell };
  const tenth = (v: number) => Math.round(v * 10) / 10;
  for (let n = 0; n < options.count; n++) {
    const elapsedS = n * options.stepH * 3600;
    const temperatureC = Number((20.5 + 0.6 * Math.sin(n / 3)).toFixed(1));
    if (n > 0) {
      // A start-up transient that fades, and a small, repeatable wobble (no randomness: the demo is the same every time).
      const settle = 1 + 0.6 * Math.exp(-n / 2);
      const wobble = 1 + 0.04 * Math.sin(n * 1.7);
      const volumeMl = options.fluxM3PerM2PerS * settle * wobble * options.areaM2 * options.stepH * 3600 * 1e6;
      inflow -= (volumeMl * 1.03 * 1000) / options.buretteAreasMm2.inflow;
      outflow += (volumeMl * 0.97 * 1000) / options.buretteAreasMm2.outflow;
    }
    rows.push({ elapsedS, inflowLevelMm: tenth(inflow), outflowLevelMm: tenth(outflow), temperatureC, afterRefill: false, ...common });
    if (n === options.refillAfter) {
      inflow = start.inflow;
      outflow = start.outflow;
      rows.push({ elapsedS: elapsedS + 300, inflowLevelMm: inflow, outflowLevelMm: outflow, temperatureC, afterRefill: true, ...common });
    }
  }
  const volumes = cumulativeVolumesAcrossRefillsMl(rows, { inflowAreaMm2: options.buretteAreasMm2.inflow, outflowAreaMm2: options.buretteAreasMm2.outflow });
  return rows.map((r, i) => ({ ...r, inflowCumulativeMl: volumes[i]!.inflowMl, outflowCumulativeMl: volumes[i]!.outflowMl }));
}
