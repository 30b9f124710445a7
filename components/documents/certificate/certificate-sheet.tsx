import type { CertificateSnapshot } from "@/lib/certificates/certificate-snapshot";
import { DOCUMENT_CSS } from "../document-styles";
import { Letterhead } from "../letterhead";
import { CertificateClose } from "./certificate-close";
import { CertificateHeading } from "./certificate-heading";
import { CertificateSamples } from "./certificate-samples";
import { CertificateSummary } from "./certificate-summary";
import { CertificateTestSection } from "./certificate-test";
import { CertificateIndexTestSection } from "./certificate-index-test";
import { CertificateCoverageSection } from "./certificate-coverage";
import { CERTIFICATE_CSS } from "./certificate-styles";

export type CertificateSheetProps = {
  snapshot: CertificateSnapshot;
  /** The 2D code of snapshot.verificationUrl as SVG markup (qrCodeSvg). */
  qrSvg: string;
  /** Large faint text across the sheet, for previews ("DRAFT · NOT ISSUED"); none on an issued PDF. */
  watermark?: string;
};

/**
 * The certificate itself, from its snapshot alone. Self-contained (carries its own styles), so an app page
 * can show it as the PDF shows it. No hooks and no client components: it is rendered to static HTML.
 */
export function CertificateSheet({ snapshot, qrSvg, watermark }: CertificateSheetProps) {
  const zone = snapshot.lab.timeZone ?? "UTC";
  const indexTests = snapshot.indexTests ?? [];
  const count = snapshot.tests.length + indexTests.length;
  return (
    <article className="doc cert" data-testid="certificate">
      <style dangerouslySetInnerHTML={{ __html: DOCUMENT_CSS + CERTIFICATE_CSS }} />
      {watermark ? <div className="doc-watermark" aria-hidden="true" data-watermark={watermark} /> : null}
      <Letterhead lab={snapshot.lab} zoneStated />
      <CertificateHeading snapshot={snapshot} />
      <CertificateSummary snapshot={snapshot} />
      <CertificateSamples samples={snapshot.samples} zone={zone} />
      {snapshot.propertyCoverage && snapshot.specification ? <CertificateCoverageSection coverage={snapshot.propertyCoverage} specificationName={snapshot.specification.name} /> : null}
      {snapshot.tests.map((test, i) => <CertificateTestSection key={`${test.runLabNumber}-${i}`} test={test} index={i} count={count} zone={zone} />)}
      {indexTests.map((test, i) => <CertificateIndexTestSection key={`${test.rollLabNumber}-${test.method.code}-${i}`} test={test} number={snapshot.tests.length + i + 1} count={count} zone={zone} />)}
      <CertificateClose snapshot={snapshot} qrSvg={qrSvg} preview={Boolean(watermark)} />
    </article>
  );
}
