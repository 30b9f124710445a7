import { describe, expect, it } from "vitest";
import { isBlankRow, nextReadingTime, withoutTrailingBlankRows } from "@/lib/readings/entry-grid-rows";

const row = (inflowLevelMm: string, outflowLevelMm = "", extra: Record<string, unknown> = {}) => ({ takenAt: "2026-11-30T08:00:00.000Z", inflowLevelMm, outflowLevelMm, ...extra });

describe("the readings entry grid's rows", () => {
  it("leaves out blank rows at the end only", () => {
    const rows = [row("500", "100"), row(""), row("490", "110"), row(""), row(" ")];
    expect(withoutTrailingBlankRows(rows)).toEqual(rows.slice(0, 3));
    expect(withoutTrailingBlankRows([row("")])).toEqual([]);
  });

  it("counts a row with only a refill mark or an effluent chemistry value as filled", () => {
    expect(isBlankRow(row("", "", { afterRefill: true }))).toBe(false);
    expect(isBlankRow(row("", "", { effluentEcMsPerM: "12" }))).toBe(false);
    expect(isBlankRow(row("", "", { influentEcMsPerM: "", effluentPh: "" }))).toBe(true);
  });

  it("continues the interval of the last two readings", () => {
    const now = new Date("2026-12-02T12:00:00Z");
    expect(nextReadingTime(["2026-11-30T08:00:00.000Z", "2026-11-30T10:00:00.000Z"], now)).toBe("2026-11-30T12:00:00.000Z");
    expect(nextReadingTime(["2026-11-30T10:00:00.000Z"], now)).toBe("2026-11-30T11:00:00.000Z");
    expect(nextReadingTime([], now)).toBeNull();
  });

  it("never starts a row in the future: live entry starts at the present minute", () => {
    const now = new Date("2026-12-02T12:34:56Z");
    expect(nextReadingTime(["2026-12-02T10:00:00.000Z", "2026-12-02T12:00:00.000Z"], now)).toBe("2026-12-02T12:34:00.000Z");
  });
});
