import { NextResponse } from "next/server";
import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { getCurrentUser } from "@/lib/server/auth/current-user";
import { getShipmentReceipt } from "@/lib/server/intake/get-shipment-receipt";
import { renderReceiptPdf } from "@/lib/server/intake/render-receipt-pdf";
import { getLetterhead } from "@/lib/server/lab/get-letterhead";

export const dynamic = "force-dynamic";

/**
 * GET /api/shipments/S26-00001/receipt: the receipt acknowledgement as a PDF download. Staff with
 * shipment.view, or a client user for their own organisation's shipment (getShipmentReceipt decides).
 */
export async function GET(_request: Request, { params }: { params: Promise<{ labNumber: string }> }) {
  try {
    const actor = await getCurrentUser();
    if (!actor) return NextResponse.json({ error: { code: "UNAUTHENTICATED", message: "Please sign in to continue." } }, { status: 401 });
    const [receipt, lab] = await Promise.all([getShipmentReceipt({ actor, labNumber: (await params).labNumber }), getLetterhead()]);
    const pdf = await renderReceiptPdf({ receipt, lab });
    return new Response(new Uint8Array(pdf), {
      headers: { "Content-Type": "application/pdf", "Content-Disposition": `attachment; filename="receipt-${receipt.labNumber}.pdf"`, "Cache-Control": "no-store" },
    });
  } catch (error) {
    return routeErrorResponse(error);
  }
}
