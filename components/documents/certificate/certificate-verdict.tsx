import type { ConformanceSummary } from "@/lib/certificates/certificate-snapshot";

/** The verdict of one result against its limit, as a small coloured tag; "not assessed" without a limit. */
export function CertificateVerdict({ conformance }: { conformance: ConformanceSummary | null }) {
  if (!conformance) return <span className="cert-verdict cert-none">not assessed</span>;
  return conformance.conforms ? <span className="cert-verdict cert-pass">conforms</span> : <span className="cert-verdict cert-fail">does not conform</span>;
}

/** "≤ 1e-8 m³/m²/s" or "≥ 24 mL/2 g": the limit with its direction, for tables. */
export function limitLabel(conformance: ConformanceSummary, unit: (u: string) => string): string {
  return `${conformance.direction === "MAXIMUM" ? "≤" : "≥"} ${conformance.limitText} ${unit(conformance.unit)}`;
}
