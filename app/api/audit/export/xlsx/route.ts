import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { requireUser } from "@/lib/server/auth/require-permission";
import { exportAuditWorkbook } from "@/lib/server/exports/export-audit-workbook";
import { xlsxResponse } from "@/lib/server/exports/workbook";
import { readAuditFilterText } from "@/lib/validation/audit";

export const dynamic = "force-dynamic";

/** GET /api/audit/export/xlsx?record=T26-00004: the audit rows the filter selects, as XLSX (beside the CSV). */
export async function GET(request: Request) {
  try {
    const actor = await requireUser("audit.view");
    const { fileName, buffer } = await exportAuditWorkbook({ actor, filter: readAuditFilterText(new URL(request.url).searchParams) });
    return xlsxResponse(buffer, fileName);
  } catch (error) {
    return routeErrorResponse(error);
  }
}
