import Link from "next/link";
import { notFound } from "next/navigation";
import styles from "@/components/documents/document-preview.module.css";
import { ReceiptAcknowledgement } from "@/components/documents/receipt-acknowledgement";
import { PrintButton } from "@/components/labels/print-button";
import { isAppError } from "@/lib/errors/app-error";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getShipmentReceipt } from "@/lib/server/intake/get-shipment-receipt";
import { getLetterhead } from "@/lib/server/lab/get-letterhead";

export const metadata = { title: "Receipt of samples" };

// The receipt acknowledgement as the client will see it, with its PDF.
export default async function ShipmentReceiptPage({ params }: { params: Promise<{ labNumber: string }> }) {
  const actor = await requirePageUser("shipment.view");
  const { labNumber } = await params;
  const [receipt, lab] = await Promise.all([
    getShipmentReceipt({ actor, labNumber }).catch((error: unknown) => (isAppError(error) && error.code === "NOT_FOUND" ? notFound() : Promise.reject(error))),
    getLetterhead(),
  ]);
  return (
    <>
      <div className={styles.toolbar}>
        <Link href="/intake">← Intake</Link>
        <a className="button" href={`/api/shipments/${encodeURIComponent(receipt.labNumber)}/receipt`} download>Download PDF</a>
        <PrintButton />
        <Link className="button button-quiet" href={`/labels?numbers=${receipt.rolls.map((r) => r.labNumber).join(",")}`}>Roll labels</Link>
      </div>
      <div className={styles.paper}><ReceiptAcknowledgement receipt={receipt} lab={lab} /></div>
    </>
  );
}
