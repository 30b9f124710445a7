import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { requireUser } from "@/lib/server/auth/require-permission";
import { exportRunWorkbook } from "@/lib/server/exports/export-run-workbook";
import { xlsxResponse } from "@/lib/server/exports/workbook";

export const dynamic = "force-dynamic";

/** GET /api/runs/T26-00004/xlsx: the run's readings, intervals and criteria as XLSX (run.view). */
export async function GET(_request: Request, { params }: { params: Promise<{ labNumber: string }> }) {
  try {
    const actor = await requireUser("run.view");
    const { fileName, buffer } = await exportRunWorkbook({ actor, labNumber: (await params).labNumber });
    return xlsxResponse(buffer, fileName);
  } catch (error) {
    return routeErrorResponse(error);
  }
}
