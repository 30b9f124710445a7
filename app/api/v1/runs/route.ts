import { apiHandler } from "@/lib/server/api/api-handler";
import { listApiRuns } from "@/lib/server/api/api-runs";

export const dynamic = "force-dynamic";

/** GET /api/v1/runs?state=&cursor=&limit=: runs by lab number. */
export const GET = apiHandler("read", ({ caller, query }) => listApiRuns(caller, query));
