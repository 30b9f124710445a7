import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { evaluateRunContext } from "@/lib/evaluation/run-evaluation-context";
import { D5887_SETTINGS } from "@/lib/methods/d5887/settings";
import { prepareReadings } from "@/lib/readings/prepare-readings";
import { applyReadingsMapping, parseReadingsCsv, suggestReadingsMapping } from "@/lib/readings/readings-csv";

const fixture = (name: string) => readFileSync(path.resolve(import.meta.dirname, "../../../e2e/fixtures", name), "utf8");
// Areas as the e2e test's burette panel calibration holds them (invented): 31.4 mm² in, 31.2 mm² out.
const AREAS_MM2 = { inflow: 31.4, outflow: 31.2 };

function read(name: string) {
  const parsed = parseReadingsCsv(fixture(name));
  const mapped = applyReadingsMapping(parsed, suggestReadingsMapping(parsed));
  const start = new Date("2026-01-01T00:00:00Z");
  return { mapped, ...prepareReadings({ drafts: mapped.map((m) => ({ label: `Row ${m.row}`, draft: m.values! })), permeationStartedAt: start, now: new Date("2026-02-01T00:00:00Z"), areasMm2: AREAS_MM2, reference: null }) };
}

describe("the invented D5887 data-logger file of the end-to-end test", () => {
  it("reads cleanly with the suggested mapping, and the app's evaluation says the termination criteria are met at about 2e-9 m³/m²/s", () => {
    const { mapped, rows, problems } = read("readings-d5887.csv");
    expect(mapped.flatMap((m) => m.errors)).toEqual([]);
    expect(problems).toEqual([]);
    expect(rows.length).toBeGreaterThanOrEqual(10);
    expect(rows.length).toBeLessThanOrEqual(14);
    const verdict = evaluateRunContext({
      methodCode: "D5887",
      specimen: { dieDiameterMm: 100, initialThicknessMm: 6, moistureContentPct: null, bentoniteDryMassG: null, bentoniteMassPerAreaKgPerM2: null, specificGravity: null },
      postTestThicknessMm: null,
      readings: rows,
      burettePanel: { inflowAreaMm2: AREAS_MM2.inflow, outflowAreaMm2: AREAS_MM2.outflow, inflowZeroAboveDatumMm: 0, outflowZeroAboveDatumMm: 0, scaleRangeMm: null },
      settings: { versionId: null, methodCode: "D5887", version: 1, label: "ASTM D5887 settings, version 1", chosen: null, values: D5887_SETTINGS.defaults },
      instruments: [],
      cellLeakage: null,
    });
    expect(verdict.calculation.key).toBe("falling-head-rising-tail");
    const evaluation = verdict.evaluation!;
    expect(evaluation.termination.met).toBe(true);
    expect(evaluation.reported.flux).toBeGreaterThan(1.5e-9);
    expect(evaluation.reported.flux).toBeLessThan(2.5e-9);
    // The brief for the file: outflow/inflow within 0.9–1.1 over the reported intervals.
    for (const iv of evaluation.intervals.slice(-4)) {
      expect(iv.ratio).toBeGreaterThan(0.9);
      expect(iv.ratio).toBeLessThan(1.1);
    }
  });

  it("has exactly one bad row in its failure twin: row 9 going back in time", () => {
    const { mapped, problems } = read("readings-bad-row.csv");
    expect(mapped.flatMap((m) => m.errors)).toEqual([]);
    expect(problems).toEqual([{ index: 7, field: "time", message: "Row 9, time: 30 h after permeation began is not later than Row 8 (36 h); readings must be in time order." }]);
  });
});
