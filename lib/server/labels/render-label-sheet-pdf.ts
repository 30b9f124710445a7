import "server-only";
import { createElement } from "react";
import { LabelSheetDocument } from "@/components/labels/label-sheet-document";
import { LABEL_STOCK } from "@/lib/labels/label-stock";
import { renderDocumentHtml } from "../pdf/render-document-html";
import { renderPdf } from "../pdf/render-pdf";
import type { PrintableLabel } from "./get-printable-labels";

const [vertical, horizontal] = [`${LABEL_STOCK.marginTopMm}mm`, `${LABEL_STOCK.marginLeftMm}mm`];

/** The label sheets as an A4 PDF, with the page margins of the label stock so labels land on it. */
export async function renderLabelSheetPdf(options: { labels: PrintableLabel[]; labName: string }): Promise<Buffer> {
  const html = renderDocumentHtml(createElement(LabelSheetDocument, options));
  return renderPdf({ html, title: `Labels · ${options.labName}`, margin: { top: vertical, bottom: vertical, left: horizontal, right: horizontal } });
}
