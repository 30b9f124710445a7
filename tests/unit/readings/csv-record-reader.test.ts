import { describe, expect, it } from "vitest";
import { CsvRecordReader } from "@/lib/readings/csv-record-reader";

const TRICKY = '\uFEFFTime;"Inflow; mm";Note\r\n0;452,0;"said ""hi""\r\nover two lines"\r\n\r\n1;451,5;\r2;451,0;refill\n3;450,5;';

function readAll(pieces: string[]) {
  const reader = new CsvRecordReader();
  const records = pieces.flatMap((p) => reader.push(p));
  return { separator: reader.separator, records: [...records, ...reader.end()] };
}

// Expected values follow from the CSV conventions of RFC 4180 (quotes doubled inside quoted cells) and the
// spreadsheet's row numbering (header = row 1, blank lines counted).
describe("CsvRecordReader: a CSV read in pieces", () => {
  it("splits quoted cells, doubled quotes, line breaks in quotes and every kind of line end", () => {
    expect(readAll([TRICKY])).toEqual({
      separator: ";",
      records: [
        { line: 1, cells: ["Time", "Inflow; mm", "Note"] },
        { line: 2, cells: ["0", "452,0", 'said "hi"\nover two lines'] },
        { line: 5, cells: ["1", "451,5", ""] },
        { line: 6, cells: ["2", "451,0", "refill"] },
        { line: 7, cells: ["3", "450,5", ""] },
      ],
    });
  });

  it("gives the same records wherever the text is cut, even between CR and LF or inside a quote", () => {
    const whole = readAll([TRICKY]);
    for (let cut = 0; cut <= TRICKY.length; cut++) expect(readAll([TRICKY.slice(0, cut), TRICKY.slice(cut)])).toEqual(whole);
    expect(readAll(TRICKY.split(""))).toEqual(whole);
  });

  it("returns nothing for an empty or blank text", () => {
    expect(readAll(["", "\n\n  \n"]).records).toEqual([]);
  });
});
