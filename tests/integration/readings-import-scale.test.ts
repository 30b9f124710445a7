import { describe, expect, it } from "vitest";
import { importReadingsFile } from "@/lib/server/readings/import-readings-file";
import { MAX_READINGS_FILE_BYTES } from "@/lib/validation/readings";
import { db } from "../support/factories";
import { makeRun } from "../support/make-permeating-run";
import { failure } from "../support/refusals";

/** An invented logger file: one reading every 3 minutes, burettes moving 0.001 mm a reading. */
function loggerFile(rows: number, lastLine?: string): string {
  const lines = ["Elapsed (h),Inflow (mm),Outflow (mm),Influent kPa,Effluent kPa,Temp °C"];
  for (let i = 0; i < rows; i++) lines.push(`${(i * 0.05).toFixed(2)},${(452 - i * 0.001).toFixed(3)},${(18 + i * 0.001).toFixed(3)},530,516,20.0`);
  if (lastLine) lines[lines.length - 1] = lastLine;
  return `${lines.join("\n")}\n`;
}

/** The text as an upload brings it: 64 KiB pieces. */
function* pieces(text: string) {
  const bytes = new TextEncoder().encode(text);
  for (let i = 0; i < bytes.length; i += 65_536) yield bytes.subarray(i, i + 65_536);
}

describe("importing long data-logger files", () => {
  it("saves 100,000 readings in one transaction, numbered in order, each audited", { timeout: 120_000 }, async () => {
    const { technician, run } = await makeRun({ startedDaysAgo: 400 });
    const summary = await importReadingsFile({ actor: technician, input: { labNumber: run.labNumber, fileName: "long.csv", mode: "save" }, body: pieces(loggerFile(100_000)) });
    expect(summary).toMatchObject({ rowCount: 100_000, errorCount: 0, saved: 100_000 });
    const stats = await db().$queryRaw<{ n: bigint; first: number; last: number; audited: bigint }[]>`
      SELECT count(*) AS n, min(sequence) AS first, max(sequence) AS last,
             (SELECT count(*) FROM "AuditLog" a WHERE a."tableName" = 'Reading' AND a."rowId" IN (SELECT id FROM "Reading" WHERE "runId" = ${run.id})) AS audited
      FROM "Reading" WHERE "runId" = ${run.id}`;
    expect(stats[0]).toMatchObject({ n: 100_000n, first: 1, last: 100_000, audited: 100_000n });
    const last = await db().reading.findFirstOrThrow({ where: { runId: run.id, sequence: 100_000 } });
    // (99,999 × 0.001) mm × 31.4 mm² = 3,139.97 mm³ ≈ 3.14 mL of inflow by the last reading.
    expect(last.inflowCumulativeMl).toBeCloseTo(3.13997, 4);
    expect(last).toMatchObject({ source: "long.csv", recordedById: technician.id, elapsedS: 99_999 * 180 });
  });

  it("saves nothing from 100,000 rows with one bad row in the last line, and names it", { timeout: 120_000 }, async () => {
    const { technician, run } = await makeRun({ startedDaysAgo: 400 });
    const file = loggerFile(100_000, "4999.95,451.9,18.1,530,516,hot");
    const input = { labNumber: run.labNumber, fileName: "long-bad-end.csv", mode: "save" as const };
    const error = await failure(importReadingsFile({ actor: technician, input, body: pieces(file) }));
    expect(error.message).toBe('Nothing was saved from long-bad-end.csv. Row 100001, column "Temp °C" (temperature (°C)): "hot" is not a number.');
    expect(await db().reading.count({ where: { runId: run.id } })).toBe(0);
    const preview = await importReadingsFile({ actor: technician, input: { ...input, mode: "preview" }, body: pieces(file) });
    expect(preview).toMatchObject({ rowCount: 100_000, errorCount: 1, canSave: false, errors: [{ row: 100_001, field: "temperatureC" }] });
    expect(preview.last.at(-1)).toMatchObject({ row: 100_001, reading: null });
  });

  it("refuses a file that is not text, and one larger than an import takes, saving nothing", async () => {
    const { technician, run } = await makeRun();
    const input = { labNumber: run.labNumber, fileName: "photo.jpg", mode: "save" as const };
    const jpeg = Uint8Array.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01]);
    expect((await failure(importReadingsFile({ actor: technician, input, body: [jpeg] }))).message).toBe(
      "photo.jpg is not a text file (it holds bytes that are not UTF-8 text); export the logger's readings as CSV text and choose that file.",
    );
    // UTF-16 text decodes as UTF-8 full of NULs: not what a logger's CSV export is either.
    const utf16 = Uint8Array.from([...("Elapsed,Inflow\n").split("").flatMap((c) => [c.charCodeAt(0), 0])]);
    expect((await failure(importReadingsFile({ actor: technician, input, body: [utf16] }))).message).toMatch(/is not a text file/);
    // A body bigger than the limit (sent without a length, so the front door could not refuse it): the reading stops there.
    const chunk = new TextEncoder().encode(`${"0,452,18,530,516,20\n".repeat(50_000)}`);
    function* huge() {
      yield new TextEncoder().encode("Elapsed (h),Inflow (mm),Outflow (mm),Influent kPa,Effluent kPa,Temp °C\n");
      for (let sent = 0; sent <= MAX_READINGS_FILE_BYTES + chunk.length; sent += chunk.length) yield chunk;
    }
    const tooBig = await failure(importReadingsFile({ actor: technician, input: { ...input, fileName: "huge.csv" }, body: huge() }));
    expect(tooBig.message).toMatch(/^huge\.csv (is larger than 32 MB|has more than 300,000 rows), the most one import takes; split it by date and import each part in order\. Nothing was saved\.$/);
    expect(await db().reading.count({ where: { runId: run.id } })).toBe(0);
  });
});
