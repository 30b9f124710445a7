import { describe, expect, it } from "vitest";
import { checkReadingSequence, type SequenceRow } from "@/lib/readings/check-reading-sequence";
import { prepareReadings } from "@/lib/readings/prepare-readings";

const row = (label: string, h: number, inflow: number, outflow: number, extra: Partial<SequenceRow> = {}): SequenceRow => ({ label, elapsedS: h * 3600, inflowLevelMm: inflow, outflowLevelMm: outflow, headPa: 14_000, temperatureC: 20, ...extra });

describe("checks across readings", () => {
  it("passes a good sequence", () => {
    expect(checkReadingSequence({ rows: [row("Row 2", 0, 450, 20), row("Row 3", 6, 439, 31), row("Row 4", 12, 428.2, 41.7)] })).toEqual([]);
  });

  it("refuses readings out of order, also against the last saved reading", () => {
    const problems = checkReadingSequence({ rows: [row("Row 2", 6, 439, 31), row("Row 3", 6, 430, 40)], previous: { label: "Reading 4", elapsedS: 12 * 3600, inflowLevelMm: 440, outflowLevelMm: 30 } });
    expect(problems).toEqual([
      { index: 0, field: "time", message: "Row 2, time: 6 h after permeation began is not later than Reading 4 (12 h); readings must be in time order." },
      { index: 1, field: "time", message: "Row 3, time: 6 h after permeation began is not later than Row 2 (6 h); readings must be in time order." },
    ]);
  });

  it("says plainly that a rising inflow or falling outflow level is a negative volume, perhaps a refill", () => {
    const problems = checkReadingSequence({ rows: [row("Row 2", 0, 300, 150), row("Row 3", 6, 480, 20)] });
    expect(problems.map((p) => p.field)).toEqual(["inflowLevelMm", "outflowLevelMm"]);
    expect(problems[0]!.message).toMatch(/^Row 3, inflow burette level: it rose from 300 mm \(Row 2\) to 480 mm\. .*negative inflow volume\. If the burette was refilled/);
    expect(problems[1]!.message).toMatch(/negative outflow volume/);
  });

  it("lets reading noise within the tolerance pass (0.5 mm by default, common practice)", () => {
    expect(checkReadingSequence({ rows: [row("Row 2", 0, 450, 20), row("Row 3", 6, 450.4, 19.6)] })).toEqual([]);
  });

  it("refuses temperatures outside 0–40 °C and a head that is not positive", () => {
    const problems = checkReadingSequence({ rows: [row("Row 2", 0, 450, 20, { temperatureC: 85 }), row("Row 3", 6, 440, 30, { headPa: -2000 })] });
    expect(problems).toEqual([
      { index: 0, field: "temperatureC", message: "Row 2, temperature: 85 °C is outside 0–40 °C, which a water permeation test cannot have; check the thermometer reading or the column mapped to temperature." },
      { index: 1, field: "head", message: "Row 3, pressures: the influent pressure must be above the effluent pressure so that water is driven through the specimen; the head is -2.0 kPa." },
    ]);
  });

  it("checks a corrected reading against the saved one after it", () => {
    const problems = checkReadingSequence({ rows: [row("Reading 3", 20, 430, 40)], previous: { label: "Reading 2", elapsedS: 6 * 3600, inflowLevelMm: 440, outflowLevelMm: 30 }, next: { label: "Reading 4", elapsedS: 18 * 3600, inflowLevelMm: 420, outflowLevelMm: 50 } });
    expect(problems).toEqual([{ index: 0, field: "time", message: "Reading 4 (saved), time: 18 h after permeation began is not later than Reading 3 (20 h); readings must be in time order." }]);
  });
});

describe("placing readings on a run", () => {
  const start = new Date("2026-03-02T08:00:00Z");
  const now = new Date("2026-03-10T08:00:00Z");
  const draft = (h: number, inflow: number, outflow: number) => ({ elapsedS: h * 3600, inflowLevelMm: inflow, outflowLevelMm: outflow, influentPressurePa: 530_000, effluentPressurePa: 516_000, temperatureC: 20 });

  it("turns levels into cumulative volumes with the burette areas (1 mm × 1 mm² = 1e-3 mL, by definition)", () => {
    const { rows, problems } = prepareReadings({
      drafts: [{ label: "Row 2", draft: draft(0, 452, 18) }, { label: "Row 3", draft: draft(6, 441.2, 28.9) }],
      permeationStartedAt: start, now, areasMm2: { inflow: 31.4, outflow: 31.2 }, reference: null,
    });
    expect(problems).toEqual([]);
    expect(rows[0]).toMatchObject({ inflowCumulativeMl: 0, outflowCumulativeMl: 0, headPa: 14_000, takenAt: start });
    // (452 - 441.2) mm × 31.4 mm² = 339.12 mm³ = 0.33912 mL; (28.9 - 18) × 31.2 = 340.08 mm³.
    expect(rows[1]!.inflowCumulativeMl).toBeCloseTo(0.33912, 9);
    expect(rows[1]!.outflowCumulativeMl).toBeCloseTo(0.34008, 9);
    expect(rows[1]!.takenAt).toEqual(new Date("2026-03-02T14:00:00Z"));
  });

  it("continues from the run's first reading and counts elapsed time from a date-time", () => {
    const { rows } = prepareReadings({
      drafts: [{ label: "Row 1", draft: { ...draft(0, 430, 40), elapsedS: undefined, takenAt: new Date("2026-03-03T08:00:00Z") } }],
      permeationStartedAt: start, now, areasMm2: { inflow: 30, outflow: 30 },
      reference: { inflowLevelMm: 450, outflowLevelMm: 20, inflowCumulativeMl: 0, outflowCumulativeMl: 0 },
    });
    expect(rows[0]).toMatchObject({ elapsedS: 86_400, inflowCumulativeMl: 0.6, outflowCumulativeMl: 0.6 });
  });

  it("refuses a reading in the future or before permeation began", () => {
    const { problems } = prepareReadings({
      drafts: [{ label: "Row 1", draft: { ...draft(0, 450, 20), elapsedS: undefined, takenAt: new Date("2026-03-01T08:00:00Z") } }, { label: "Row 2", draft: draft(24 * 30, 440, 30) }],
      permeationStartedAt: start, now, areasMm2: { inflow: 30, outflow: 30 }, reference: null,
    });
    expect(problems.map((p) => [p.index, p.field])).toEqual([[0, "time"], [1, "time"]]);
    expect(problems[0]!.message).toBe("Row 1, time: it is 24 h before permeation began; readings start when permeation does.");
    expect(problems[1]!.message).toMatch(/^Row 2, time: .* is in the future/);
  });
});
