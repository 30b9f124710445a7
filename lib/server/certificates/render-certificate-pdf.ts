import "server-only";
import { createElement } from "react";
import { CertificateDocument, certificateTitle } from "@/components/documents/certificate-document";
import type { CertificateSnapshot } from "@/lib/certificates/certificate-snapshot";
import { qrCodeSvg } from "../labels/qr-code-svg";
import { renderDocumentHtml } from "../pdf/render-document-html";
import { renderPdf } from "../pdf/render-pdf";

export type RenderCertificateOptions = {
  /** Large faint text across every page, for previews of a draft ("DRAFT · NOT ISSUED"). */
  watermark?: string;
};

/**
 * The certificate as a whole HTML document, from its snapshot and nothing else: what renderCertificatePdf
 * prints, and what an app page can show as a preview (e.g. in an iframe's srcDoc).
 */
export async function renderCertificateHtml(snapshot: CertificateSnapshot, options: RenderCertificateOptions = {}): Promise<string> {
  const qrSvg = await qrCodeSvg(snapshot.verificationUrl);
  return renderDocumentHtml(createElement(CertificateDocument, { snapshot, qrSvg, watermark: options.watermark }));
}

/**
 * The certificate as an A4 PDF with "Page x of y" and the certificate number and revision in every page's
 * footer. Throws AppError UNAVAILABLE when there is no browser to print with.
 */
export async function renderCertificatePdf(snapshot: CertificateSnapshot, options: RenderCertificateOptions = {}): Promise<Buffer> {
  const html = await renderCertificateHtml(snapshot, options);
  return renderPdf({ html, title: certificateTitle(snapshot) });
}
