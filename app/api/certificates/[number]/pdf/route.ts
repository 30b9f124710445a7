import { AppError } from "@/lib/errors/app-error";
import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { getCurrentUser } from "@/lib/server/auth/current-user";
import { getCertificatePdf } from "@/lib/server/portal/get-portal-certificate-pdf";

export const dynamic = "force-dynamic";

/**
 * GET /api/certificates/Q26-00001/pdf?revision=2: a certificate revision's stored PDF as a download (no
 * revision: the latest issued). A client user for their own organisation only, anything else is 404; staff
 * with certificate.view for any certificate (getCertificatePdf decides).
 */
export async function GET(request: Request, { params }: { params: Promise<{ number: string }> }) {
  try {
    const actor = await getCurrentUser();
    if (!actor) throw new AppError("UNAUTHENTICATED");
    const revision = new URL(request.url).searchParams.get("revision");
    const { fileName, pdf } = await getCertificatePdf({ actor, number: (await params).number, revision });
    return new Response(new Uint8Array(pdf), {
      headers: { "Content-Type": "application/pdf", "Content-Disposition": `attachment; filename="${fileName}"`, "Cache-Control": "private, no-store" },
    });
  } catch (error) {
    return routeErrorResponse(error);
  }
}
