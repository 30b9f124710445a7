/**
 * The computation's input is the run's whole context: this builds evaluateRun's input and options from a
 * run's records (readings with burette levels and refills, the burette panel's calibration, the specimen,
 * the method settings version, the instruments' uncertainties, the cell's leakage check) and evaluates it.
 * Every screen and document that shows a run's numbers goes through here, so they all say the same thing.
 * Pure; lib/server/runs/evaluate-run-records.ts loads the records.
 */
import { evaluateRun } from "../hydraulics/evaluate-run";
import { specimenAreaM2 } from "../hydraulics/geometry";
import { poreVolumeMl, resolvePorosity } from "../hydraulics/pore-volumes";
import { assessTrend, type TrendAssessment } from "../hydraulics/termination";
import type { EvaluateRunOptions, Reading, RunEvaluation, RunInput, SpecimenInput, TestMethod } from "../hydraulics/types";
import { paToKPa } from "../hydraulics/units";
import type { BurettePanelCalibration, LeakageCheck } from "../equipment/calibration-values";
import type { HydraulicSettings } from "../methods/hydraulic/hydraulic-settings";
import { terminationOverrides } from "../methods/hydraulic/hydraulic-settings-use";
import { currentVolumesMl, type StoredVolumes } from "./current-volumes";
import { declareUncertainties, type DeclaredFromRecords, type RunInstrument } from "./declared-uncertainties";
import { assessLeakage, type LeakageAssessment } from "./leakage-assessment";

export type StoredReading = StoredVolumes & {
  elapsedS: number;
  headPa: number;
  temperatureC: number;
  influentEcMsPerM: number | null;
  effluentEcMsPerM: number | null;
  influentPh: number | null;
  effluentPh: number | null;
};

/** The method settings a run is judged by, as results and certificates name them. */
export type SettingsInUse = {
  versionId: string | null;
  methodCode: string;
  version: number | null;
  /** "ASTM D5887 settings, version 2" */
  label: string;
  /** Set when a QA manager chose this version for the run instead of the one in force at its start. */
  chosen: { by: string; reason: string } | null;
  values: HydraulicSettings;
};

export type RunEvaluationContext = {
  methodCode: TestMethod;
  specimen: {
    dieDiameterMm: number;
    initialThicknessMm: number;
    moistureContentPct: number | null;
    bentoniteDryMassG: number | null;
    bentoniteMassPerAreaKgPerM2: number | null;
    specificGravity: number | null;
  };
  postTestThicknessMm: number | null;
  /** The run's current readings (none corrected by another), any order. */
  readings: readonly StoredReading[];
  burettePanel: BurettePanelCalibration | null;
  settings: SettingsInUse;
  instruments: readonly RunInstrument[];
  /** The cell's latest apparatus leakage check, or null when none is on record. */
  cellLeakage: { cell: string; check: LeakageCheck } | null;
};

export type Calculation = { key: RunEvaluation["calculation"]; text: string };

export type RunVerdict = {
  evaluation: RunEvaluation | null;
  /** Why there is no evaluation (too few readings, or the field the library refused). */
  reason: string | null;
  thicknessBasis: "post-test" | "initial";
  inputReadings: Reading[];
  /** The specimen as evaluated (diameter, thickness used for the gradient, pore-volume inputs). */
  specimen: SpecimenInput;
  calculation: Calculation;
  settings: SettingsInUse;
  uncertaintySources: DeclaredFromRecords;
  /** The statistical and the practical trend test over the criteria's window, when there are enough intervals. */
  trend: TrendAssessment | null;
  leakage: LeakageAssessment | null;
  /** Elapsed time (s) of each reading taken right after a refill or drain, for the charts. */
  refillsAtS: number[];
  /** Pore volume of the specimen's bentonite layer, mL, or why it cannot be counted. */
  poreVolume: { ml: number; source: string } | { ml: null; reason: string };
};

/** evaluateRun's input and options from the run's records, and what the result must say about how. */
export function buildEvaluationInput(ctx: RunEvaluationContext) {
  const sorted = [...ctx.readings].sort((a, b) => a.elapsedS - b.elapsedS);
  const panel = ctx.burettePanel;
  const withLevels = sorted.length > 0 && sorted.every((r) => r.inflowLevelMm !== null && r.outflowLevelMm !== null);
  const fallingHead = withLevels && panel !== null;
  const volumes = currentVolumesMl(sorted, panel ? { inflow: panel.inflowAreaMm2, outflow: panel.outflowAreaMm2 } : null);
  const readings: Reading[] = sorted.map((r, i) => ({
    elapsedS: r.elapsedS,
    inflowMl: volumes[i]!.inflowMl,
    outflowMl: volumes[i]!.outflowMl,
    headKPa: paToKPa(r.headPa),
    temperatureC: r.temperatureC,
    ...(r.influentEcMsPerM !== null && { influentEcMsPerM: r.influentEcMsPerM }),
    ...(r.effluentEcMsPerM !== null && { effluentEcMsPerM: r.effluentEcMsPerM }),
    ...(r.influentPh !== null && { influentPh: r.influentPh }),
    ...(r.effluentPh !== null && { effluentPh: r.effluentPh }),
    // Levels above the datum both burettes share: the scale reading plus the height of that burette's zero.
    ...(fallingHead && { inflowLevelMm: r.inflowLevelMm! + panel.inflowZeroAboveDatumMm, outflowLevelMm: r.outflowLevelMm! + panel.outflowZeroAboveDatumMm }),
    ...(r.afterRefill && i > 0 && { afterRefill: true as const }),
  }));

  const thicknessBasis: RunVerdict["thicknessBasis"] = ctx.postTestThicknessMm ? "post-test" : "initial";
  const thicknessMm = ctx.postTestThicknessMm ?? ctx.specimen.initialThicknessMm;
  const specimen: SpecimenInput = { diameterMm: ctx.specimen.dieDiameterMm, thicknessMm, ...poreVolumeInputs(ctx) };
  const input: RunInput = {
    method: ctx.methodCode,
    specimen,
    readings,
    ...(fallingHead && { burettes: { inflowAreaMm2: panel.inflowAreaMm2, outflowAreaMm2: panel.outflowAreaMm2 } }),
  };
  const uncertaintySources = declareUncertainties(ctx.instruments, ctx.settings.values, ctx.settings.label);
  const options: EvaluateRunOptions = {
    termination: terminationOverrides(ctx.settings.values),
    ...(uncertaintySources.ok && { uncertainty: uncertaintySources.declared }),
  };
  const calculation: Calculation = fallingHead
    ? {
        key: "falling-head-rising-tail",
        text: `Falling head with rising tail (ASTM D5084 method C): the head across the specimen is the line-pressure difference plus the inflow burette level minus the outflow burette level, both above one datum (zeros ${fmtMm(panel.inflowZeroAboveDatumMm)} and ${fmtMm(panel.outflowZeroAboveDatumMm)} above it).`,
      }
    : { key: "constant-head", text: "Constant head: the head across the specimen is the line-pressure difference; the readings carry no burette levels." };
  const refillsAtS = readings.filter((r) => r.afterRefill).map((r) => r.elapsedS);
  return { input, options, thicknessBasis, calculation, uncertaintySources, refillsAtS };
}

const fmtMm = (v: number) => `${+v.toFixed(1)} mm`;

/** The dry bentonite mass per unit area (kg/m²) and specific gravity the pore-volume count needs, where recorded. */
function poreVolumeInputs(ctx: RunEvaluationContext): Partial<SpecimenInput> {
  const sp = ctx.specimen;
  const specificGravity = sp.specificGravity ?? ctx.settings.values.specificGravity;
  if (sp.bentoniteDryMassG !== null) return { bentoniteMassPerAreaKgPerM2: sp.bentoniteDryMassG / 1000 / specimenAreaM2(sp.dieDiameterMm), specificGravity };
  if (sp.bentoniteMassPerAreaKgPerM2 !== null && sp.moistureContentPct !== null)
    return { bentoniteMassPerAreaKgPerM2: sp.bentoniteMassPerAreaKgPerM2 / (1 + sp.moistureContentPct / 100), specificGravity };
  return {};
}

/** The run evaluated as its records say, with everything a reviewer and a certificate need about how. */
export function evaluateRunContext(ctx: RunEvaluationContext): RunVerdict {
  const built = buildEvaluationInput(ctx);
  const { input, options } = built;
  const base = {
    thicknessBasis: built.thicknessBasis,
    inputReadings: input.readings,
    specimen: input.specimen,
    calculation: built.calculation,
    settings: ctx.settings,
    uncertaintySources: built.uncertaintySources,
    refillsAtS: built.refillsAtS,
    poreVolume: poreVolumeOf(input.specimen),
  };
  if (input.readings.length < 2) return { ...base, evaluation: null, reason: "At least two readings are needed before anything can be calculated.", trend: null, leakage: null };
  let evaluation: RunEvaluation;
  try {
    evaluation = evaluateRun(input, options);
  } catch (error) {
    // The library names the offending field; the readings page shows it so the technician can correct it.
    return { ...base, evaluation: null, reason: error instanceof Error ? error.message : String(error), trend: null, leakage: null };
  }
  const window = evaluation.intervals.slice(-evaluation.settings.consecutiveIntervals);
  const trend = window.length >= evaluation.settings.consecutiveIntervals ? assessTrend(window, evaluation.settings) : null;
  const measuredFlux = window.length ? window.reduce((a, iv) => a + iv.flux, 0) / window.length : Number.NaN;
  const leakage =
    ctx.cellLeakage && Number.isFinite(measuredFlux)
      ? assessLeakage({ ...ctx.cellLeakage, measuredFluxM3PerM2PerS: measuredFlux, specimenAreaM2: specimenAreaM2(ctx.specimen.dieDiameterMm), limitPct: ctx.settings.values.maxLeakagePct })
      : null;
  return { ...base, evaluation, reason: null, trend, leakage };
}

function poreVolumeOf(specimen: SpecimenInput): RunVerdict["poreVolume"] {
  const porosity = resolvePorosity(specimen);
  if (porosity.porosity === null) return { ml: null, reason: porosity.reason };
  return { ml: poreVolumeMl({ diameterMm: specimen.diameterMm, thicknessMm: specimen.thicknessMm, porosity: porosity.porosity }), source: porosity.source };
}
