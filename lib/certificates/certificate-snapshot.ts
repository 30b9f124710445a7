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
};

export type CertificateTest = {
  runLabNumber: string;
  specimenLabNumber: string;
  rollLabNumber: string;
  method: { code: string; title: string };
  conditions: { effectiveStressKPa: number | null; headKPa: number | null; permeant: string; meanTemperatureC: number | null; cell: string; thicknessMm: number | null };
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

export type CertificateSample = {
  rollLabNumber: string;
  rollNumber: string;
  lotNumber: string;
  product: string;
  manufacturer: string;
  shipmentLabNumber: string;
  receivedAt: string;
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
  lab: { name: string; address: string; accreditation: string | null };
  client: { name: string; address: string | null };
  project: { code: string; name: string; siteName: string; siteLocation: string | null };
  specification: { name: string } | null;
  samples: CertificateSample[];
  tests: CertificateTest[];
  signatory: { name: string; role: string; meaning: string; signedAt: string };
  supersedes: { revision: number; reason: string } | null;
};
