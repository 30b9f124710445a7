import { describe, expect, it } from "vitest";
import { applyReadingsMapping, checkReadingsMapping, parseDateTimeCell, parseReadingsCsv, suggestReadingsMapping, type ReadingsCsvMapping } from "@/lib/readings/readings-csv";

// psi -> Pa: lbf/in^2 = 4.4482216152605 N / (0.0254 m)^2 = 6894.757293168361 Pa (NIST SP 811, Appendix B).
const PSI_PA = 6894.757293168361;

const GOOD = [
  "Date/Time,Elapsed (h),Inflow burette (mm),Outflow burette (mm),Influent kPa,Effluent kPa,Cell kPa,Temp °C",
  "2026-03-02 08:00,0,452.0,18.0,530,516,565,20.0",
  "2026-03-02 14:00,6,435.0,33.0,530,516,565,20.1",
].join("\n");

describe("reading a data-logger CSV", () => {
  it("reads a comma-separated file with a header, counting rows as a spreadsheet does", () => {
    const parsed = parseReadingsCsv(GOOD);
    expect(parsed.separator).toBe(",");
    expect(parsed.header).toHaveLength(8);
    expect(parsed.rows.map((r) => r.row)).toEqual([2, 3]);
  });

  it("suggests the mapping from header names and prefers elapsed time over the logger's clock", () => {
    const parsed = parseReadingsCsv(GOOD);
    expect(suggestReadingsMapping(parsed)).toEqual({
      columns: ["ignore", "elapsed", "inflowLevelMm", "outflowLevelMm", "influentPressure", "effluentPressure", "cellPressure", "temperatureC"],
      elapsedUnit: "h",
      pressureUnit: "KPA",
    });
  });

  it("recognises the usual header words, EC and pH, psi and minutes", () => {
    const header = ["Time", "Inflow", "Outflow", "In psi", "Out psi", "Cell psi", "Temperature", "EC in", "EC out", "pH in", "pH out"];
    const mapping = suggestReadingsMapping({ header, rows: [{ row: 2, cells: ["90", "1", "1", "1", "1", "1", "20", "1", "1", "7", "7"] }] });
    expect(mapping.columns).toEqual(["elapsed", "inflowLevelMm", "outflowLevelMm", "influentPressure", "effluentPressure", "cellPressure", "temperatureC", "influentEcMsPerM", "effluentEcMsPerM", "influentPh", "effluentPh"]);
    expect(mapping.pressureUnit).toBe("PSI");
    expect(suggestReadingsMapping({ header: ["Elapsed (min)"], rows: [] }).elapsedUnit).toBe("min");
    expect(suggestReadingsMapping({ header: ["Time"], rows: [{ row: 2, cells: ["2026-03-02 08:00"] }] }).columns).toEqual(["takenAt"]);
  });

  it("reads semicolons with decimal commas and quoted cells, and converts psi exactly", () => {
    const text = 'Zeit (h);Inflow (mm);Outflow (mm);Influent psi;Effluent psi;"Temp, °C"\n0;"452,5";18,0;76,9;74,9;20,5\n';
    const parsed = parseReadingsCsv(text);
    expect(parsed.separator).toBe(";");
    const mapping: ReadingsCsvMapping = { columns: ["elapsed", "inflowLevelMm", "outflowLevelMm", "influentPressure", "effluentPressure", "temperatureC"], elapsedUnit: "h", pressureUnit: "PSI" };
    expect(checkReadingsMapping(parsed.header, mapping)).toEqual([]);
    const [row] = applyReadingsMapping(parsed, mapping);
    expect(row!.errors).toEqual([]);
    expect(row!.values).toMatchObject({ elapsedS: 0, inflowLevelMm: 452.5, outflowLevelMm: 18, temperatureC: 20.5 });
    expect(row!.values!.influentPressurePa).toBeCloseTo(76.9 * PSI_PA, 6);
  });

  it("names the row and column of a cell that is not a number, is empty, or is impossible", () => {
    const text = GOOD + "\n2026-03-02 20:00,12,abc,45.8,530,516,565,\n2026-03-03 02:00,18,408.6,57.7,-3,516,565,20.3";
    const parsed = parseReadingsCsv(text);
    const rows = applyReadingsMapping(parsed, suggestReadingsMapping(parsed));
    expect(rows[2]!.values).toBeNull();
    expect(rows[2]!.errors.map((e) => e.message)).toEqual([
      'Row 4, column "Inflow burette (mm)" (inflow burette level (mm)): "abc" is not a number.',
      'Row 4, column "Temp °C" (temperature (°C)): the cell is empty; every reading needs it.',
    ]);
    expect(rows[3]!.errors).toEqual([{ row: 5, field: "influentPressure", message: 'Row 5, column "Influent kPa" (influent pressure): -3 is below 0, which is not possible.' }]);
  });

  it("names a row with the wrong number of cells", () => {
    const parsed = parseReadingsCsv(GOOD + "\n2026-03-02 20:00,12,421.2,45.8,530,516\n");
    const rows = applyReadingsMapping(parsed, suggestReadingsMapping(parsed));
    expect(rows[2]!.errors).toEqual([{ row: 4, field: "row", message: "Row 4 has 6 cells but the header has 8 columns; check for a missing or extra separator." }]);
  });

  it("says which column is missing or chosen twice", () => {
    const header = ["Elapsed (h)", "Inflow", "Outflow", "Influent kPa", "Effluent kPa"];
    expect(checkReadingsMapping(header, { columns: ["elapsed", "inflowLevelMm", "inflowLevelMm", "influentPressure", "effluentPressure"], elapsedUnit: "h", pressureUnit: "KPA" })).toEqual([
      'Columns "Inflow" and "Outflow" are all mapped to inflow burette level (mm); choose one.',
      "No column is mapped to the outflow burette level (mm), which every reading needs.",
      "No column is mapped to the temperature (°C), which every reading needs.",
    ]);
    expect(checkReadingsMapping(header, { columns: ["ignore", "inflowLevelMm", "outflowLevelMm", "influentPressure", "temperatureC"], elapsedUnit: "h", pressureUnit: "KPA" })).toContain(
      "No column is mapped to the time: choose the date-and-time or the elapsed-time column.",
    );
  });

  it("reads ISO and day-first dotted date-times as local time and refuses slashed dates", () => {
    expect(parseDateTimeCell("2026-03-02 08:30")).toEqual(new Date(2026, 2, 2, 8, 30));
    expect(parseDateTimeCell("02.03.2026 08:30:15")).toEqual(new Date(2026, 2, 2, 8, 30, 15));
    expect(parseDateTimeCell("2026-03-02T08:30:00Z")).toEqual(new Date(Date.UTC(2026, 2, 2, 8, 30)));
    expect(parseDateTimeCell("03/02/2026 08:30")).toMatch(/ambiguous/);
    expect(parseDateTimeCell("2026-02-30 08:00")).toBe("is not a real date and time");
  });
});
