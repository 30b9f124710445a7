import { afterEach, describe, expect, it } from "vitest";
import { formatLabNumber } from "@/lib/numbering/lab-number";
import { earliestRecordYear, futureDate, pastDateTime, readCalendarDate } from "@/lib/validation/record-dates";
import { findUnstorableText, isUnstorableText } from "@/lib/validation/unstorable-text";

describe("text that cannot be stored", () => {
  it("finds a NUL or a lone surrogate anywhere, keys included, and names the field", () => {
    expect(isUnstorableText("plain text, ü, 💧")).toBe(false);
    expect(isUnstorableText("a\u0000b")).toBe(true);
    expect(isUnstorableText("x\ud800")).toBe(true);
    expect(isUnstorableText("\udc00x")).toBe(true);
    expect(findUnstorableText({ name: "ok", rolls: [{ lot: "L1" }, { lot: "L\u0000" }] })).toBe("rolls.1.lot");
    expect(findUnstorableText("\ud83d")).toBe("form");
    expect(findUnstorableText({ ["bad\u0000key"]: 1 })).toBe("form");
    expect(findUnstorableText({ a: 1, b: [true, null], c: "fine" })).toBeNull();
  });
});

describe("record dates", () => {
  const saved = process.env.SEEPLINE_FOUNDED_YEAR;
  afterEach(() => {
    if (saved === undefined) delete process.env.SEEPLINE_FOUNDED_YEAR;
    else process.env.SEEPLINE_FOUNDED_YEAR = saved;
  });

  // Calendar facts (Gregorian calendar): February has 28 days, 29 in leap years (2024 is one, 2026 is not).
  it("refuses days that do not exist instead of moving them to another day", () => {
    expect(readCalendarDate("2026-02-30")).toBeNull();
    expect(readCalendarDate("2026-02-29T10:00")).toBeNull();
    expect(readCalendarDate("2024-02-29T10:00Z")?.toISOString()).toBe("2024-02-29T10:00:00.000Z");
    expect(readCalendarDate("2026-04-31")).toBeNull();
    expect(readCalendarDate("2026-13-01")).toBeNull();
    expect(readCalendarDate("2026-03-02T24:00")).toBeNull();
    expect(readCalendarDate("-000001-01-01T00:00:00Z")).toBeNull();
    expect(readCalendarDate("2026-03-02 08:00+0100")?.toISOString()).toBe("2026-03-02T07:00:00.000Z");
  });

  it("keeps dates between the year the records begin and now (events) or twenty years ahead (due dates)", () => {
    const when = pastDateTime("when it arrived");
    expect(when.safeParse("0001-01-01T00:00").success).toBe(false);
    expect(when.safeParse("1999-12-30T10:00Z").error?.issues[0]?.message).toBe("When it arrived cannot be before 2000, when the laboratory's records begin.");
    expect(when.safeParse("2026-02-30T10:00").error?.issues[0]?.message).toMatch(/real date/);
    expect(when.safeParse(new Date(Date.now() + 86_400_000)).error?.issues[0]?.message).toBe("When it arrived cannot be in the future.");
    expect(when.safeParse(new Date(Date.now() - 3_600_000)).success).toBe(true);
    const due = futureDate("the due date");
    expect(due.safeParse(new Date(Date.now() + 2 * 365 * 86_400_000)).success).toBe(true);
    expect(due.safeParse("2300-01-01").success).toBe(false);
  });

  it("takes the founding year from SEEPLINE_FOUNDED_YEAR, never before 2000 nor after this year", () => {
    process.env.SEEPLINE_FOUNDED_YEAR = "2012";
    expect(earliestRecordYear()).toBe(2012);
    expect(pastDateTime("the cut").safeParse("2011-06-01T10:00Z").success).toBe(false);
    process.env.SEEPLINE_FOUNDED_YEAR = "1890";
    expect(earliestRecordYear()).toBe(2000);
    process.env.SEEPLINE_FOUNDED_YEAR = "3000";
    expect(earliestRecordYear(new Date("2026-06-01T00:00:00Z"))).toBe(2026);
  });

  it("never formats a lab number whose two-digit year could repeat another century's", () => {
    expect(formatLabNumber("shipment", 2001, 1)).toBe("S01-00001");
    expect(() => formatLabNumber("shipment", 1, 1)).toThrow(/2000 to 2099/);
    expect(() => formatLabNumber("shipment", 2101, 1)).toThrow(/2000 to 2099/);
  });
});
