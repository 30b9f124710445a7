import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { requireUser } from "@/lib/server/auth/require-permission";
import { previewCertificateDraft } from "@/lib/server/certificates/preview-certificate-draft";

export const dynamic = "force-dynamic";

/** GET /api/certificates/Q26-00001/preview?revision=2: the draft revision as it would be issued, marked DRAFT on every page. */
export async function GET(request: Request, { params }: { params: Promise<{ number: string }> }) {
  try {
    const actor = await requireUser("certificate.issue");
    const { fileName, pdf } = await previewCertificateDraft({ actor, number: (await params).number, revision: new URL(request.url).searchParams.get("revision") });
    return new Response(new Uint8Array(pdf), {
      headers: { "Content-Type": "application/pdf", "Content-Disposition": `inline; filename="${fileName}"`, "Cache-Control": "private, no-store" },
    });
  } catch (error) {
    return routeErrorResponse(error);
  }
}
