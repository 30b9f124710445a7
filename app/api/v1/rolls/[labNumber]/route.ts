import { apiHandler } from "@/lib/server/api/api-handler";
import { getApiRoll } from "@/lib/server/api/api-rolls";

export const dynamic = "force-dynamic";

/** GET /api/v1/rolls/R26-00001: one roll; another organisation's is 404 for a client token. */
export const GET = apiHandler<{ labNumber: string }>("read", ({ caller, params }) => getApiRoll(caller, params.labNumber));
