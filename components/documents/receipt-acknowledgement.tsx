import { formatDateTime } from "@/lib/format/dates";
import { RECEIPT_FIELD_LABELS, receiptFieldValue } from "@/lib/format/receipt-fields";
import type { ShipmentReceipt } from "@/lib/server/intake/get-shipment-receipt";
import type { Letterhead as LetterheadData } from "@/lib/server/lab/get-letterhead";
import { DOCUMENT_CSS } from "./document-styles";
import { Letterhead } from "./letterhead";

function formatMm(value: number | null): string | null {
  return value === null ? null : String(Math.round(value * 10) / 10);
}

function sampleSize(length: number | null, width: number | null): string {
  const [l, w] = [formatMm(length), formatMm(width)];
  if (l && w) return `${l} × ${w} mm`;
  if (l || w) return `${l ?? "?"} × ${w ?? "?"} mm`;
  return "—";
}

// Roll and lot numbers read best unbroken (a break at their dashes looks like two numbers); only an
// unusually long one may wrap.
function idClass(text: string): string | undefined {
  return text.length <= 24 ? "nowrap" : undefined;
}

/**
 * The receipt acknowledgement a client gets for a shipment: what arrived, in what condition, and who at
 * the lab took it in, and every correction since (the receipt is then marked amended). Self-contained
 * (carries its own styles), so the app page and the PDF show the same. Times are in the lab's time zone.
 */
export function ReceiptAcknowledgement({ receipt, lab }: { receipt: ShipmentReceipt; lab: LetterheadData }) {
  const { project, clientOrganization: client } = receipt;
  const acknowledged = receipt.acknowledgedAt !== null;
  const zone = lab.timeZone;
  const amended = receipt.corrections.length > 0;
  const lastAmendment = receipt.corrections.at(-1)?.createdAt ?? null;
  return (
    <article className="doc" data-testid="receipt-acknowledgement">
      <style dangerouslySetInnerHTML={{ __html: DOCUMENT_CSS }} />
      {acknowledged ? null : <div className="doc-watermark" aria-hidden="true" data-watermark="NOT YET ACKNOWLEDGED" />}
      <Letterhead lab={lab} at={receipt.receivedAt} />
      <div className="doc-title">
        <h1>Receipt of samples{amended ? <span className="doc-amended" data-testid="receipt-amended"> · amended</span> : null}</h1>
        <span className="doc-number">{receipt.labNumber}</span>
      </div>
      {amended ? (
        <div className="doc-box doc-box-warn" style={{ marginTop: 0, marginBottom: "10pt" }}>
          Amended {formatDateTime(lastAmendment, zone)}: this receipt was corrected after it was first recorded. The corrections, with the
          value before and after and the reason for each, are listed at the end.
        </div>
      ) : null}
      {acknowledged ? null : (
        <div className="doc-box doc-box-warn" style={{ marginTop: 0, marginBottom: "10pt" }}>
          Not yet acknowledged: this is a working copy and may still change before the lab sends it.
        </div>
      )}

      <dl className="doc-facts">
        <div><dt>Client</dt><dd>{client.name} <span className="doc-muted">({client.code})</span></dd></div>
        <div><dt>Project</dt><dd>{project.name} <span className="doc-muted">({project.code})</span></dd></div>
        <div><dt>Site</dt><dd>{project.siteName}{project.siteLocation ? `, ${project.siteLocation}` : ""}</dd></div>
        <div><dt>Received at the lab</dt><dd>{formatDateTime(receipt.receivedAt, zone)}</dd></div>
        <div><dt>Delivered by</dt><dd>{receipt.deliveredBy}</dd></div>
        <div><dt>Received by</dt><dd>{receipt.receivedBy.name}</dd></div>
        <div className="doc-wide"><dt>Condition on arrival</dt><dd>{receipt.conditionNotes || "No remarks recorded."}</dd></div>
      </dl>

      <h2>{receipt.rolls.length === 1 ? "1 roll sample" : `${receipt.rolls.length} roll samples`}</h2>
      <table>
        <thead>
          <tr>
            <th className="nowrap">Lab number</th><th>Roll</th><th>Lot</th><th>Product</th><th>Manufacturer</th>
            <th className="nowrap">Sample size</th><th className="nowrap">Machine direction</th><th>Condition</th>
          </tr>
        </thead>
        <tbody>
          {receipt.rolls.map((roll) => (
            <tr key={roll.labNumber}>
              <td className="mono nowrap">{roll.labNumber}</td>
              <td className={idClass(roll.rollNumber)}>{roll.rollNumber}</td>
              <td className={idClass(roll.lotNumber)}>{roll.lotNumber}</td>
              <td>{roll.product}</td>
              <td>{roll.manufacturer}</td>
              <td className="nowrap">{sampleSize(roll.sampleLengthMm, roll.sampleWidthMm)}</td>
              <td className="nowrap">{roll.machineDirectionMarked ? "marked" : "not marked"}</td>
              <td>{roll.conditionNotes || <span className="doc-muted">as the shipment</span>}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {receipt.rolls.length === 0 ? <p className="doc-muted" style={{ marginTop: "6pt" }}>No rolls are logged on this shipment yet.</p> : null}

      {amended ? (
        <section data-testid="receipt-corrections">
          <h2>Corrections</h2>
          <table>
            <thead><tr><th className="nowrap">When</th><th>Record</th><th>Field</th><th>Was</th><th>Now</th><th>Reason</th><th>By</th></tr></thead>
            <tbody>
              {receipt.corrections.map((c, i) => (
                <tr key={i}>
                  <td className="nowrap">{formatDateTime(c.createdAt, zone)}</td>
                  <td className="nowrap">{c.item}</td>
                  <td>{RECEIPT_FIELD_LABELS[c.field] ?? c.field}</td>
                  <td>{receiptFieldValue(c.field, c.oldValue, zone)}</td>
                  <td>{receiptFieldValue(c.field, c.newValue, zone)}</td>
                  <td>{c.reason}</td>
                  <td>{c.actor.name}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ) : null}

      {/* The sign-off and the closing sentence stay together on one page. */}
      <div className="doc-keep">
        <div className="doc-box doc-signoff">
          <div>
            <div className="doc-small">Acknowledged</div>
            <div>{acknowledged ? formatDateTime(receipt.acknowledgedAt, zone) : "Not yet acknowledged"}</div>
          </div>
          <div>
            <div className="doc-small">Acknowledged by</div>
            <div>{receipt.acknowledgedBy?.name ?? "—"}</div>
          </div>
        </div>
        <p className="doc-small" style={{ marginTop: "10pt" }}>
          This receipt records the condition of the shipment as our staff saw it when it arrived at the laboratory. It is not a
          test result and says nothing about the properties of the material. Please quote the lab numbers above whenever you
          write to us about these samples.
        </p>
      </div>
    </article>
  );
}
