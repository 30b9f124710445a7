import { describe, expect, it } from "vitest";
import { formatDate, formatDateTime } from "@/lib/format/dates";
import { formatOffset, fromWallTime, isTimeZone, listTimeZones, timeZoneStatement, toWallTime, zoneOffsetMs } from "@/lib/format/time-zone";

// Offsets from the IANA time zone database. The EU changes clocks at 01:00 UTC on the last Sunday of March
// and of October (Directive 2000/84/EC): in 2026 on 29 March and 25 October. Asia/Kolkata is UTC+05:30 all year.
const HOUR = 3_600_000;

describe("the lab's time zone", () => {
  it("knows IANA zone names and refuses others", () => {
    expect(isTimeZone("Europe/Berlin")).toBe(true);
    expect(isTimeZone("UTC")).toBe(true);
    expect(isTimeZone("Mars/Olympus")).toBe(false);
    expect(isTimeZone("")).toBe(false);
    expect(listTimeZones()[0]).toBe("UTC");
    expect(listTimeZones()).toContain("Europe/Berlin");
    // A saved zone is always offered, even where the runtime lists it under another name.
    expect(listTimeZones("Asia/Kolkata")).toContain("Asia/Kolkata");
    expect(listTimeZones("Mars/Olympus")).not.toContain("Mars/Olympus");
  });

  it("gives the offset of the zone's clock from UTC, summer and winter", () => {
    expect(zoneOffsetMs(new Date("2026-01-15T12:00:00Z"), "Europe/Berlin")).toBe(HOUR);
    expect(zoneOffsetMs(new Date("2026-07-15T12:00:00Z"), "Europe/Berlin")).toBe(2 * HOUR);
    expect(zoneOffsetMs(new Date("2026-07-15T12:00:00Z"), "Asia/Kolkata")).toBe(5.5 * HOUR);
    expect(zoneOffsetMs(new Date("2026-07-15T12:00:00Z"), "America/New_York")).toBe(-4 * HOUR);
    expect(formatOffset(new Date("2026-07-15T12:00:00Z"), "Asia/Kolkata")).toBe("UTC+05:30");
    expect(formatOffset(new Date("2026-01-15T12:00:00Z"), "America/New_York")).toBe("UTC-05:00");
  });

  it("turns an instant into the wall-clock text a datetime input shows, and back", () => {
    const instant = new Date("2026-12-01T13:05:00Z");
    expect(toWallTime(instant, "Europe/Berlin")).toBe("2026-12-01T14:05");
    expect(toWallTime(new Date("2026-12-01T13:05:09Z"), "Europe/Berlin", { seconds: true })).toBe("2026-12-01T14:05:09");
    expect(fromWallTime("2026-12-01T14:05", "Europe/Berlin")).toEqual(instant);
    expect(fromWallTime("2026-12-01 14:05:00", "Europe/Berlin")).toEqual(instant);
    expect(fromWallTime("2026-07-01T10:00", "Asia/Kolkata")?.toISOString()).toBe("2026-07-01T04:30:00.000Z");
    expect(fromWallTime("2026-12-31T23:30", "UTC")?.toISOString()).toBe("2026-12-31T23:30:00.000Z");
  });

  it("reads the clock-change hours as stated: the earlier of a repeated hour, a skipped hour with the offset before", () => {
    // 25 Oct 2026: 02:30 happens twice in Berlin, first at 00:30 UTC (summer time), then at 01:30 UTC.
    expect(fromWallTime("2026-10-25T02:30", "Europe/Berlin")?.toISOString()).toBe("2026-10-25T00:30:00.000Z");
    // 29 Mar 2026: clocks jump from 02:00 to 03:00, so 02:30 does not exist; read with winter time (UTC+1).
    expect(fromWallTime("2026-03-29T02:30", "Europe/Berlin")?.toISOString()).toBe("2026-03-29T01:30:00.000Z");
  });

  it("refuses text that is not a real date and time", () => {
    expect(fromWallTime("", "UTC")).toBeNull();
    expect(fromWallTime("2026-04-31T10:00", "UTC")).toBeNull();
    expect(fromWallTime("2026-13-01T10:00", "UTC")).toBeNull();
    expect(fromWallTime("2026-01-01T24:00", "UTC")).toBeNull();
    expect(fromWallTime("01.02.2026 10:00", "UTC")).toBeNull();
  });

  it("writes dates and times in the zone with its name, and keeps the UTC form when the zone is UTC", () => {
    const instant = new Date("2026-12-31T23:30:00Z");
    expect(formatDateTime(instant)).toBe("2026-12-31 23:30 UTC");
    expect(formatDateTime(instant, "Europe/Berlin")).toBe("2027-01-01 00:30 CET");
    expect(formatDate(instant, "Europe/Berlin")).toBe("2027-01-01");
    expect(formatDate(instant)).toBe("2026-12-31");
    expect(formatDateTime(new Date("2026-07-01T04:30:00Z"), "Asia/Kolkata")).toBe("2026-07-01 10:00 GMT+5:30");
    expect(formatDateTime(null, "Europe/Berlin")).toBe("—");
  });

  it("says on documents which zone their times are in", () => {
    expect(timeZoneStatement("UTC")).toBe("Times are given in UTC.");
    expect(timeZoneStatement("Europe/Berlin", new Date("2026-07-01T00:00:00Z"))).toBe("Times are given in the laboratory's time zone, Europe/Berlin (UTC+02:00 on the date of this document).");
  });
});
