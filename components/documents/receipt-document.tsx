import type { ShipmentReceipt } from "@/lib/server/intake/get-shipment-receipt";
import type { Letterhead } from "@/lib/server/lab/get-letterhead";
import { DocumentFrame } from "./document-frame";
import { ReceiptAcknowledgement } from "./receipt-acknowledgement";

/** The receipt acknowledgement as a whole HTML page, for printing to PDF. */
export function ReceiptDocument({ receipt, lab }: { receipt: ShipmentReceipt; lab: Letterhead }) {
  return (
    <DocumentFrame title={`Receipt of samples ${receipt.labNumber} · ${lab.name}`}>
      <ReceiptAcknowledgement receipt={receipt} lab={lab} />
    </DocumentFrame>
  );
}
