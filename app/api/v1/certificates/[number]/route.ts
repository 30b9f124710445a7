import { apiHandler } from "@/lib/server/api/api-handler";
import { getApiCertificate } from "@/lib/server/api/api-certificates";

export const dynamic = "force-dynamic";

/** GET /api/v1/certificates/Q26-00001: one certificate's revisions and where their PDFs are. */
export const GET = apiHandler<{ number: string }>("read", ({ caller, params }) => getApiCertificate(caller, params.number));
