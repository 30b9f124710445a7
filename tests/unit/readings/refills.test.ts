import { describe, expect, it } from "vitest";
import { prepareReadings } from "@/lib/readings/prepare-readings";
import { applyReadingsMapping, parseReadingsCsv, parseRefillMark, suggestReadingsMapping } from "@/lib/readings/readings-csv";
import type { ReadingDraft } from "@/lib/readings/reading-draft";

// Invented readings on a panel of 31.4 / 31.2 mm² burettes with a 0–500 mm scale.
const START = new Date("2026-03-02T08:00:00Z");
const draft = (hours: number, inflow: number, outflow: number, afterRefill = false): ReadingDraft => ({
  elapsedS: hours * 3600, inflowLevelMm: inflow, outflowLevelMm: outflow, influentPressurePa: 531_000, effluentPressurePa: 517_000, temperatureC: 20, ...(afterRefill && { afterRefill }),
});
const prepare = (drafts: ReadingDraft[], extra: Partial<Parameters<typeof prepareReadings>[0]> = {}) =>
  prepareReadings({ drafts: drafts.map((d, i) => ({ label: `Row ${i + 1}`, draft: d })), permeationStartedAt: START, now: new Date("2026-04-01T00:00:00Z"), areasMm2: { inflow: 31.4, outflow: 31.2 }, scaleRangeMm: { min: 0, max: 500 }, reference: null, ...extra });

describe("burette refills and drains", () => {
  it("the reading after a refill keeps the cumulative volumes of the one before, and the next ones count on from the new levels", () => {
    const { rows, problems } = prepare([draft(0, 120, 380), draft(6, 108, 392), draft(6.1, 480, 20, true), draft(12, 468, 32)]);
    expect(problems).toEqual([]);
    // (120 - 108) × 31.4 / 1000 = 0.3768 mL in; (392 - 380) × 31.2 / 1000 = 0.3744 mL out; then + 12 mm each after the refill.
    expect(rows.map((r) => [r.inflowCumulativeMl, r.outflowCumulativeMl, r.afterRefill])).toEqual([
      [0, 0, false],
      [expect.closeTo(0.3768, 12), expect.closeTo(0.3744, 12), false],
      [expect.closeTo(0.3768, 12), expect.closeTo(0.3744, 12), true],
      [expect.closeTo(0.7536, 12), expect.closeTo(0.7488, 12), false],
    ]);
  });

  it("continues from the saved reading before the batch", () => {
    const { rows } = prepare([draft(12, 468, 32)], { reference: { inflowLevelMm: 480, outflowLevelMm: 20, inflowCumulativeMl: 0.3768, outflowCumulativeMl: 0.3744 } });
    expect(rows[0]!.inflowCumulativeMl).toBeCloseTo(0.7536, 12);
  });

  it("refuses a refill that lowered the inflow burette, a drain that raised the outflow one, a refill first, and levels off the calibrated scale; a rise without the mark says how to record a refill", () => {
    const wrong = prepare([draft(0, 120, 380), draft(6, 108, 392), draft(6.1, 100, 395, true)]);
    expect(wrong.problems).toEqual([
      { index: 2, field: "inflowLevelMm", message: "Row 3, inflow burette level after the refill: 100 mm is below the 108 mm just before it (Row 2); a refill raises the inflow burette. Check the two levels." },
      { index: 2, field: "outflowLevelMm", message: "Row 3, outflow burette level after the drain: 395 mm is above the 392 mm just before it (Row 2); a drain lowers the outflow burette. Check the two levels." },
    ]);
    expect(prepare([draft(0, 480, 20, true)]).problems[0]!.message).toBe('Row 1: it is marked "after refill", but no reading comes before it; record the levels just before the refill first.');
    const off = prepare([draft(0, 520, -3)]);
    expect(off.problems.map((p) => [p.field, p.message])).toEqual([
      ["inflowLevelMm", "Row 1, inflow burette level: 520 mm is outside the scale's calibrated range, 0 to 500 mm; check the reading, or recalibrate the panel."],
      ["outflowLevelMm", "Row 1, outflow burette level: -3 mm is outside the scale's calibrated range, 0 to 500 mm; check the reading, or recalibrate the panel."],
    ]);
    const unmarked = prepare([draft(0, 120, 380), draft(6, 480, 20)]);
    expect(unmarked.problems[0]!.message).toMatch(/If the burette was refilled, mark this reading "after refill"/);
  });
});

describe("refills in a data-logger file", () => {
  it("reads a refill column (1, yes, x) or a marked row in an event column (refill, drained), and refuses other notes", () => {
    expect(["", "0", "no", "1", "yes", "x", "Refill", "outflow drained", "REFILLED both"].map(parseRefillMark)).toEqual([false, false, false, true, true, true, true, true, true]);
    expect(parseRefillMark("checked valves")).toBe("invalid");
    const csv = [
      "Elapsed (h),Inflow burette (mm),Outflow burette (mm),Influent kPa,Effluent kPa,Temp °C,Event",
      "0,120.0,380.0,531,517,20.0,",
      "6,108.0,392.0,531,517,20.1,",
      "6.1,480.0,20.0,531,517,20.1,refilled and drained",
      "12,468.0,32.0,531,517,20.0,",
      "18,456.0,44.0,531,517,20.0,valve check",
    ].join("\n");
    const parsed = parseReadingsCsv(csv);
    const mapping = suggestReadingsMapping(parsed);
    expect(mapping.columns).toEqual(["elapsed", "inflowLevelMm", "outflowLevelMm", "influentPressure", "effluentPressure", "temperatureC", "afterRefill"]);
    const mapped = applyReadingsMapping(parsed, mapping);
    expect(mapped.map((m) => m.values?.afterRefill ?? false)).toEqual([false, false, true, false, false]);
    expect(mapped[4]!.errors).toEqual([{ row: 6, field: "afterRefill", message: 'Row 6, column "Event" (refill or drain mark): "valve check" is neither a refill mark (1, yes, refill, drain) nor blank.' }]);
    const { rows, problems } = prepare(mapped.slice(0, 4).map((m) => m.values!));
    expect(problems).toEqual([]);
    expect(rows[3]!.inflowCumulativeMl).toBeCloseTo(0.7536, 12);
  });
});
