import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { withActor } from "@/lib/server/db/transaction";
import { correctReading } from "@/lib/server/readings/correct-reading";
import { importReadingsFile } from "@/lib/server/readings/import-readings-file";
import { listRunReadings } from "@/lib/server/readings/list-run-readings";
import { recordReadings } from "@/lib/server/readings/record-readings";
import { evaluateRunRecords } from "@/lib/server/runs/evaluate-run-records";
import { failure } from "../support/refusals";
import { db } from "../support/factories";
import { at, gridRow, makeRun } from "../support/make-permeating-run";
import { withOwner } from "../support/owner";

const fixture = (name: string) => readFileSync(path.resolve(import.meta.dirname, "../../e2e/fixtures", name), "utf8");
/** The file's bytes in pieces of 7 bytes, as a slow upload would bring them (cuts fall inside characters and lines). */
async function* bytesOf(text: string) {
  const bytes = new TextEncoder().encode(text);
  for (let i = 0; i < bytes.length; i += 7) yield bytes.slice(i, i + 7);
}
type FileInput = { labNumber: string; fileName: string; text: string; mapping?: unknown; mode: "preview" | "save" };
const importReadingsCsv = ({ actor, input }: { actor: Parameters<typeof importReadingsFile>[0]["actor"]; input: FileInput }) => {
  const { text, ...settings } = input;
  return importReadingsFile({ actor, input: settings, body: bytesOf(text) });
};


describe("entering readings in the grid", () => {
  it("saves a batch with cumulative volumes from the calibrated burette areas and elapsed time from the permeation start", async () => {
    const { technician, run, permeationStartedAt } = await makeRun();
    const saved = await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 0), "452", "18"), gridRow(at(permeationStartedAt, 6), "441,2", "28.9")] } });
    expect(saved).toMatchObject({ saved: 2, firstSequence: 1 });
    const rows = await db().reading.findMany({ where: { runId: run.id }, orderBy: { sequence: "asc" } });
    expect(rows.map((r) => [r.sequence, r.elapsedS, r.source, r.recordedById])).toEqual([[1, 0, "manual", technician.id], [2, 21_600, "manual", technician.id]]);
    expect(rows[0]).toMatchObject({ inflowCumulativeMl: 0, outflowCumulativeMl: 0, headPa: 14_000, influentPressurePa: 530_000, cellPressurePa: 565_000, temperatureC: 20.1, inflowLevelMm: 452 });
    // (452 - 441.2) mm × 31.4 mm² = 339.12 mm³ = 0.33912 mL; (28.9 - 18) mm × 31.2 mm² = 0.34008 mL.
    expect(rows[1]!.inflowCumulativeMl).toBeCloseTo(0.33912, 9);
    expect(rows[1]!.outflowCumulativeMl).toBeCloseTo(0.34008, 9);

    // A second batch continues the sequence and the volumes from the first reading, with pressures in psi.
    await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "PSI", readings: [gridRow(at(permeationStartedAt, 12), "430.4", "39.8", { influentPressure: "76.87", effluentPressure: "74.84", cellPressure: "" })] } });
    const third = await db().reading.findFirstOrThrow({ where: { runId: run.id, sequence: 3 } });
    expect(third.inflowCumulativeMl).toBeCloseTo(((452 - 430.4) * 31.4) / 1000, 9);
    // 2.03 psi × 6894.757293168361 Pa/psi (NIST SP 811) = 13996.357 Pa.
    expect(third.headPa).toBeCloseTo(2.03 * 6894.757293168361, 3);
    expect(third.cellPressurePa).toBeNull();
  });

  it("saves nothing when one row goes back in time or a burette moves the wrong way, naming the row and field", async () => {
    const { technician, run, permeationStartedAt } = await makeRun();
    await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 12), "452", "18")] } });
    const error = await failure(recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 18), "440", "30"), gridRow(at(permeationStartedAt, 6), "470", "30", { temperatureC: "21" })] } }));
    expect(error.code).toBe("INVALID_INPUT");
    expect(error.fieldErrors["readings.1.takenAt"]).toMatch(/^Row 2, time: 6 h after permeation began is not later than Row 1 \(18 h\)/);
    expect(error.fieldErrors["readings.1.inflowLevelMm"]).toMatch(/^Row 2, inflow burette level: it rose from 440 mm \(Row 1\) to 470 mm.*negative inflow volume/);
    expect(error.message).toMatch(/^Nothing was saved\. /);
    expect(await db().reading.count({ where: { runId: run.id } })).toBe(1);

    const hot = await failure(recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 18), "440", "30", { temperatureC: "55" })] } }));
    expect(hot.fieldErrors["readings.0.temperatureC"]).toBe("The temperature (°C) must be at most 40.");
    const before = await failure(recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 6), "451", "19")] } }));
    expect(before.fieldErrors["readings.0.takenAt"]).toMatch(/not later than Reading 1 \(12 h\)/);
  });

  it("refuses readings when the run is not permeating, and another technician's or QA's readings", async () => {
    const equilibrating = await makeRun({ state: "EQUILIBRATING" });
    const notYet = await failure(recordReadings({ actor: equilibrating.technician, input: { runId: equilibrating.run.id, pressureUnit: "KPA", readings: [gridRow(at(equilibrating.permeationStartedAt, 1), "452", "18")] } }));
    expect(notYet.code).toBe("ILLEGAL_TRANSITION");
    expect(notYet.message).toBe(`${equilibrating.run.labNumber}: A run that is equilibrating cannot record readings; from here you can record a back-pressure stage, start permeation, abandon it.`);

    const { other, qa, run, permeationStartedAt } = await makeRun();
    const input = { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 1), "452", "18")] };
    const forbidden = await failure(recordReadings({ actor: other, input }));
    expect(forbidden.code).toBe("FORBIDDEN");
    expect(forbidden.message).toBe(`${run.labNumber} is another technician's run; only the person performing it records its readings.`);
    expect((await failure(recordReadings({ actor: qa, input }))).code).toBe("FORBIDDEN");
    expect(await db().reading.count({ where: { runId: run.id } })).toBe(0);
    const seen = await listRunReadings({ actor: qa, runId: run.id });
    expect(seen).toMatchObject({ canRecord: false, whyNot: "Your role reads readings only; the technician performing the run records them." });
  });
});

describe("importing a data-logger CSV", () => {
  it("previews the invented D5887 file without saving, then saves all 13 rows with the file name as source, and lib/hydraulics says the criteria are met", async () => {
    const { technician, run } = await makeRun();
    const input = { labNumber: run.labNumber, fileName: "C:\\logger\\readings-d5887.csv", text: fixture("readings-d5887.csv") };
    const preview = await importReadingsCsv({ actor: technician, input: { ...input, mode: "preview" } });
    expect(preview).toMatchObject({ canSave: true, errorCount: 0, saved: 0, fileName: "readings-d5887.csv" });
    expect(preview.mapping.columns).toEqual(["ignore", "elapsed", "inflowLevelMm", "outflowLevelMm", "influentPressure", "effluentPressure", "cellPressure", "temperatureC"]);
    expect(preview).toMatchObject({ rowCount: 13, spanHours: { from: 0, to: 72 } });
    expect(preview.first.map((r) => r.row)).toEqual([2, 3, 4, 5, 6]);
    expect(preview.last.map((r) => r.row)).toEqual([10, 11, 12, 13, 14]);
    expect(await db().reading.count({ where: { runId: run.id } })).toBe(0);

    const saved = await importReadingsCsv({ actor: technician, input: { ...input, mapping: preview.mapping, mode: "save" } });
    expect(saved.saved).toBe(13);
    const rows = await db().reading.findMany({ where: { runId: run.id }, orderBy: { sequence: "asc" } });
    expect(rows.map((r) => r.sequence)).toEqual(Array.from({ length: 13 }, (_, i) => i + 1));
    expect(new Set(rows.map((r) => r.source))).toEqual(new Set(["readings-d5887.csv"]));
    expect(rows[12]!.elapsedS).toBe(72 * 3600);
    const { evaluation, calculation } = await evaluateRunRecords(db(), run.id);
    expect(calculation.key).toBe("falling-head-rising-tail");
    expect(evaluation!.termination.met).toBe(true);
    expect(evaluation!.reported.flux).toBeGreaterThan(1.5e-9);
    expect(evaluation!.reported.flux).toBeLessThan(2.5e-9);

    // Importing the same file again would put readings before the saved ones: refused, naming the row.
    const again = await failure(importReadingsCsv({ actor: technician, input: { ...input, mode: "save" } }));
    expect(again.message).toMatch(/^Nothing was saved from readings-d5887\.csv\. Row 2, time: 0 h after permeation began is not later than Reading 13 \(72 h\)/);
    expect(await db().reading.count({ where: { runId: run.id } })).toBe(13);
  });

  it("saves nothing from a file with one bad row, and names the row and field", async () => {
    const { technician, run } = await makeRun();
    const input = { labNumber: run.labNumber, fileName: "readings-bad-row.csv", text: fixture("readings-bad-row.csv") };
    const preview = await importReadingsCsv({ actor: technician, input: { ...input, mode: "preview" } });
    expect(preview.canSave).toBe(false);
    expect(preview.errors.map((e) => [e.row, e.field])).toEqual([[9, "elapsed"]]);
    expect(preview.errors[0]!.message).toBe("Row 9, time: 30 h after permeation began is not later than Row 8 (36 h); readings must be in time order.");

    const error = await failure(importReadingsCsv({ actor: technician, input: { ...input, mode: "save" } }));
    expect(error.code).toBe("INVALID_INPUT");
    expect(error.message).toBe("Nothing was saved from readings-bad-row.csv. Row 9, time: 30 h after permeation began is not later than Row 8 (36 h); readings must be in time order.");
    expect((error.details?.preview as { errors: unknown[] }).errors).toHaveLength(1);
    expect(await db().reading.count({ where: { runId: run.id } })).toBe(0);
  });

  it("names a wrong column: text where the temperature should be, or a column left unmapped", async () => {
    const { technician, run } = await makeRun();
    const text = "Elapsed (h);Inflow (mm);Outflow (mm);Influent kPa;Effluent kPa;Temp °C\n0;452,0;18,0;530;516;20,1\n6;441,2;28,9;530;516;warm\n";
    const preview = await importReadingsCsv({ actor: technician, input: { labNumber: run.labNumber, fileName: "logger.csv", text, mode: "preview" } });
    expect(preview.errors).toEqual([{ row: 3, field: "temperatureC", message: 'Row 3, column "Temp °C" (temperature (°C)): "warm" is not a number.' }]);
    expect(preview.first[1]!.errors).toEqual(preview.errors);
    const unmapped = await importReadingsCsv({ actor: technician, input: { labNumber: run.labNumber, fileName: "logger.csv", text, mode: "preview", mapping: { ...preview.mapping, columns: preview.mapping.columns.map((c) => (c === "temperatureC" ? "ignore" : c)) } } });
    expect(unmapped.mappingErrors).toEqual(["No column is mapped to the temperature (°C), which every reading needs."]);
    expect(unmapped.canSave).toBe(false);
  });
});

describe("correcting a reading", () => {
  it("adds a new reading pointing at the original with the reason; the history shows both and the original row is unchanged", async () => {
    const { technician, run, permeationStartedAt, qa } = await makeRun();
    await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 0), "452", "18"), gridRow(at(permeationStartedAt, 6), "442.1", "28.9"), gridRow(at(permeationStartedAt, 12), "430.4", "39.8")] } });
    const original = await db().reading.findFirstOrThrow({ where: { runId: run.id, sequence: 2 } });

    const tooShort = await failure(correctReading({ actor: technician, input: { readingId: original.id, pressureUnit: "KPA", values: gridRow(at(permeationStartedAt, 6), "441.2", "28.9"), reason: "typo" } }));
    expect(tooShort.fieldErrors.reason).toBe("Say why, in a few words (at least 5 characters).");
    const unchanged = await failure(correctReading({ actor: technician, input: { readingId: original.id, pressureUnit: "KPA", values: gridRow(at(permeationStartedAt, 6), "442.1", "28.9"), reason: "Misread the scale" } }));
    expect(unchanged.message).toMatch(/same as the saved reading 2/);

    const corrected = await correctReading({ actor: technician, input: { readingId: original.id, pressureUnit: "KPA", values: gridRow(at(permeationStartedAt, 6), "441.2", "28.9"), reason: "Misread the scale: 441.2, not 442.1" } });
    expect(corrected).toMatchObject({ sequence: 2, correctsId: original.id });
    const replacement = await db().reading.findUniqueOrThrow({ where: { id: corrected.readingId } });
    expect(replacement).toMatchObject({ correctsId: original.id, correctionReason: "Misread the scale: 441.2, not 442.1", inflowLevelMm: 441.2, sequence: 2 });
    expect(replacement.inflowCumulativeMl).toBeCloseTo(0.33912, 9);
    expect(await db().reading.findUniqueOrThrow({ where: { id: original.id } })).toEqual(original);

    const listed = await listRunReadings({ actor: qa, runId: run.id });
    expect(listed.current.map((r) => [r.sequence, r.id === corrected.readingId || undefined, r.corrected])).toEqual([[1, undefined, false], [2, true, true], [3, undefined, false]]);
    const history = listed.history.find((h) => h.sequence === 2)!;
    expect(history.versions.map((v) => [v.inflowLevelMm, v.recordedBy.id, v.correctionReason])).toEqual([[442.1, technician.id, null], [441.2, technician.id, "Misread the scale: 441.2, not 442.1"]]);

    const twice = await failure(correctReading({ actor: technician, input: { readingId: original.id, pressureUnit: "KPA", values: gridRow(at(permeationStartedAt, 6), "441.0", "28.9"), reason: "Second look at the scale" } }));
    expect(twice.code).toBe("CONFLICT");
    expect(twice.message).toMatch(/^Reading 2 was already corrected by Test TECHNICIAN on .*; correct the latest version instead\.$/);

    const outOfOrder = await failure(correctReading({ actor: technician, input: { readingId: corrected.readingId, pressureUnit: "KPA", values: gridRow(at(permeationStartedAt, 14), "441.2", "28.9"), reason: "Wrong clock reading" } }));
    expect(outOfOrder.fieldErrors["values.takenAt"]).toMatch(/^Reading 3 \(saved\), time: 12 h after permeation began is not later than Reading 2 \(14 h\)/);
  });

  it("keeps the volumes right when the first reading is corrected", async () => {
    const { technician, run, permeationStartedAt } = await makeRun();
    await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 0), "453", "17"), gridRow(at(permeationStartedAt, 6), "441.2", "28.9")] } });
    const first = await db().reading.findFirstOrThrow({ where: { runId: run.id, sequence: 1 } });
    await correctReading({ actor: technician, input: { readingId: first.id, pressureUnit: "KPA", values: gridRow(at(permeationStartedAt, 0), "452", "18"), reason: "Levels of the first reading misread" } });
    // The evaluation counts volumes from the current readings' levels, whatever was stored before the correction.
    const readings = (await evaluateRunRecords(db(), run.id)).inputReadings;
    expect(readings[0]).toMatchObject({ inflowMl: 0, outflowMl: 0 });
    expect(readings[1]!.inflowMl).toBeCloseTo(0.33912, 9);
    expect(readings[1]!.outflowMl).toBeCloseTo(0.34008, 9);
    const listed = await listRunReadings({ actor: technician, runId: run.id });
    expect(listed.current[1]!.inflowMl).toBeCloseTo(0.33912, 9);
  });

  it("cannot be done by changing the saved row: the database refuses UPDATE and DELETE of a reading", async () => {
    const { technician, run, permeationStartedAt } = await makeRun();
    await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 0), "452", "18")] } });
    const reading = await db().reading.findFirstOrThrow({ where: { runId: run.id } });
    await expect(withActor(technician, (tx) => tx.reading.update({ where: { id: reading.id }, data: { temperatureC: 22 } }))).rejects.toThrow(/permission denied/);
    await expect(withOwner(technician, (tx) => tx.reading.update({ where: { id: reading.id }, data: { temperatureC: 22 } }))).rejects.toThrow(/cannot be changed; record a correction instead/);
    await expect(withOwner(technician, (tx) => tx.reading.update({ where: { id: reading.id }, data: { createdAt: new Date(0) } }))).rejects.toThrow(/cannot be changed/);
    await expect(withActor(technician, (tx) => tx.reading.delete({ where: { id: reading.id } }))).rejects.toThrow();
    expect(await db().reading.findUniqueOrThrow({ where: { id: reading.id } })).toEqual(reading);
  });
});
