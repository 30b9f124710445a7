import { describe, expect, it } from "vitest";
import { readPastedRolls } from "@/lib/custody/pasted-rolls";
import { readYesNo } from "@/lib/custody/yes-no";
import { rollEntrySchema } from "@/lib/validation/intake";

describe("yes-or-no cells", () => {
  it("reads yes/no, y/n, true/false and 1/0 in any case, a blank as no, and nothing else", () => {
    for (const yes of ["yes", "YES", " y ", "True", "1"]) expect(readYesNo(yes), yes).toBe(true);
    for (const no of ["no", "No", "n", "FALSE", "0", "", "  "]) expect(readYesNo(no), JSON.stringify(no)).toBe(false);
    for (const other of ["maybe", "x", "marked", "2", "yes please", "-"]) expect(readYesNo(other), other).toBeNull();
    expect(readYesNo(true)).toBe(true);
    expect(readYesNo(undefined)).toBe(false);
  });

  it("never stores a roll as marked when its cell says no, and refuses an unknown word", () => {
    const base = { rollNumber: "R1", lotNumber: "L1", product: "GCL", manufacturer: "M" };
    expect(rollEntrySchema.parse({ ...base, machineDirectionMarked: "no" }).machineDirectionMarked).toBe(false);
    expect(rollEntrySchema.parse({ ...base, machineDirectionMarked: "Y" }).machineDirectionMarked).toBe(true);
    const refused = rollEntrySchema.safeParse({ ...base, machineDirectionMarked: "marked" });
    expect(refused.success).toBe(false);
  });
});

describe("rolls pasted from a spreadsheet", () => {
  it("turns the yes-or-no column into true and false and keeps each roll's condition", () => {
    const text = ["Roll\tLot\tProduct\tManufacturer\tMD marked\tCondition", "R-1\tL1\tGCL\tM\tno\tDry", "R-2\tL1\tGCL\tM\tY\tTorn wrapping"].join("\n");
    const { rolls, problems } = readPastedRolls(text);
    expect(problems).toEqual([]);
    expect(rolls.map((r) => [r.rollNumber, r.machineDirectionMarked, r.conditionNotes])).toEqual([["R-1", false, "Dry"], ["R-2", true, "Torn wrapping"]]);
  });

  it("refuses a cell that is neither, naming the pasted row and the column", () => {
    const text = ["R-1\tL1\tGCL\tM\t1000\t1200\tyes", "R-2\tL1\tGCL\tM\t1000\t1200\tmaybe", "R-3\tL1\tGCL\tM\t1000\t1200\tx"].join("\n");
    expect(readPastedRolls(text).problems).toEqual([
      'Pasted row 2, column "MD marked": "maybe" is not a yes or no; write yes/no, y/n, true/false or 1/0.',
      'Pasted row 3, column "MD marked": "x" is not a yes or no; write yes/no, y/n, true/false or 1/0.',
    ]);
  });
});
