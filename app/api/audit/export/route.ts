import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { requireUser } from "@/lib/server/auth/require-permission";
import { streamAuditCsv } from "@/lib/server/audit/stream-audit-csv";
import { readAuditFilterText } from "@/lib/validation/audit";

export const dynamic = "force-dynamic";

/**
 * GET /api/audit/export?record=T26-00004&from=2026-12-01: the audit rows the filter selects, as a CSV
 * download (audit.view, as the audit trail page). A refused filter is a 400 with the sentence.
 */
export async function GET(request: Request) {
  try {
    const actor = await requireUser("audit.view");
    const stream = await streamAuditCsv({ actor, filter: readAuditFilterText(new URL(request.url).searchParams) });
    const stamp = new Date().toISOString().slice(0, 16).replace(/[-:]/g, "").replace("T", "-");
    return new Response(stream, {
      headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": `attachment; filename="audit-trail-${stamp}.csv"`, "Cache-Control": "private, no-store" },
    });
  } catch (error) {
    return routeErrorResponse(error);
  }
}
