import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { loggerLinesToReadings, loggerMapping } from "@/lib/readings/logger-rows";

const sha = (t: string) => createHash("sha256").update(t).digest("hex");
const HEADER = ["Date/Time", "Elapsed (h)", "Inflow burette (mm)", "Outflow burette (mm)", "Influent kPa", "Effluent kPa", "Cell kPa", "Temp °C"];

describe("data-logger lines to API readings (invented logger rows, the layout of e2e/fixtures/readings-d5887.csv)", () => {
  it("reads the clock column, not the elapsed one, and keys each line by file, line number and content", () => {
    const mapped = loggerMapping(HEADER, "2026-03-02T08:00:00Z,0,452.0,18.0,530.0,516.0,565.0,20.0");
    if ("problem" in mapped) throw new Error(mapped.problem);
    expect(mapped.mapping.columns[0]).toBe("takenAt");
    expect(mapped.mapping.columns[1]).toBe("ignore");
    const lines = [{ lineNumber: 2, text: "2026-03-02T08:00:00Z,0,452.0,18.0,530.0,516.0,565.0,20.0" }, { lineNumber: 3, text: "" }, { lineNumber: 4, text: "2026-03-02T14:00:00Z,6,435.0,33.0,530.0,516.0,,20.1" }];
    const { readings, stoppedAt } = loggerLinesToReadings({ header: HEADER, lines, fileId: "f1", mapping: mapped.mapping, hash: sha });
    expect(stoppedAt).toBeNull();
    expect(readings.map((r) => r.lineNumber)).toEqual([2, 4]);
    expect(readings[0]!.reading).toMatchObject({ takenAt: "2026-03-02T08:00:00.000Z", inflowLevelMm: 452, outflowLevelMm: 18, influentPressure: 530, effluentPressure: 516, cellPressure: 565, temperatureC: 20 });
    expect(readings[1]!.reading.cellPressure).toBeNull();
    expect(readings[0]!.reading.idempotencyKey).toBe(`f1:2:${sha(lines[0]!.text).slice(0, 16)}`);
    // The same line gives the same key again; a changed line another.
    const again = loggerLinesToReadings({ header: HEADER, lines: [{ lineNumber: 2, text: lines[0]!.text.replace("452.0", "451.0") }], fileId: "f1", mapping: mapped.mapping, hash: sha });
    expect(again.readings[0]!.reading.idempotencyKey).not.toBe(readings[0]!.reading.idempotencyKey);
  });

  it("stops at a line that does not read, so no later line is posted before it", () => {
    const mapped = loggerMapping(HEADER, null);
    if ("problem" in mapped) throw new Error(mapped.problem);
    const { readings, stoppedAt } = loggerLinesToReadings({
      header: HEADER, fileId: "f1", mapping: mapped.mapping, hash: sha,
      lines: [{ lineNumber: 2, text: "2026-03-02T08:00:00Z,0,452.0,18.0,530.0,516.0,565.0,20.0" }, { lineNumber: 3, text: "2026-03-02T14:00:00Z,6,abc,33.0,530.0,516.0,565.0,20.1" }, { lineNumber: 4, text: "2026-03-02T20:00:00Z,12,421.2,45.8,530.0,516.0,565.0,20.3" }],
    });
    expect(readings.map((r) => r.lineNumber)).toEqual([2]);
    expect(stoppedAt).toMatchObject({ lineNumber: 3, message: expect.stringMatching(/^Line 3, column "Inflow burette \(mm\)".*"abc" is not a number/) });
  });

  it("refuses a file without a clock column", () => {
    expect(loggerMapping(["Elapsed (h)", "Inflow burette (mm)", "Outflow burette (mm)", "Influent kPa", "Effluent kPa", "Temp °C"], "0,452,18,530,516,20")).toMatchObject({ problem: expect.stringMatching(/no date-and-time column/) });
  });
});
