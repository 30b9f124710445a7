import { describe, expect, it } from "vitest";
import { formatTypedTime, readTypedTime } from "@/lib/format/typed-time";

// Europe/Berlin: UTC+1 in winter, UTC+2 in summer; in 2026 summer time begins on Sunday 29 March at 01:00 UTC
// (EU rule: last Sunday of March, as in the IANA time zone database the runtime's Intl carries).
const zone = "Europe/Berlin";
const utc = (iso: string) => new Date(iso);

describe("a reading's time typed into the grid, in the lab's zone", () => {
  it("reads a full date and time as the lab's wall clock", () => {
    expect(readTypedTime("2026-11-30 14:30", zone, {})?.toISOString()).toBe("2026-11-30T13:30:00.000Z");
    expect(readTypedTime("2026-11-30T14:30:15", zone, {})?.toISOString()).toBe("2026-11-30T13:30:15.000Z");
    expect(readTypedTime("2026-07-01 14:30", zone, {})?.toISOString()).toBe("2026-07-01T12:30:00.000Z");
  });

  it("reads a time alone as the first such time at or after the reading above", () => {
    const above = utc("2026-11-30T12:00:00Z"); // 13:00 in Berlin
    expect(readTypedTime("14:30", zone, { after: above })?.toISOString()).toBe("2026-11-30T13:30:00.000Z");
    expect(readTypedTime("13:00", zone, { after: above })?.toISOString()).toBe("2026-11-30T12:00:00.000Z");
    expect(readTypedTime("9:05", zone, { after: above })?.toISOString()).toBe("2026-12-01T08:05:00.000Z");
    expect(readTypedTime("14.30", zone, { after: above })?.toISOString()).toBe("2026-11-30T13:30:00.000Z");
  });

  it("rolls over a midnight that starts summer time", () => {
    const above = utc("2026-03-28T22:00:00Z"); // 23:00 CET on Saturday 28 March
    expect(readTypedTime("08:00", zone, { after: above })?.toISOString()).toBe("2026-03-29T06:00:00.000Z"); // 08:00 CEST
  });

  it("with no reading above, takes the day of the row's own time", () => {
    expect(readTypedTime("06:15", zone, { day: utc("2026-11-30T20:00:00Z") })?.toISOString()).toBe("2026-11-30T05:15:00.000Z");
  });

  it("refuses what is not a time", () => {
    for (const text of ["", "lots", "25:00", "14:60", "2026-02-30 10:00", "2026-11-30", "1430"]) expect(readTypedTime(text, zone, { after: utc("2026-11-30T12:00:00Z") }), text).toBeNull();
  });

  it("shows an instant as typed, seconds only when there are some", () => {
    expect(formatTypedTime(utc("2026-11-30T13:30:00Z"), zone)).toBe("2026-11-30 14:30");
    expect(formatTypedTime(utc("2026-11-30T13:30:15Z"), zone)).toBe("2026-11-30 14:30:15");
  });
});
