import { NextResponse } from "next/server";
import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { requireUser } from "@/lib/server/auth/require-permission";
import { findFilterChoices } from "@/lib/server/lists/list-filter-options";
import { parseOrThrow } from "@/lib/server/validation/parse";
import { filterChoiceQuerySchema } from "@/lib/validation/list-query";

export const dynamic = "force-dynamic";

/** GET /api/filter-choices?kind=projects&q=north&clientOrganizationId=…: the first matches for a list's searchable field. */
export async function GET(request: Request) {
  try {
    const actor = await requireUser("workspace.view");
    const params = Object.fromEntries(new URL(request.url).searchParams);
    const query = parseOrThrow(filterChoiceQuerySchema, { ...params, clientOrganizationId: params.clientOrganizationId || undefined });
    return NextResponse.json(await findFilterChoices({ actor, ...query }), { headers: { "Cache-Control": "private, no-store" } });
  } catch (error) {
    return routeErrorResponse(error);
  }
}
