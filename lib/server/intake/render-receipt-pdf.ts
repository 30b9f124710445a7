import "server-only";
import { createElement } from "react";
import { ReceiptDocument } from "@/components/documents/receipt-document";
import type { Letterhead } from "../lab/get-letterhead";
import { renderDocumentHtml } from "../pdf/render-document-html";
import { renderPdf } from "../pdf/render-pdf";
import type { ShipmentReceipt } from "./get-shipment-receipt";

/** The receipt acknowledgement (from getShipmentReceipt, which checks who may see it) as an A4 PDF. */
export async function renderReceiptPdf(options: { receipt: ShipmentReceipt; lab: Letterhead }): Promise<Buffer> {
  const html = renderDocumentHtml(createElement(ReceiptDocument, options));
  return renderPdf({ html, title: `Receipt of samples ${options.receipt.labNumber} · ${options.lab.name}` });
}
