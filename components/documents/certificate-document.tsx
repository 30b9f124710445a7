import { DocumentFrame } from "./document-frame";
import { CertificateSheet, type CertificateSheetProps } from "./certificate/certificate-sheet";

/** The document title of a certificate: also the left of every PDF page's footer, so each page names it. */
export function certificateTitle(snapshot: CertificateSheetProps["snapshot"]): string {
  return `Certificate ${snapshot.number} · revision ${snapshot.revision} · ${snapshot.lab.name}`;
}

/** The certificate as a whole HTML page, for printing to PDF (renderCertificatePdf) or an in-app preview. */
export function CertificateDocument(props: CertificateSheetProps) {
  return (
    <DocumentFrame title={certificateTitle(props.snapshot)}>
      <CertificateSheet {...props} />
    </DocumentFrame>
  );
}
