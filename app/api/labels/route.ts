import type { NextRequest } from "next/server";
import { AppError } from "@/lib/errors/app-error";
import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { requireUser } from "@/lib/server/auth/require-permission";
import { getLetterhead } from "@/lib/server/lab/get-letterhead";
import { getPrintableLabels } from "@/lib/server/labels/get-printable-labels";
import { renderLabelSheetPdf } from "@/lib/server/labels/render-label-sheet-pdf";

export const dynamic = "force-dynamic";

/** GET /api/labels?numbers=R26-00001,R26-00002: the label sheets as a PDF (sample.view). */
export async function GET(request: NextRequest) {
  try {
    const actor = await requireUser("sample.view");
    const [{ labels }, lab] = await Promise.all([getPrintableLabels({ actor, labNumbers: request.nextUrl.searchParams.getAll("numbers") }), getLetterhead()]);
    if (labels.length === 0) throw new AppError("NOT_FOUND", "None of those lab numbers is a roll, coupon or specimen on record.");
    const pdf = await renderLabelSheetPdf({ labels, labName: lab.name });
    return new Response(new Uint8Array(pdf), {
      headers: { "Content-Type": "application/pdf", "Content-Disposition": 'inline; filename="labels.pdf"', "Cache-Control": "no-store" },
    });
  } catch (error) {
    return routeErrorResponse(error);
  }
}
