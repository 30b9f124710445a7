/**
 * The certificate's own look, on top of DOCUMENT_CSS (letterhead, tables, boxes): an identity panel with
 * the number, revision and date, results with their verdicts, and blocks kept whole across page breaks.
 */
export const CERTIFICATE_CSS = `
.cert h2 { border-bottom: 0.6pt solid #d9d5cb; padding-bottom: 2pt; break-after: avoid; }
.cert h3 { font-size: 9.5pt; margin: 10pt 0 4pt; break-after: avoid; }
.cert-head { display: grid; grid-template-columns: 1fr auto; gap: 14pt; align-items: start; margin-bottom: 10pt; }
.cert-kicker { font-size: 7.5pt; letter-spacing: 0.05em; text-transform: uppercase; color: #9a5b2f; font-weight: 700; }
.cert-head h1 { font-size: 14pt; margin-top: 2pt; }
.cert-head .doc-small { margin-top: 3pt; }
.cert-identity { display: grid; grid-template-columns: auto auto auto; border: 1pt solid #1d2a30; border-left: 4pt solid #1f6f78; }
.cert-identity > div { padding: 4pt 8pt; border-left: 0.6pt solid #d9d5cb; }
.cert-identity > div:first-child { border-left: none; }
.cert-identity .cert-label { font-size: 6.5pt; text-transform: uppercase; letter-spacing: 0.08em; color: #4f5f66; }
.cert-identity .cert-value { font-family: "DejaVu Sans Mono", "Liberation Mono", monospace; font-size: 11pt; font-weight: 700; white-space: nowrap; }
.cert-identity .cert-number { font-size: 13pt; }
.cert-supersedes { border-left: 3pt solid #8a5a00; }
.cert-verdict { display: inline-block; font-size: 7pt; font-weight: 700; letter-spacing: 0.05em; text-transform: uppercase; padding: 0.5pt 4pt; border-radius: 2pt; white-space: nowrap; }
.cert-pass { background: #e3f1e5; color: #2f6b3a; border: 0.6pt solid #b7d8bd; }
.cert-fail { background: #fbe4e2; color: #a12a2a; border: 0.6pt solid #e9b6b1; }
.cert-none { background: #f1efe9; color: #4f5f66; border: 0.6pt solid #d9d5cb; }
.cert td.num, .cert th.num { text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }
.cert-test { margin-top: 16pt; }
.cert-test-head { display: flex; justify-content: space-between; align-items: baseline; gap: 10pt; border-bottom: 1.2pt solid #1f6f78; padding-bottom: 2pt; margin-bottom: 6pt; break-after: avoid; }
.cert-test-head h2 { border: none; margin: 0; padding: 0; }
.cert-test-ids { font-size: 7.5pt; color: #4f5f66; text-align: right; }
.cert-two { display: grid; grid-template-columns: 3fr 2fr; gap: 14pt; break-inside: avoid; }
.cert-conditions { display: grid; grid-template-columns: max-content 1fr; gap: 1.5pt 10pt; margin: 0; font-size: 8pt; }
.cert-conditions dt { color: #4f5f66; }
.cert-conditions dd { margin: 0; overflow-wrap: anywhere; }
.cert-decision { border: 0.8pt solid #d9d5cb; border-radius: 3pt; padding: 5pt 7pt; margin-top: 6pt; break-inside: avoid; font-size: 8pt; }
.cert-decision p { margin: 3pt 0 0; }
.cert-decision-numbers { display: grid; grid-template-columns: auto auto 1fr; gap: 2pt 16pt; margin: 3pt 0 0; }
.cert-decision-numbers dt { font-size: 6.5pt; text-transform: uppercase; letter-spacing: 0.05em; color: #4f5f66; }
.cert-decision-numbers dd { margin: 0; }
.cert-figure { margin: 8pt 0 0; break-inside: avoid; }
.cert-figure figcaption { font-size: 7.5pt; color: #4f5f66; margin-bottom: 3pt; }
.cert-panels { display: grid; grid-template-columns: 1fr 1fr; gap: 10pt; }
.cert-panels svg { width: 100%; height: auto; display: block; }
.cert-custody { margin-top: 6pt; break-inside: auto; }
.cert-custody caption { text-align: left; font-size: 8pt; font-weight: 700; padding: 4pt 0 2pt; caption-side: top; }
.cert-close { break-inside: avoid; margin-top: 16pt; }
.cert-close-grid { display: grid; grid-template-columns: 1fr 1.3fr; gap: 12pt; }
.cert-close-grid .doc-box { margin-top: 0; }
.cert-sign-name { font-size: 11pt; font-weight: 700; }
.cert-verify { display: grid; grid-template-columns: 25mm 1fr; gap: 8pt; align-items: center; }
.cert-qr { width: 25mm; height: 25mm; }
.cert-qr svg { width: 100%; height: 100%; display: block; }
.cert-code { font-family: "DejaVu Sans Mono", "Liberation Mono", monospace; font-size: 11pt; font-weight: 700; letter-spacing: 0.04em; white-space: nowrap; }
.cert-url { font-family: "DejaVu Sans Mono", "Liberation Mono", monospace; font-size: 6.5pt; overflow-wrap: break-word; }
.cert-statements { margin-top: 10pt; border-top: 1.2pt solid #1d2a30; padding-top: 5pt; }
.cert-statements p { margin: 0 0 3pt; font-size: 8pt; }
.cert-statements strong { font-weight: 700; }
`;
