import { custodyActionLabel, isoDate, isoDateTime } from "@/lib/certificates/certificate-wording";
import type { CertificateSample } from "@/lib/certificates/certificate-snapshot";

// Roll and lot numbers read best unbroken (as on the receipt); only an unusually long one may wrap.
function idClass(text: string): string | undefined {
  return text.length <= 24 ? "nowrap" : undefined;
}

/** The roll samples the results come from, their condition on arrival, and each one's custody from receipt to test. */
export function CertificateSamples({ samples, zone = "UTC" }: { samples: CertificateSample[]; zone?: string }) {
  const withCondition = samples.some((s) => s.condition !== undefined);
  return (
    <section>
      <h2>Samples and custody</h2>
      <table data-testid="certificate-samples">
        <thead>
          <tr><th className="nowrap">Lab number</th><th>Roll</th><th>Lot</th><th>Product</th><th>Manufacturer</th><th className="nowrap">Shipment</th><th className="nowrap">Received</th>{withCondition ? <th>Condition on arrival</th> : null}</tr>
        </thead>
        <tbody>
          {samples.map((s) => (
            <tr key={s.rollLabNumber}>
              <td className="mono nowrap">{s.rollLabNumber}</td>
              <td className={idClass(s.rollNumber)}>{s.rollNumber}</td>
              <td className={idClass(s.lotNumber)}>{s.lotNumber}</td>
              <td>{s.product}</td>
              <td>{s.manufacturer}</td>
              <td className="mono nowrap">{s.shipmentLabNumber}</td>
              <td className="nowrap">{isoDate(s.receivedAt, zone)}</td>
              {withCondition ? <td data-testid="certificate-roll-condition">{s.condition || "No remarks recorded"}</td> : null}
            </tr>
          ))}
        </tbody>
      </table>
      {samples.map((s) => (
        <table key={s.rollLabNumber} className="cert-custody" data-testid="certificate-custody">
          <caption>Custody of {s.rollLabNumber} and the pieces cut from it</caption>
          <thead>
            <tr><th className="nowrap" style={{ width: "24%" }}>When</th><th style={{ width: "20%" }}>Step</th><th style={{ width: "22%" }}>Item</th><th>By</th></tr>
          </thead>
          <tbody>
            {s.custody.map((c, i) => (
              <tr key={i}>
                <td className="nowrap">{isoDateTime(c.at, zone)}</td>
                <td>{custodyActionLabel(c.action)}</td>
                <td className="mono nowrap">{c.item}</td>
                <td>{c.by}</td>
              </tr>
            ))}
            {s.custody.length === 0 ? <tr><td colSpan={4} className="doc-muted">No custody steps are recorded.</td></tr> : null}
          </tbody>
        </table>
      ))}
    </section>
  );
}
