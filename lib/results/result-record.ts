/**
 * What a result keeps about how it was obtained (Result.evaluation): the calculation, the method settings
 * version and the criteria it was judged by, its uncertainty budget with the source of every input, the
 * cell's leakage check, the refills across the run. Written once at approval; the review page shows the
 * same from the live evaluation, and the certificate prints it. Pure.
 */
import type { DeclaredUncertainties, ExpandedUncertainty } from "../hydraulics/types";
import type { Calculation, RunVerdict, SettingsInUse } from "../evaluation/run-evaluation-context";
import type { UncertaintySource } from "../evaluation/declared-uncertainties";
import type { LeakageAssessment } from "../evaluation/leakage-assessment";
import type { ReportedProperty } from "./results-from-evaluation";

export type UncertaintyContributor = UncertaintySource & {
  /** Relative standard uncertainty this input adds to the result (sensitivity × u / value). */
  relative: number;
};

export type ResultUncertainty =
  | { stated: true; coverageFactor: 2; expandedRelative: number; contributors: UncertaintyContributor[] }
  | { stated: false; reason: string };

export type ResultRecord = {
  recordVersion: 1;
  calculation: Calculation;
  settings: Omit<SettingsInUse, "values">;
  /** The criteria as applied, each with its limit in words and whether it was met. */
  criteria: Array<{ key: string; name: string; limit: string; met: boolean }>;
  trend: { pValue: number; relativeChange: number; statistical: boolean; practical: boolean | null } | null;
  uncertainty: ResultUncertainty;
  leakage: (LeakageAssessment & { acknowledgedBy: string | null }) | { notRecorded: string };
  refills: number;
  thicknessBasis: "post-test" | "initial";
};

// Which inputs the flux depends on (q = Q / (A t)); k20 depends on all six.
const FLUX_INPUTS: ReadonlyArray<keyof DeclaredUncertainties> = ["diameterMm", "volumeMl", "timeS"];

/** The inputs' contributions to one reported property, largest first. */
export function uncertaintyContributors(property: ReportedProperty, budget: ExpandedUncertainty["budget"], sources: readonly UncertaintySource[]): UncertaintyContributor[] {
  const keys = property === "INDEX_FLUX" ? FLUX_INPUTS : (Object.keys(budget) as Array<keyof DeclaredUncertainties>);
  return sources
    .filter((s) => keys.includes(s.quantity))
    .map((s) => ({ ...s, relative: budget[s.quantity] }))
    .sort((a, b) => b.relative - a.relative);
}

/** The uncertainty of one result as stated on the review page and the certificate. */
export function resultUncertainty(property: ReportedProperty, expanded: { budget: ExpandedUncertainty["budget"]; relative: number } | null, verdict: Pick<RunVerdict, "uncertaintySources">): ResultUncertainty {
  const sources = verdict.uncertaintySources;
  if (!sources.ok) return { stated: false, reason: `No standard uncertainty is on record for ${sources.missing.join("; ")}.` };
  if (!expanded) return { stated: false, reason: "No flow passed over the reported intervals, so no uncertainty can be propagated." };
  return { stated: true, coverageFactor: 2, expandedRelative: expanded.relative, contributors: uncertaintyContributors(property, expanded.budget, sources.sources) };
}

/** The record stored with one result at approval. */
export function resultRecord(
  property: ReportedProperty,
  verdict: RunVerdict,
  expanded: { budget: ExpandedUncertainty["budget"]; relative: number } | null,
  acknowledgedBy: string | null,
): ResultRecord {
  const evaluation = verdict.evaluation;
  const { values: _values, ...settings } = verdict.settings;
  return {
    recordVersion: 1,
    calculation: verdict.calculation,
    settings,
    criteria: (evaluation?.termination.criteria ?? []).map((c) => ({ key: c.key, name: c.name, limit: c.limit, met: c.met })),
    trend: verdict.trend ? { pValue: verdict.trend.pValue, relativeChange: verdict.trend.relativeChange, statistical: verdict.trend.statistical, practical: verdict.trend.practical } : null,
    uncertainty: resultUncertainty(property, expanded, verdict),
    leakage: verdict.leakage ? { ...verdict.leakage, acknowledgedBy } : { notRecorded: "No apparatus leakage check is on record for the cell." },
    refills: verdict.refillsAtS.length,
    thicknessBasis: verdict.thicknessBasis,
  };
}

/** A stored record read back, or null for results approved before records were kept. */
export function readResultRecord(json: unknown): ResultRecord | null {
  return json !== null && typeof json === "object" && (json as { recordVersion?: unknown }).recordVersion === 1 ? (json as ResultRecord) : null;
}

/** "burette readings 1.2 % (BP-01 calibration CAL-BP-01-2026)" */
export function contributorText(c: UncertaintyContributor): string {
  return `${c.label} ${formatPercent(c.relative)} (${c.source})`;
}

/** A relative uncertainty as a percentage with two significant digits: 0.0123 -> "1.2 %". */
export function formatPercent(fraction: number): string {
  return `${+(fraction * 100).toPrecision(2)} %`;
}
