import "server-only";
import ExcelJS from "exceljs";

/** A column of an exported sheet: its header names the unit, e.g. "Head (kPa)". */
export type SheetColumn<T> = { header: string; value: (row: T) => string | number | boolean | Date | null; width?: number; numFmt?: string };

export const DATE_TIME_FORMAT = "yyyy-mm-dd hh:mm:ss";
/** Scientific with three decimals: fluxes and conductivities (2.345E-09) keep their magnitude readable. */
export const SCIENTIFIC_FORMAT = "0.000E+00";

export function newWorkbook(): ExcelJS.Workbook {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = "Seepline";
  workbook.created = new Date();
  return workbook;
}

/**
 * A sheet with a bold, frozen header row and one row per item. Numbers stay numbers and times stay dates
 * (exceljs writes a Date as a spreadsheet date, from its UTC instant); text that a spreadsheet would run as a
 * formula is written as text all the same, since exceljs stores strings as strings.
 */
export function addSheet<T>(workbook: ExcelJS.Workbook, name: string, columns: ReadonlyArray<SheetColumn<T>>, rows: readonly T[]): ExcelJS.Worksheet {
  const sheet = workbook.addWorksheet(name, { views: [{ state: "frozen", ySplit: 1 }] });
  sheet.columns = columns.map((c) => ({ header: c.header, width: c.width ?? Math.max(12, Math.min(40, c.header.length + 2)), style: c.numFmt ? { numFmt: c.numFmt } : {} }));
  sheet.getRow(1).font = { bold: true };
  for (const row of rows) sheet.addRow(columns.map((c) => c.value(row) ?? null));
  return sheet;
}

export async function workbookBuffer(workbook: ExcelJS.Workbook): Promise<Buffer> {
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

export const XLSX_TYPE = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

/** The response of an XLSX download. */
export function xlsxResponse(buffer: Buffer, fileName: string): Response {
  return new Response(new Uint8Array(buffer), {
    headers: { "Content-Type": XLSX_TYPE, "Content-Disposition": `attachment; filename="${fileName}"`, "Cache-Control": "private, no-store" },
  });
}
