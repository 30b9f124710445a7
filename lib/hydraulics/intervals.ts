/** Per-interval quantities between consecutive readings. */
import { fallingHeadRisingTailKMPerS } from "./falling-head";
import { levelDifferenceAfterFlowMm } from "./burettes";
import { specimenAreaM2 } from "./geometry";
import type { BuretteInput, Interval, Reading } from "./types";
import { DEFAULT_UNIT_WEIGHT_BASIS, ML_M3, MM_M, unitWeightOfWaterKNPerM3 } from "./units";
import type { UnitWeightBasis } from "./units";
import { viscosityRatio } from "./water";
import type { ViscosityRatioBasis } from "./water";

export interface IntervalOptions {
  unitWeightBasis?: UnitWeightBasis;
  viscosityRatioBasis?: ViscosityRatioBasis;
  burettes?: BuretteInput;
}

/**
 * Total head across the specimen at one reading, m of water: headKPa / gamma_w, plus the burette level
 * difference. When the reading carries its levels (above a common datum) they are used as they are;
 * otherwise, when burettes are given, the level difference follows from burettes.initialLevelDifferenceMm
 * (the difference at the first reading) and the volumes since the first reading: pass the first reading
 * as `first` (cumulative volumes need not be zero there).
 */
export function readingHeadM(
  reading: Reading,
  unitWeightKNPerM3: number,
  burettes?: BuretteInput,
  first: { inflowMl: number; outflowMl: number } = { inflowMl: 0, outflowMl: 0 },
): number {
  const pressureHeadM = reading.headKPa / unitWeightKNPerM3;
  if (reading.inflowLevelMm !== undefined && reading.outflowLevelMm !== undefined) {
    return pressureHeadM + (reading.inflowLevelMm - reading.outflowLevelMm) * MM_M;
  }
  if (!burettes || burettes.initialLevelDifferenceMm === undefined) return pressureHeadM;
  const dzMm = levelDifferenceAfterFlowMm({
    initialLevelDifferenceMm: burettes.initialLevelDifferenceMm,
    inflowMl: reading.inflowMl - first.inflowMl,
    outflowMl: reading.outflowMl - first.outflowMl,
    inflowAreaMm2: burettes.inflowAreaMm2,
    outflowAreaMm2: burettes.outflowAreaMm2,
  });
  return pressureHeadM + dzMm * MM_M;
}

/**
 * Inflow, outflow and mean flux (m^3/m^2/s), ratio, gradient, permittivity (1/s), k and k20 (m/s)
 * for every pair of consecutive readings. Constant head unless burettes are given, in which case
 * k comes from the falling-head, rising-tail formula (D5084 method C). A reading marked afterRefill
 * ends no interval: the refill or drain between it and the reading before is not flow through the
 * specimen. Readings must already be validated. O(n).
 */
export function computeIntervals(
  readings: readonly Reading[],
  specimen: { diameterMm: number; thicknessMm: number },
  options: IntervalOptions = {},
): Interval[] {
  const areaM2 = specimenAreaM2(specimen.diameterMm);
  const thicknessM = specimen.thicknessMm * MM_M;
  const basis = options.unitWeightBasis ?? DEFAULT_UNIT_WEIGHT_BASIS;
  const burettes = options.burettes;
  const out: Interval[] = [];
  // Readings often repeat a temperature: reuse the last gamma_w and R_T rather than recompute.
  let lastT = Number.NaN;
  let gammaW = 0;
  let rt: ReturnType<typeof viscosityRatio> = { ratio: 1, source: "IAPWS-2008" };
  const first = readings[0] as Reading;
  for (let i = 1; i < readings.length; i++) {
    const a = readings[i - 1] as Reading;
    const b = readings[i] as Reading;
    if (b.afterRefill) continue;
    const durationS = b.elapsedS - a.elapsedS;
    const temperatureC = (a.temperatureC + b.temperatureC) / 2;
    if (temperatureC !== lastT) {
      // Gamma_w at the interval's mean temperature, so both readings' heads use the same value.
      gammaW = unitWeightOfWaterKNPerM3(temperatureC, basis);
      rt = viscosityRatio(temperatureC, options.viscosityRatioBasis);
      lastT = temperatureC;
    }
    const inflowVolumeMl = b.inflowMl - a.inflowMl;
    const outflowVolumeMl = b.outflowMl - a.outflowMl;
    const inflowFlux = (inflowVolumeMl * ML_M3) / (areaM2 * durationS);
    const outflowFlux = (outflowVolumeMl * ML_M3) / (areaM2 * durationS);
    const flux = (inflowFlux + outflowFlux) / 2;
    const ratio = inflowVolumeMl !== 0 ? outflowVolumeMl / inflowVolumeMl : Number.NaN;
    const h1 = readingHeadM(a, gammaW, burettes, first);
    const h2 = readingHeadM(b, gammaW, burettes, first);
    const headM = (h1 + h2) / 2;
    const gradient = headM / thicknessM;
    const k = burettes
      ? fallingHeadRisingTailKMPerS({
          inflowBuretteAreaM2: burettes.inflowAreaMm2 * MM_M * MM_M,
          outflowBuretteAreaM2: burettes.outflowAreaMm2 * MM_M * MM_M,
          specimenAreaM2: areaM2,
          thicknessM,
          durationS,
          head1M: h1,
          head2M: h2,
        })
      : flux / gradient;
    out.push({
      fromS: a.elapsedS,
      toS: b.elapsedS,
      inflowFlux,
      outflowFlux,
      flux,
      ratio,
      gradient,
      k,
      k20: k * rt.ratio,
      durationS,
      inflowVolumeMl,
      outflowVolumeMl,
      headM,
      permittivityPerS: flux / headM,
      temperatureC,
      viscosityRatio: rt.ratio,
      viscosityRatioSource: rt.source,
      unitWeightKNPerM3: gammaW,
    });
  }
  return out;
}
