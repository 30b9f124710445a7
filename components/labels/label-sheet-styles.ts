import { LABEL_STOCK as S } from "@/lib/labels/label-stock";

/**
 * The label sheet's layout, as CSS text so the app page and the PDF (which has no bundler) share it.
 * Sizes come from the label stock, in mm; on screen each sheet is drawn as a sheet of paper.
 */
export const LABEL_SHEET_CSS = `
@page { size: A4; margin: ${S.marginTopMm}mm ${S.marginLeftMm}mm; }
.label-sheet { font-family: "DejaVu Sans", "Liberation Sans", sans-serif; color: #000; }
.label-sheet * { box-sizing: border-box; }
.label-page { display: grid; grid-template-columns: repeat(${S.columns}, ${S.labelWidthMm}mm); grid-auto-rows: ${S.labelHeightMm}mm; column-gap: ${S.columnGapMm}mm; align-content: start; break-after: page; }
.label-page:last-child { break-after: auto; }
.label { display: grid; grid-template-columns: 24mm 1fr; column-gap: 2mm; align-items: center; padding: 2mm 2.5mm 2mm 2mm; overflow: hidden; break-inside: avoid; }
.label-code { width: 24mm; height: 24mm; }
.label-code svg { display: block; width: 100%; height: 100%; }
.label-text { min-width: 0; display: flex; flex-direction: column; gap: 0.8mm; }
.label-kind { font-size: 6.5pt; text-transform: uppercase; letter-spacing: 0.08em; color: #333; }
.label-number { font-family: "DejaVu Sans Mono", "Liberation Mono", monospace; font-size: 13pt; font-weight: 700; letter-spacing: -0.02em; white-space: nowrap; line-height: 1.1; }
.label-description { font-size: 6.5pt; line-height: 1.25; overflow-wrap: anywhere; display: -webkit-box; -webkit-line-clamp: 3; -webkit-box-orient: vertical; overflow: hidden; }
.label-lab { font-size: 5.5pt; color: #444; white-space: nowrap; overflow: hidden; text-overflow: ellipsis; }
@media screen {
  .label-page { width: ${S.pageWidthMm}mm; min-height: ${S.pageHeightMm}mm; padding: ${S.marginTopMm}mm ${S.marginLeftMm}mm; background: #fff; box-shadow: 0 2px 12px rgba(29, 42, 48, 0.15); margin: 0 0 1.5rem; }
  .label { outline: 1px dashed #c9c4b8; outline-offset: -1px; }
}
`;
