import { describe, expect, it } from "vitest";
import { parsePastedRows } from "@/lib/custody/paste-grid";
import { ROLL_PASTE_COLUMNS, rollEntrySchema } from "@/lib/validation/intake";
import { checklistFor } from "@/lib/custody/preparation-checklists";

describe("paste grid", () => {
  it("reads tab-separated rows in column order and skips blank lines", () => {
    const text = "R-1\tL-9\tGCL A\tMaker\t1000\t1200\tyes\n\nR-2\tL-9\tGCL A\tMaker\t\t\tno\r\n";
    const { rows, headerUsed } = parsePastedRows(text, ROLL_PASTE_COLUMNS);
    expect(headerUsed).toBe(false);
    expect(rows.map((r) => r.line)).toEqual([1, 3]);
    expect(rows[0]!.cells).toMatchObject({ rollNumber: "R-1", lotNumber: "L-9", sampleLengthMm: "1000", machineDirectionMarked: "yes" });
    expect(rollEntrySchema.parse(rows[0]!.cells)).toMatchObject({ sampleLengthMm: 1000, sampleWidthMm: 1200, machineDirectionMarked: true });
    expect(rollEntrySchema.parse(rows[1]!.cells)).toMatchObject({ sampleLengthMm: undefined, machineDirectionMarked: false });
  });

  it("uses a header row to put the columns in any order", () => {
    const text = "Lot no\tRoll #\tManufacturer\tProduct\nL-1\tR-7\tMaker\tGCL B";
    const { rows, headerUsed } = parsePastedRows(text, ROLL_PASTE_COLUMNS);
    expect(headerUsed).toBe(true);
    expect(rows).toHaveLength(1);
    expect(rows[0]!.cells).toMatchObject({ rollNumber: "R-7", lotNumber: "L-1", product: "GCL B", manufacturer: "Maker" });
    expect(rows[0]!.line).toBe(2);
  });

  it("reads a comma-separated paste with quoted commas", () => {
    const { rows } = parsePastedRows('R-3,L-2,"GCL, needle-punched",Maker', ROLL_PASTE_COLUMNS);
    expect(rows[0]!.cells.product).toBe("GCL, needle-punched");
  });

  it("reports a bad row's field in plain words", () => {
    const { rows } = parsePastedRows("R-4\t\tGCL\tMaker\t-5", ROLL_PASTE_COLUMNS);
    const result = rollEntrySchema.safeParse(rows[0]!.cells);
    expect(result.success).toBe(false);
    const messages = Object.fromEntries(result.error!.issues.map((i) => [i.path.join("."), i.message]));
    expect(messages.lotNumber).toBe("Enter the lot number.");
    expect(messages.sampleLengthMm).toBe("The sample length (mm) must be more than 0.");
  });
});

describe("preparation checklists", () => {
  it("asks about side-wall leakage for every method and about the permeant for D6766", () => {
    for (const code of ["D5887", "D5084", "D6766"]) expect(checklistFor(code).map((i) => i.key)).toContain("edges-sealed");
    expect(checklistFor("D6766").map((i) => i.key)).toContain("permeant-prepared");
    expect(checklistFor("D5887").map((i) => i.key)).not.toContain("permeant-prepared");
    expect(() => checklistFor("X1")).toThrow(/no preparation checklist/);
  });
});
