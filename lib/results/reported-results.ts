/**
 * What a run reports, as the result panel (run page, review page) shows it: each value in the reader's
 * unit system with its expanded uncertainty, a conformance preview against the project's specification,
 * and the bases it was computed on in words. Built from the same verdict approval records. Pure.
 */
import type { RunVerdict } from "../evaluation/run-evaluation-context";
import type { TestMethod } from "../hydraulics/types";
import { COVERAGE_STATEMENT, formatLimit, formatPropertyUncertainty, formatPropertyValue, type UnitSystem } from "../format/result-numbers";
import { thicknessBasisWords, unitWeightWords, viscosityWords } from "./basis-words";
import { explainConformance, type SpecificationLimitInput } from "./conformance-summary";
import { TEST_PROPERTY_LABELS, type TestProperty } from "./property-units";
import { resultsOfVerdict } from "./results-of-verdict";

export type ReportedLine = {
  property: TestProperty;
  label: string;
  value: string;
  /** "± 0.21 × 10⁻⁹ m³/m²/s", or null with `uncertaintyNote` saying why none is stated. */
  uncertainty: string | null;
  uncertaintyNote: string | null;
  earlyEnd: boolean;
  /** Against the specification: the limit, the verdict and the sentence that decided it; null without a limit. */
  conformance: { limit: string; conforms: boolean; statement: string } | { limit: null; note: string };
};

export type ReportedResults =
  | { ok: false; reason: string }
  | {
      ok: true;
      lines: ReportedLine[];
      /** The bases in words, label first: intervals averaged, thickness, temperature, unit weight, viscosity, calculation, coverage. */
      bases: Array<[string, string]>;
    };

/** The limits of the specification results are previewed against, by property. */
export type PreviewLimits = { specificationName: string; limits: Array<SpecificationLimitInput & { property: TestProperty }> } | null;

const hours = (s: number) => `${+(s / 3600).toFixed(1)} h`;

/** The panel's content, or why there is nothing to report yet (criteria not met, no intervals). */
export function reportedResults(verdict: RunVerdict, method: TestMethod, options: { earlyEnd: boolean; unitSystem: UnitSystem; limits: PreviewLimits }): ReportedResults {
  const evaluation = verdict.evaluation;
  if (!evaluation) return { ok: false, reason: verdict.reason ?? "The run has no evaluation yet." };
  let results: ReturnType<typeof resultsOfVerdict>;
  try {
    results = resultsOfVerdict(verdict, method, { earlyEnd: options.earlyEnd });
  } catch (error) {
    return { ok: false, reason: error instanceof Error ? error.message : String(error) };
  }
  const n = Math.min(evaluation.settings.consecutiveIntervals, evaluation.intervals.length);
  const window = evaluation.intervals.slice(-n);
  const first = window[0]!;
  const last = window[window.length - 1]!;
  const total = evaluation.intervals.length;
  const lines = results.map((r): ReportedLine => {
    const limit = options.limits?.limits.find((l) => l.property === r.property) ?? null;
    let conformance: ReportedLine["conformance"];
    if (!options.limits) conformance = { limit: null, note: "The project has no specification: no conformance is stated." };
    else if (!limit) conformance = { limit: null, note: `${options.limits.specificationName} sets no limit for this property.` };
    else {
      const summary = explainConformance({ value: r.value, unit: r.unit }, limit).summary;
      conformance = { limit: formatLimit(limit), conforms: summary.conforms, statement: summary.statement };
    }
    const uncertainty = formatPropertyUncertainty(r.property, r.expandedUncertainty, r.value, r.unit, options.unitSystem);
    return {
      property: r.property,
      label: TEST_PROPERTY_LABELS[r.property],
      value: formatPropertyValue(r.property, r.value, r.unit, options.unitSystem).text,
      uncertainty,
      uncertaintyNote: uncertainty ? null : verdict.uncertaintySources.ok ? "No flow passed over the reported intervals." : `No standard uncertainty is on record for ${verdict.uncertaintySources.missing.join("; ")}.`,
      earlyEnd: r.earlyEnd,
      conformance,
    };
  });
  const meanTemperature = results[0]!.temperatureC;
  return {
    ok: true,
    lines,
    bases: [
      ["Intervals averaged", `the last ${n} of ${total} (numbers ${total - n + 1} to ${total}), from ${hours(first.fromS)} to ${hours(last.toS)} of permeation; the arithmetic mean of each`],
      ["Thickness for the gradient", thicknessBasisWords(verdict.thicknessBasis, verdict.specimen.thicknessMm)],
      ["Mean temperature", `${meanTemperature.toFixed(1)} °C over those intervals; k is corrected to 20 °C`],
      ["Unit weight of water", unitWeightWords(evaluation.unitWeightBasis)],
      ["Viscosity ratio to 20 °C", viscosityWords(evaluation.viscosityRatioBasis)],
      ["Calculation", verdict.calculation.text],
      ["Expanded uncertainty", `${COVERAGE_STATEMENT}, first-order propagation (GUM) of the inputs' standard uncertainties`],
    ],
  };
}
