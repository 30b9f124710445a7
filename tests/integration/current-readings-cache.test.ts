import { describe, expect, it } from "vitest";
import { correctReading } from "@/lib/server/readings/correct-reading";
import { loadCurrentReadingsOnce } from "@/lib/server/readings/load-current-readings";
import { listRunReadings } from "@/lib/server/readings/list-run-readings";
import { recordReadings } from "@/lib/server/readings/record-readings";
import { evaluateRunRecords } from "@/lib/server/runs/evaluate-run-records";
import { db } from "../support/factories";
import { at, gridRow, makeRun } from "../support/make-permeating-run";

/**
 * The run page keeps a run's current readings and their verdict between requests (a data-logger run of
 * 100,000 readings takes a second to read and evaluate). Whatever is added, the next look sees it.
 */
describe("readings kept between requests follow every change to the run's readings", () => {
  it("a new reading and a correction each give a new set and a new verdict; an unchanged set is the same one", async () => {
    const { technician, run, permeationStartedAt } = await makeRun();
    const look = async () => {
      const readings = loadCurrentReadingsOnce(run.id);
      return { readings: await readings, verdict: await evaluateRunRecords(db(), run.id, { readings }) };
    };
    await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 0), "452", "18"), gridRow(at(permeationStartedAt, 6), "442.1", "28.9")] } });
    const first = await look();
    const again = await look();
    expect(again.readings).toBe(first.readings);
    expect(again.verdict).toBe(first.verdict);
    expect(first.readings.map((r) => r.inflowLevelMm)).toEqual([452, 442.1]);

    await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 12), "432", "39.5")] } });
    const added = await look();
    expect(added.readings.map((r) => r.inflowLevelMm)).toEqual([452, 442.1, 432]);
    expect(added.verdict).not.toBe(first.verdict);
    expect(added.verdict.inputReadings).toHaveLength(3);

    // A correction keeps the count of current readings and the highest sequence: the set is still told apart.
    await correctReading({ actor: technician, input: { readingId: first.readings[1]!.id, pressureUnit: "KPA", values: gridRow(at(permeationStartedAt, 6), "441.2", "28.9"), reason: "Misread the scale: 441.2, not 442.1" } });
    const corrected = await look();
    expect(corrected.readings.map((r) => [r.inflowLevelMm, r.corrected])).toEqual([[452, false], [441.2, true], [432, false]]);
    expect(corrected.verdict.inputReadings[1]!.inflowMl).toBeCloseTo(((452 - 441.2) * 31.4) / 1000, 9);

    const panel = await listRunReadings({ actor: technician, runId: run.id });
    expect(panel.current.map((r) => r.inflowLevelMm)).toEqual([452, 441.2, 432]);
  });
});
