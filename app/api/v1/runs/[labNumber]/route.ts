import { apiHandler } from "@/lib/server/api/api-handler";
import { getApiRun } from "@/lib/server/api/api-runs";

export const dynamic = "force-dynamic";

/** GET /api/v1/runs/T26-00004: one run, with its criteria and reported values so far for lab tokens. */
export const GET = apiHandler<{ labNumber: string }>("read", ({ caller, params }) => getApiRun(caller, params.labNumber));
