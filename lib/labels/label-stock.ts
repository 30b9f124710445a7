/**
 * The label stock the sheet is laid out for: A4 with 3 × 7 labels of 63.5 × 38.1 mm, the common
 * "21 per sheet" office stock (dimensions as printed on such stock; common practice). All in mm.
 */
export const LABEL_STOCK = {
  pageWidthMm: 210,
  pageHeightMm: 297,
  labelWidthMm: 63.5,
  labelHeightMm: 38.1,
  columns: 3,
  rows: 7,
  columnGapMm: 2.5,
  marginTopMm: 15.15,
  marginLeftMm: 7.25,
} as const;

export const LABELS_PER_SHEET = LABEL_STOCK.columns * LABEL_STOCK.rows;

/** Splits items into printed sheets of LABELS_PER_SHEET, in order; no sheet when there are no items. */
export function splitIntoSheets<T>(items: readonly T[], perSheet: number = LABELS_PER_SHEET): T[][] {
  if (!Number.isInteger(perSheet) || perSheet < 1) throw new RangeError(`perSheet must be a positive integer, got ${perSheet}`);
  const sheets: T[][] = [];
  for (let i = 0; i < items.length; i += perSheet) sheets.push(items.slice(i, i + perSheet));
  return sheets;
}
