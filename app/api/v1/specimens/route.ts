import { apiHandler } from "@/lib/server/api/api-handler";
import { listApiSpecimens } from "@/lib/server/api/api-specimens";

export const dynamic = "force-dynamic";

/** GET /api/v1/specimens?roll=&cursor=&limit=: specimens by lab number. */
export const GET = apiHandler("read", ({ caller, query }) => listApiSpecimens(caller, query));
