import { apiHandler } from "@/lib/server/api/api-handler";
import { getCertificatePdf } from "@/lib/server/portal/get-portal-certificate-pdf";

export const dynamic = "force-dynamic";

/** GET /api/v1/certificates/Q26-00001/pdf?revision=2: the stored PDF, as the portal gives it (getCertificatePdf decides). */
export const GET = apiHandler<{ number: string }>("read", async ({ caller, params, query }) => {
  const { fileName, pdf } = await getCertificatePdf({ actor: caller.user, number: params.number, revision: query.get("revision") });
  return new Response(new Uint8Array(pdf), {
    headers: { "Content-Type": "application/pdf", "Content-Disposition": `attachment; filename="${fileName}"`, "Cache-Control": "private, no-store" },
  });
});
