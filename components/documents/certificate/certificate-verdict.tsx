import { formatLimit } from "@/lib/format/result-numbers";
import type { ConformanceSummary } from "@/lib/certificates/certificate-snapshot";

/** The verdict of one result against its limit, as a small coloured tag; "not assessed" without a limit. */
export function CertificateVerdict({ conformance }: { conformance: ConformanceSummary | null }) {
  if (!conformance) return <span className="cert-verdict cert-none">not assessed</span>;
  return conformance.conforms ? <span className="cert-verdict cert-pass">conforms</span> : <span className="cert-verdict cert-fail">does not conform</span>;
}

/** "≤ 1 × 10⁻⁸ m³/m²/s" or "≥ 24 mL/2 g": the limit with its direction, in the results' notation, for tables. */
export function limitLabel(conformance: ConformanceSummary): string {
  return formatLimit(conformance);
}
