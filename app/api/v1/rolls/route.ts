import { apiHandler } from "@/lib/server/api/api-handler";
import { listApiRolls } from "@/lib/server/api/api-rolls";

export const dynamic = "force-dynamic";

/** GET /api/v1/rolls?project=&cursor=&limit=: rolls by lab number (a read token; a client token its own organisation's). */
export const GET = apiHandler("read", ({ caller, query }) => listApiRolls(caller, query));
