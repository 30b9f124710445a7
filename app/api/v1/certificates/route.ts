import { apiHandler } from "@/lib/server/api/api-handler";
import { listApiCertificates } from "@/lib/server/api/api-certificates";

export const dynamic = "force-dynamic";

/** GET /api/v1/certificates?project=&cursor=&limit=: certificates with their revisions. */
export const GET = apiHandler("read", ({ caller, query }) => listApiCertificates(caller, query));
