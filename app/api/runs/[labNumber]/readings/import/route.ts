import { NextResponse } from "next/server";
import { isAppError } from "@/lib/errors/app-error";
import { routeErrorResponse } from "@/lib/server/actions/route-error";
import { requireUser } from "@/lib/server/auth/require-permission";
import { importReadingsFile } from "@/lib/server/readings/import-readings-file";

export const dynamic = "force-dynamic";

/** The request body's bytes as they arrive. */
async function* chunksOf(body: ReadableStream<Uint8Array> | null): AsyncGenerator<Uint8Array> {
  if (!body) return;
  const reader = body.getReader();
  for (;;) {
    const { done, value } = await reader.read();
    if (done) return;
    yield value;
  }
}

/**
 * POST /api/runs/T26-00004/readings/import?mode=preview&fileName=logger.csv[&mapping={json}]: the body is
 * the data-logger file itself, read as it arrives. Answers the file's summary (counts, first and last rows,
 * every error with its row); with mode=save the readings are saved too, all or none. A refused save answers
 * the error with the summary, so the form can show what to fix.
 */
export async function POST(request: Request, { params }: { params: Promise<{ labNumber: string }> }) {
  try {
    const actor = await requireUser("run.operate");
    const search = new URL(request.url).searchParams;
    const mappingText = search.get("mapping");
    let mapping: unknown;
    try {
      mapping = mappingText ? JSON.parse(mappingText) : undefined;
    } catch {
      mapping = "not JSON";
    }
    const input = { labNumber: (await params).labNumber, fileName: search.get("fileName") ?? "", mode: search.get("mode") ?? "", mapping };
    const summary = await importReadingsFile({ actor, input, body: chunksOf(request.body) });
    return NextResponse.json(summary, { headers: { "Cache-Control": "private, no-store" } });
  } catch (error) {
    if (isAppError(error) && error.details?.preview)
      return NextResponse.json({ error: { code: error.code, message: error.message, fieldErrors: error.fieldErrors }, preview: error.details.preview }, { status: error.status });
    return routeErrorResponse(error);
  }
}
