import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { requireUser } from "@/lib/server/auth/require-permission";
import { exportProjectResultsWorkbook } from "@/lib/server/exports/export-project-results-workbook";
import { xlsxResponse } from "@/lib/server/exports/workbook";

export const dynamic = "force-dynamic";

/** GET /api/projects/PRJ-1/results-xlsx: the project's results and conformance matrix as XLSX (run.view). */
export async function GET(_request: Request, { params }: { params: Promise<{ code: string }> }) {
  try {
    const actor = await requireUser("run.view");
    const { fileName, buffer } = await exportProjectResultsWorkbook({ actor, projectCode: (await params).code });
    return xlsxResponse(buffer, fileName);
  } catch (error) {
    return routeErrorResponse(error);
  }
}
