import { NextResponse } from "next/server";
import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { requireUser } from "@/lib/server/auth/require-permission";
import { getRunChartSeries } from "@/lib/server/runs/get-run-chart-series";
import { readHoursRange } from "@/lib/validation/chart-range";

export const dynamic = "force-dynamic";

/**
 * GET /api/runs/T26-00004/chart?fromHours=10&toHours=30: the run's chart series for that range (the whole
 * run without one), downsampled to a few thousand numbers; the charts' zoom asks for it. A range outside the
 * run is a 400 with the hours the run spans.
 */
export async function GET(request: Request, { params }: { params: Promise<{ labNumber: string }> }) {
  try {
    const actor = await requireUser("run.view");
    const range = readHoursRange(new URL(request.url).searchParams);
    const series = await getRunChartSeries({ actor, labNumber: (await params).labNumber, range });
    return NextResponse.json(series, { headers: { "Cache-Control": "private, no-store" } });
  } catch (error) {
    return routeErrorResponse(error);
  }
}
