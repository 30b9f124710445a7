import { apiHandler } from "@/lib/server/api/api-handler";
import { getApiSpecimen } from "@/lib/server/api/api-specimens";

export const dynamic = "force-dynamic";

/** GET /api/v1/specimens/S26-00001: one specimen. */
export const GET = apiHandler<{ labNumber: string }>("read", ({ caller, params }) => getApiSpecimen(caller, params.labNumber));
