import type { CertificateCoverage } from "./property-coverage";

/**
 * What an issued certificate says, frozen at issue and stored with its PDF (CertificateRevision.snapshot).
 * The PDF is rendered from this and nothing else, so a revision can always be explained from its record.
 * Dates are ISO strings so the snapshot is plain JSON.
 */
export type ConformanceSummary = {
  limitText: string;
  unit: string;
  direction: "MAXIMUM" | "MINIMUM";
  method: "ABSOLUTE" | "ROUNDING";
  /** The value as compared: the result rounded per ASTM E29 (rounding method) or as measured (absolute). */
  comparedValue: string;
  conforms: boolean;
  /** One sentence, e.g. "5.4e-11 m/s, rounded to 5e-11, does not exceed the maximum of 5e-11 m/s: conforms." */
  statement: string;
  /** The result as measured, in the limit's unit (snapshots from before it was kept lack it). */
  measuredValue?: string;
  /** The rule in words a client reads correctly, notably when rounding turns a small result into "0". */
  plainRule?: string;
};

export type CertificateResultLine = {
  property: string;
  label: string;
  value: number;
  unit: string;
  /** The value as printed, with its significant digits. */
  display: string;
  expandedUncertainty: number | null;
  /** e.g. "± 0.2e-9 (k = 2)". */
  uncertaintyDisplay: string | null;
  conformance: ConformanceSummary | null;
  /** The three largest contributors to the uncertainty, e.g. "burette readings 1.2 % (BP-01 calibration CAL-1)". */
  uncertaintyContributors?: string[];
  /** Why no uncertainty is stated, when none is. */
  uncertaintyNote?: string;
  /** The coverage of the expanded uncertainty in words ("coverage factor k = 2, ... about 95 %"). */
  coverage?: string;
  /** Index tests: how many specimens the result is the mean of, and their standard deviation as printed. */
  specimenCount?: number;
  standardDeviationDisplay?: string | null;
};

/** The specimen as tested (ISO/IEC 17025 7.8.2.1 e, 7.8.3.1 a): what was cut, how it was conditioned, how it was loaded. */
export type CertificateSpecimen = {
  dieDiameterMm: number;
  /** pi d^2 / 4, mm^2. */
  areaMm2: number;
  initialThicknessMm: number;
  initialMassG: number;
  postTestThicknessMm: number | null;
  postTestMassG: number | null;
  moistureContentPct: number | null;
  /** Hours from the first saturation stage to the start of permeation (hydration under back-pressure). */
  hydrationHours: number | null;
  /** Hours of the equilibration hold before permeation. */
  equilibrationHours: number | null;
  effectiveStressKPa: number | null;
  /** Mean hydraulic gradient over the reported intervals (head / thickness), dimensionless. */
  gradient: number | null;
  permeant: string;
};

/**
 * One tested item and what was measured on it. A certificate is a list of these, each with a list of
 * results by property, so other kinds of test (index tests) can join as further entries.
 */
export type CertificateTest = {
  runLabNumber: string;
  specimenLabNumber: string;
  rollLabNumber: string;
  /** edition: the standard's edition the lab works to ("D5887/D5887M-20"); absent on older snapshots. */
  method: { code: string; title: string; edition?: string };
  /** Dates of testing: specimen mounted, permeation started and ended (ISO). */
  dates?: { mountedAt: string; permeationStartedAt: string | null; permeationEndedAt: string | null };
  specimen?: CertificateSpecimen;
  conditions: { effectiveStressKPa: number | null; headKPa: number | null; /** Mean total head over the reported intervals, m (absent on certificates issued before it was added). */ meanHeadM?: number | null; permeant: string; meanTemperatureC: number | null; cell: string; thicknessMm: number | null };
  terminatedAt: string | null;
  termination: string;
  deviations: string[];
  results: CertificateResultLine[];
  /** How k was computed: constant head, or falling head with rising tail from the burette levels. */
  calculation?: string;
  /** The method settings version the run was judged by and the criteria it applied. */
  criteria?: { settings: string; chosen: string | null; lines: Array<{ name: string; limit: string; met: boolean }> };
  /** The cell's apparatus leakage check against the method's limit (ASTM D5887). */
  leakage?: string;
  /** How many times a burette was refilled or drained during permeation. */
  refills?: number;
  /** Per interval, for the certificate's chart: elapsed hours, flux (m^3/m^2/s), k20 (m/s). */
  chart: Array<{ hours: number; flux: number; k20: number }>;
  /** Elapsed hours of each refill or drain, marked on the chart. */
  refillHours?: number[];
  performedBy: string;
  approvedBy: string;
  approvedAt: string;
};

/**
 * An index test on a roll (swell index, fluid loss, mass per unit area, moisture, tensile, peel) as
 * reported: what was tested, by which method and edition, on how many specimens, with which instruments.
 */
export type CertificateIndexTest = {
  rollLabNumber: string;
  /** The coupon cut for the test (a tensile strip set, mass-per-area squares), if any. */
  couponLabNumber: string | null;
  method: { code: string; title: string; edition?: string };
  testedAt: string;
  /** Per specimen, in the main result's stored unit, as printed ("9.12 kN/m"). */
  /** How the test was run, as the method asks it reported (water temperature and hydration time, slurry, oven, direction); absent on older certificates. */
  conditions?: string[];
  specimenValues: string[];
  /** Departures from the method the technician recorded or the computation found. */
  departures: string[];
  /** "Balance BAL-01 (calibrated to 2027-03-01)". */
  instruments: string[];
  results: CertificateResultLine[];
  performedBy: string;
  approvedBy: string;
  approvedAt: string;
};

export type CertificateSample = {
  rollLabNumber: string;
  rollNumber: string;
  lotNumber: string;
  product: string;
  manufacturer: string;
  shipmentLabNumber: string;
  receivedAt: string;
  /** The roll's condition on arrival as recorded at receipt (its own remarks, else the shipment's). */
  condition?: string;
  /** The custody steps from receipt to test, oldest first. */
  custody: Array<{ at: string; action: string; item: string; by: string }>;
};

export type CertificateSnapshot = {
  number: string;
  revision: number;
  /** Why this revision was issued (empty for the first). */
  reason: string;
  verificationCode: string;
  verificationUrl: string;
  issuedAt: string;
  /** timeZone: the IANA zone every time on the certificate is written in (absent on older snapshots: UTC). */
  lab: { name: string; address: string; accreditation: string | null; timeZone?: string };
  /** contact: the client's contact for this work (e-mail or person), ISO/IEC 17025 7.8.2.1 d. */
  client: { name: string; address: string | null; contact?: string | null };
  project: { code: string; name: string; siteName: string; siteLocation: string | null };
  /** revision: the specification's own revision as the client's document states it. */
  specification: { name: string; revision?: string } | null;
  /**
   * How conformity was decided (ISO/IEC 17025 7.8.3.1 b, 7.1.3): the ASTM E29 method of each limit and
   * whether the measurement uncertainty was taken into account.
   */
  decisionRule?: string;
  /** Remarks the QA manager added to the draft. */
  remarks?: string;
  /** The units results are printed in. */
  unitSystem?: "SI" | "CENTIMETRE";
  /** For a revision: what changed from the revision it supersedes, one line each. */
  changes?: string[];
  samples: CertificateSample[];
  tests: CertificateTest[];
  /** Index tests reported (absent on snapshots from before index tests could be certified). */
  indexTests?: CertificateIndexTest[];
  /** Every property of the specification for every roll reported on: reported here, or why not. */
  propertyCoverage?: CertificateCoverage;
  signatory: { name: string; role: string; meaning: string; signedAt: string };
  supersedes: { revision: number; reason: string } | null;
};
