import { describe, expect, it } from "vitest";
import { auditCsvLines, type AuditEntry } from "@/lib/audit/audit-entry";
import { auditFieldSpec } from "@/lib/audit/audit-fields";
import { auditOwner } from "@/lib/audit/audit-owner";
import { auditTableLabel, wordsOf } from "@/lib/audit/audit-tables";
import { auditOperationWords, auditRowRefs, describeAuditChanges, replacedRowId, type AuditRowInput } from "@/lib/audit/describe-audit-change";
import { cleanNumber, formatAuditTime } from "@/lib/audit/format-audit-value";
import { auditFilterSchema, auditSearch, readAuditFilterText } from "@/lib/validation/audit";

// Ids resolve to invented lab numbers and names, as the server's look-up would.
const NAMES: Record<string, string> = { "user:u-bram": "Bram Oyelaran", "run:run-1": "T26-00004", "location:loc-2": "HUMID-1" };
const ctx = { pressureUnit: "KPA" as const, refLabel: (ref: string, id: string) => NAMES[`${ref}:${id}`] };
const changes = (row: AuditRowInput, pressureUnit: "KPA" | "PSI" = "KPA") => describeAuditChanges(row, { ...ctx, pressureUnit }).map((c) => `${c.label}: ${c.old ?? "∅"} → ${c.new ?? "∅"}`);

const stage = { id: "st-1", runId: "run-1", sequence: 2, kind: "PERMEATION", cellPressurePa: 552000, influentPressurePa: 531000, effluentPressurePa: 517000, startedAt: "2026-11-27T08:00:00", endedAt: null, marginAcknowledged: false, recordedById: "u-bram", createdAt: "2026-11-27T08:01:12.345" };
const reading = { id: "rd-1", runId: "run-1", sequence: 4, takenAt: "2026-11-28T02:00:00", elapsedS: 64800, inflowLevelMm: 431.5, outflowLevelMm: 39.2, inflowCumulativeMl: 0.64, outflowCumulativeMl: 0.66, headPa: 14000, temperatureC: 20.1, correctsId: null, correctionReason: null, source: "manual", recordedById: "u-bram", createdAt: "2026-11-28T02:03:00" };

describe("an audit row in words", () => {
  it("lists what an insert set: pressures in the person's unit, times in UTC, states in words, ids as names; the owner key and bookkeeping left out", () => {
    const row = { tableName: "RunStage", operation: "INSERT", before: null, after: stage };
    expect(changes(row)).toEqual([
      "Cell pressure: ∅ → 552 kPa", "Effluent pressure: ∅ → 517 kPa", "Influent pressure: ∅ → 531 kPa", "Kind: ∅ → Permeation",
      "Margin acknowledged: ∅ → no", "Recorded by: ∅ → Bram Oyelaran", "Sequence: ∅ → 2", "Started at: ∅ → 2026-11-27 08:00:00 UTC",
    ]);
    // 552 kPa / 6.894757293168361 kPa/psi (NIST SP 811, the factor lib/hydraulics uses) = 80.06083... psi.
    expect(changes(row, "PSI")[0]).toBe(`Cell pressure: ∅ → ${Number((552 / 6.894757293168361).toPrecision(10))} psi`);
    expect(auditOperationWords(row)).toBe("recorded");
  });

  it("lists only the changed columns of an update, old and new; the lock version and update time are not changes", () => {
    const before = { id: "run-1", labNumber: "T26-00004", state: "PERMEATING", terminatedAt: null, version: 3, updatedAt: "2026-11-28T00:00:00" };
    const after = { ...before, state: "TERMINATED", terminatedAt: "2026-11-30T16:45:07.5", version: 4, updatedAt: "2026-11-30T16:45:07.5" };
    expect(changes({ tableName: "Run", operation: "UPDATE", before, after })).toEqual(["State: Permeating → Terminated", "Terminated at: — → 2026-11-30 16:45:07 UTC"]);
  });

  it("lists what a delete removed", () => {
    const row = { tableName: "StorageLocation", operation: "DELETE", before: { id: "loc-9", code: "SHELF-9", name: "Temporary shelf", active: true }, after: null };
    expect(changes(row)).toEqual(["Active: yes → ∅", "Code: SHELF-9 → ∅", "Name: Temporary shelf → ∅"]);
    expect(auditOperationWords(row)).toBe("removed");
  });

  it("shows a correcting row against the row it replaces: the values that differ, old and new, then the reason", () => {
    const correction = { ...reading, id: "rd-2", inflowLevelMm: 430.5, inflowCumulativeMl: 0.671, temperatureC: 20.4, correctsId: "rd-1", correctionReason: "Misread the scale", recordedById: "u-signe", createdAt: "2026-11-29T09:00:00" };
    const row: AuditRowInput = { tableName: "Reading", operation: "INSERT", before: null, after: correction, replaces: reading };
    expect(replacedRowId(row)).toBe("rd-1");
    expect(auditOperationWords(row)).toBe("corrected");
    expect(changes(row)).toEqual([
      "Inflow burette level: 431.5 mm → 430.5 mm", "Inflow volume, cumulative: 0.64 mL → 0.671 mL", "Temperature: 20.1 °C → 20.4 °C",
      "Reason for the correction: ∅ → Misread the scale",
    ]);
    // Without the original to compare with, it reads as the insert it is.
    expect(changes({ ...row, replaces: null })).toContain("Elapsed time: ∅ → 18 h");
  });

  it("never shows a secret, whatever the row carries, and hides a column added later whose name says it is one", () => {
    const before = { name: "A", passwordHash: "$2b$x", tokenHash: "t", data: "AAAA", pdf: "JVBE", apiSecret: "s", passwordChangedAt: "2026-01-01T00:00:00" };
    const after = { ...before, name: "B", passwordHash: "$2b$y", tokenHash: "u", data: "BBBB", pdf: "JVBF", apiSecret: "r", passwordChangedAt: "2026-02-01T00:00:00" };
    expect(changes({ tableName: "User", operation: "UPDATE", before, after })).toEqual(["Name: A → B", "Password changed at: 2026-01-01 00:00:00 UTC → 2026-02-01 00:00:00 UTC"]);
  });

  it("shows a column it has never heard of by the unit in its name", () => {
    expect(auditFieldSpec("Run", "postTestSwellMm")).toMatchObject({ label: "Post test swell", kind: "number", unit: "mm" });
    expect(changes({ tableName: "Run", operation: "UPDATE", before: { postTestSwellMm: null }, after: { postTestSwellMm: 0.1 + 0.2 } })).toEqual(["Post test swell: — → 0.3 mm"]);
    expect(auditFieldSpec("Run", "hydrationHoldPa").kind).toBe("pressure");
    expect(auditFieldSpec("NewTable", "checkedById")).toMatchObject({ label: "Checked by", kind: "ref", ref: "user" });
  });

  it("names the record each row belongs to, and which part of it", () => {
    expect(auditOwner("Reading", reading)).toEqual({ record: { ref: "run", id: "run-1" }, part: "reading 4", keys: ["runId"] });
    expect(auditOwner("Run", { labNumber: "T26-00004" }).record).toEqual({ text: "T26-00004", href: "/runs/T26-00004" });
    expect(auditOwner("CustodyEvent", { specimenId: "sp-1", action: "TEST_STARTED" })).toMatchObject({ record: { ref: "specimen", id: "sp-1" }, part: "custody: test started" });
    expect(auditOwner("Correction", { entity: "Roll", entityId: "roll-1", field: "lotNumber" })).toMatchObject({ record: { ref: "roll", id: "roll-1" }, part: "correction of lot number" });
    expect(auditOwner("Equipment", { assetTag: "CELL-03" }).record).toEqual({ text: "CELL-03", href: "/equipment/CELL-03" });
    expect(auditOwner("SomeLaterTable", { runId: "run-1" })).toMatchObject({ record: { ref: "run", id: "run-1" }, part: "some later table" });
    // A settings version's number is what it is called by; elsewhere "version" is an edit counter, left out.
    expect(auditOwner("MethodSettingsVersion", { methodCode: "D5887", version: 2 }).record).toEqual({ text: "D5887 settings, version 2", href: null });
    expect([auditFieldSpec("MethodSettingsVersion", "version").kind, auditFieldSpec("Run", "version").kind]).toEqual(["plain", "hidden"]);
    expect(auditRowRefs({ tableName: "RunStage", operation: "INSERT", before: null, after: stage })).toEqual([{ ref: "run", id: "run-1" }, { ref: "run", id: "run-1" }, { ref: "user", id: "u-bram" }]);
  });

  it("words table names and values, and formats numbers and times without float noise", () => {
    expect(auditTableLabel("RunEquipment")).toBe("Instrument used in a run");
    expect(auditTableLabel("MethodSetting")).toBe("Method setting");
    expect(wordsOf("UNDER_TEST")).toBe("Under test");
    expect(cleanNumber(2.107918801839325e-9)).toBe("2.107918802e-9");
    expect(cleanNumber(441.2 - 0.0000000000001)).toBe("441.2");
    expect(formatAuditTime("2026-12-01T14:05:09.123")).toBe("2026-12-01 14:05:09 UTC");
    expect(formatAuditTime(new Date("2026-12-01T14:05:09.123Z"))).toBe("2026-12-01 14:05:09 UTC");
  });

  it("gives one spreadsheet line per changed value, and one with blank value cells when none is shown", () => {
    const entry: AuditEntry = {
      id: "812", occurredAt: new Date("2026-12-01T14:05:09.123Z"), person: "Bram Oyelaran", kind: "Reading", record: { text: "T26-00004", href: "/runs/T26-00004" },
      part: "reading 4", operation: "corrected", changes: [{ field: "temperatureC", label: "Temperature", old: "20.1 °C", new: "20.4 °C" }, { field: "correctionReason", label: "Reason for the correction", old: null, new: "Misread" }],
    };
    expect(auditCsvLines(entry)).toEqual([
      ["812", "2026-12-01 14:05:09", "Bram Oyelaran", "T26-00004", "reading 4", "Reading", "corrected", "Temperature", "20.1 °C", "20.4 °C"],
      ["812", "2026-12-01 14:05:09", "Bram Oyelaran", "T26-00004", "reading 4", "Reading", "corrected", "Reason for the correction", "", "Misread"],
    ]);
    expect(auditCsvLines({ ...entry, changes: [] })).toEqual([["812", "2026-12-01 14:05:09", "Bram Oyelaran", "T26-00004", "reading 4", "Reading", "corrected", "", "", ""]]);
  });
});

describe("the audit filter's schema and address", () => {
  it("refuses an end date before the start with a sentence on the end date, and accepts a one-day range", () => {
    const backwards = auditFilterSchema.safeParse({ from: "2026-12-02", to: "2026-12-01" });
    expect(backwards.success).toBe(false);
    expect(backwards.error!.issues).toEqual([expect.objectContaining({ path: ["to"], message: "The end date 2026-12-01 is before the start date 2026-12-02; nothing was searched." })]);
    expect(auditFilterSchema.parse({ from: "2026-12-01", to: "2026-12-01", record: " t26-00004 ", table: "", person: "" })).toEqual({
      record: "T26-00004", from: new Date("2026-12-01T00:00:00Z"), to: new Date("2026-12-01T00:00:00Z"), table: undefined, person: undefined,
    });
  });

  it("reads the filter keys of an address, and writes them back with a cursor", () => {
    const filter = readAuditFilterText(new URLSearchParams("record=T26-00004&table=reading&before=99&junk=1&from="));
    expect(filter).toEqual({ record: "T26-00004", table: "reading" });
    expect(auditSearch(filter, { before: "99" })).toBe("?record=T26-00004&table=reading&before=99");
    expect(auditSearch({})).toBe("");
  });
});
