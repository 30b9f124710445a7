import "server-only";
import { NextResponse } from "next/server";
import { isAppError } from "@/lib/errors/app-error";

/** The JSON answer of a route handler for a failure: the AppError's status and sentence, or a plain 500. */
export function routeErrorResponse(error: unknown): NextResponse {
  if (isAppError(error))
    return NextResponse.json({ error: { code: error.code, message: error.message, fieldErrors: error.fieldErrors } }, { status: error.status });
  console.error("route handler failed", error);
  return NextResponse.json({ error: { code: "INTERNAL", message: "A fault on the server; nothing was changed." } }, { status: 500 });
}
