/** Shapes shared by the hydraulic computations. The RunInput / RunEvaluation contract is fixed by issue 3. */
import type { UnitWeightBasis } from "./units";
import type { ViscosityRatioBasis, ViscosityRatioSource } from "./water";

/** The ASTM method a run follows; it picks the termination criteria set. */
export type TestMethod = "D5887" | "D6766" | "D5084";

/** One permeation reading as the technician enters it. */
export interface Reading {
  /** Seconds since permeation began. */
  elapsedS: number;
  /** Cumulative inflow since permeation began, mL. */
  inflowMl: number;
  /** Cumulative outflow since permeation began, mL. */
  outflowMl: number;
  /** Pressure difference across the specimen, influent minus effluent, kPa. */
  headKPa: number;
  /** Permeant temperature, °C. */
  temperatureC: number;
  influentEcMsPerM?: number;
  effluentEcMsPerM?: number;
  influentPh?: number;
  effluentPh?: number;
  /**
   * Water level in the inflow burette above the datum common to both burettes, mm (the scale reading plus
   * the calibrated height of the burette's zero above the datum). Give both levels on every reading or on
   * none; with levels the head is headKPa / gamma_w + (inflowLevelMm - outflowLevelMm) / 1000.
   */
  inflowLevelMm?: number;
  /** Water level in the outflow burette above the same datum, mm. */
  outflowLevelMm?: number;
  /**
   * This reading was taken right after a refill of the inflow burette or a drain of the outflow burette
   * (the previous reading just before it). The interval ending here carries no flow: it is left out of
   * `intervals`, so it never enters the criteria or the reported values. Cumulative volumes continue
   * across it (give the same cumulative volumes as the reading before).
   */
  afterRefill?: true;
}

/** The specimen as tested; optional fields feed the D6766 pore-volume count. */
export interface SpecimenInput {
  diameterMm: number;
  /** Bentonite layer thickness after the test, geotextiles excluded, mm: the L of the gradient. */
  thicknessMm: number;
  /** Porosity of the bentonite layer if measured (0 < n < 1); otherwise estimated from the next two. */
  porosity?: number;
  /** Dry bentonite mass per unit area of this specimen, kg/m^2 (0 % moisture). */
  bentoniteMassPerAreaKgPerM2?: number;
  /** Specific gravity of the bentonite solids; 2.75 if not given (see pore-volumes.ts). */
  specificGravity?: number;
}

/**
 * Optional burette calibration. When present the run is computed as falling head with rising tail
 * (D5084 method C). The heads come from the readings' burette levels when they carry them; otherwise the
 * levels follow from the cumulative volumes, these areas and initialLevelDifferenceMm.
 */
export interface BuretteInput {
  inflowAreaMm2: number;
  outflowAreaMm2: number;
  /**
   * Inflow level minus outflow level at the first reading, mm of water. Needed only when the readings
   * carry no levels (inflowLevelMm / outflowLevelMm); when they do, the levels are used instead.
   */
  initialLevelDifferenceMm?: number;
}

/** Input of evaluateRun (contract of issue 3; `burettes` is an optional addition). */
export interface RunInput {
  method: TestMethod;
  specimen: SpecimenInput;
  readings: Reading[];
  burettes?: BuretteInput;
}

/** Quantities between two consecutive readings; flux in m^3/m^2/s, k in m/s. */
export interface Interval {
  fromS: number;
  toS: number;
  /** m^3/m^2/s */
  inflowFlux: number;
  /** m^3/m^2/s */
  outflowFlux: number;
  /** Mean of inflow and outflow flux, m^3/m^2/s. */
  flux: number;
  /** outflow / inflow; NaN when no inflow was recorded over the interval. */
  ratio: number;
  /** Head (m of water) / bentonite thickness (m). */
  gradient: number;
  /** Hydraulic conductivity at the test temperature, m/s. */
  k: number;
  /** Hydraulic conductivity corrected to 20 °C, m/s. */
  k20: number;
  durationS: number;
  inflowVolumeMl: number;
  outflowVolumeMl: number;
  /** Mean head loss over the interval, m of water. */
  headM: number;
  /** flux / head, 1/s. */
  permittivityPerS: number;
  /** Mean of the two readings' temperatures, °C. */
  temperatureC: number;
  viscosityRatio: number;
  viscosityRatioSource: ViscosityRatioSource;
  unitWeightKNPerM3: number;
}

/** One termination criterion as shown to the technician. */
export interface Criterion {
  name: string;
  /** Stable identifier for code (the name is for people). */
  key: CriterionKey;
  met: boolean;
  value: number | null;
  limit: string;
  message: string;
}

/** Stable identifiers of the criteria a set may contain. */
export type CriterionKey =
  | "ratio-band"
  | "trend"
  | "k-band"
  | "ec-equilibrium"
  | "ph-equilibrium"
  | "pore-volumes";

/** The lab-adjustable numbers and criteria of one method (defaults in TERMINATION_DEFAULTS). */
export interface TerminationSettings {
  /** How many of the latest consecutive intervals the criteria look at. */
  consecutiveIntervals: number;
  ratioMin: number;
  ratioMax: number;
  /** Two-sided significance level of the slope t test; a p-value below it is a trend. */
  trendAlpha: number;
  trendQuantity: "flux" | "k20";
  kBandFraction: number;
  kBandFractionBelowThreshold: number;
  kBandThresholdMPerS: number;
  /** |EC_eff / EC_inf - 1| must not exceed this. */
  ecToleranceFraction: number;
  /** |pH_eff - pH_inf| must not exceed this, pH units. */
  phToleranceUnits: number;
  minPoreVolumes: number;
  criteria: readonly CriterionKey[];
  /**
   * Practical size of a trend: the fitted change of the trend quantity across the window, as a fraction
   * of its mean. When set, a trend counts only when the slope test is significant AND the fitted change
   * is at least this fraction (smooth, quantised logger data make any slope "significant"). Not set by
   * default, so the slope test alone decides, as before.
   */
  trendMinRelativeChange?: number;
}

/** Declared standard uncertainties (k = 1) of the instruments, in the units named. */
export interface DeclaredUncertainties {
  diameterMm: number;
  thicknessMm: number;
  /** Of one burette / volume reading, mL. */
  volumeMl: number;
  /** Of one time stamp, s. */
  timeS: number;
  /** Of the differential pressure, kPa. */
  pressureKPa: number;
  temperatureC: number;
}

/** Optional second argument of evaluateRun; every field has a documented default. */
export interface EvaluateRunOptions {
  unitWeightBasis?: UnitWeightBasis;
  viscosityRatioBasis?: ViscosityRatioBasis;
  /** Overrides merged onto the method's defaults (TERMINATION_DEFAULTS). */
  termination?: Partial<TerminationSettings>;
  /** When given, the reported values carry an expanded uncertainty (k = 2). */
  uncertainty?: DeclaredUncertainties;
}

/** Expanded uncertainty of the reported values with its budget. */
export interface ExpandedUncertainty {
  coverageFactor: 2;
  /** Expanded uncertainty of reported.flux, m^3/m^2/s. */
  fluxM3PerM2PerS: number;
  /** Expanded uncertainty of reported.k20, m/s. */
  k20MPerS: number;
  fluxRelative: number;
  k20Relative: number;
  /** Relative standard uncertainty contributed by each input to k20. */
  budget: Record<keyof DeclaredUncertainties, number>;
}

/** When the termination criteria will probably be met, if the data support a projection. */
export interface Projection {
  /** Elapsed time (s since permeation began) at which the criteria will probably be met, or null. */
  projectedAtS: number | null;
  reason: string;
  /** The projection for each criterion not yet met. */
  byCriterion: Array<{ key: CriterionKey; projectedAtS: number | null; reason: string }>;
}

/** Output of evaluateRun (contract of issue 3 plus optional additions). */
export interface RunEvaluation {
  intervals: Interval[];
  reported: { flux: number | null; k20: number | null };
  termination: { met: boolean; criteria: Criterion[] };
  method: TestMethod;
  calculation: "constant-head" | "falling-head-rising-tail";
  unitWeightBasis: UnitWeightBasis;
  viscosityRatioBasis: ViscosityRatioBasis;
  /** How reported values were formed, for the certificate. */
  reportedBasis: string;
  settings: TerminationSettings;
  poreVolumesOfFlow: number | null;
  uncertainty: ExpandedUncertainty | null;
  projection: Projection;
  warnings: string[];
}
