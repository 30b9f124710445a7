import { apiHandler } from "@/lib/server/api/api-handler";
import { listApiResults } from "@/lib/server/api/api-results";

export const dynamic = "force-dynamic";

/** GET /api/v1/results?project=&run=&cursor=&limit=: results (a client token: those on its issued certificates). */
export const GET = apiHandler("read", ({ caller, query }) => listApiResults(caller, query));
