/**
 * The look of printed documents (receipts now, certificates later), scoped under `.doc` so the same
 * component renders alike inside the app and in the PDF. Plain CSS text: a PDF page has no bundler.
 */
export const DOCUMENT_CSS = `
@page { size: A4; margin: 14mm 14mm 16mm; }
.doc { font-family: "DejaVu Sans", "Liberation Sans", sans-serif; color: #1d2a30; font-size: 9pt; line-height: 1.4; background: #fff; position: relative; }
.doc * { box-sizing: border-box; }
.doc h1 { font-size: 15pt; margin: 0; letter-spacing: 0.01em; }
.doc h2 { font-size: 10.5pt; margin: 14pt 0 5pt; color: #1f6f78; }
.doc p { margin: 0 0 6pt; }
.doc .mono { font-family: "DejaVu Sans Mono", "Liberation Mono", monospace; }
.doc-letterhead { display: flex; justify-content: space-between; align-items: flex-end; gap: 12pt; border-bottom: 2pt solid #9a5b2f; padding-bottom: 6pt; margin-bottom: 12pt; }
.doc-lab-name { font-size: 13pt; font-weight: 700; }
.doc-lab-address { color: #4f5f66; font-size: 8.5pt; white-space: pre-line; }
.doc-lab-accreditation { color: #4f5f66; font-size: 7.5pt; text-align: right; max-width: 45%; }
.doc-title { display: flex; justify-content: space-between; align-items: baseline; gap: 12pt; margin-bottom: 8pt; }
.doc-amended { color: #9a3b1f; font-size: 11pt; text-transform: uppercase; letter-spacing: 0.05em; }
.doc-number { font-family: "DejaVu Sans Mono", "Liberation Mono", monospace; font-size: 13pt; font-weight: 700; white-space: nowrap; }
.doc-facts { display: grid; grid-template-columns: 1fr 1fr; gap: 5pt 18pt; margin: 0; }
.doc-facts div { break-inside: avoid; }
.doc-facts dt { color: #4f5f66; font-size: 7.5pt; text-transform: uppercase; letter-spacing: 0.06em; }
.doc-facts dd { margin: 0; overflow-wrap: anywhere; }
.doc-facts .doc-wide { grid-column: 1 / -1; }
.doc-muted { color: #4f5f66; }
.doc table { width: 100%; border-collapse: collapse; font-size: 8pt; }
.doc thead { display: table-header-group; }
.doc th { text-align: left; font-weight: 700; border-bottom: 1.2pt solid #1d2a30; padding: 3pt 4pt; vertical-align: bottom; }
.doc td { border-bottom: 0.6pt solid #d9d5cb; padding: 3pt 4pt; vertical-align: top; overflow-wrap: break-word; }
.doc tr { break-inside: avoid; }
.doc td.nowrap, .doc th.nowrap, .doc dd.nowrap { white-space: nowrap; overflow-wrap: normal; }
.doc-box { border: 0.8pt solid #d9d5cb; border-radius: 3pt; padding: 6pt 8pt; margin-top: 12pt; break-inside: avoid; }
.doc-box-warn { border-color: #ecd08a; background: #fff3d6; color: #5c3d00; }
.doc-keep { break-inside: avoid; }
.doc-signoff { display: grid; grid-template-columns: 1fr 1fr; gap: 18pt; }
.doc-small { font-size: 7.5pt; color: #4f5f66; }
/* Decoration (WCAG 1.4.3 asks no contrast of it): drawn from an attribute, so it is not text of the page. */
.doc-watermark::after { content: attr(data-watermark); }
.doc-watermark { position: absolute; top: 38%; left: 0; right: 0; text-align: center; font-size: 30pt; font-weight: 700; color: rgba(161, 42, 42, 0.11); transform: rotate(-28deg); pointer-events: none; white-space: nowrap; }
@media print { .doc-watermark { position: fixed; top: 45%; } }
`;
