import "server-only";
import { NextResponse } from "next/server";
import { isAppError } from "@/lib/errors/app-error";
import { faultToAppError } from "../db/fault-to-app-error";

/** The JSON answer of a route handler for a failure: the AppError's status and sentence, or a plain 500. */
export function routeErrorResponse(error: unknown): NextResponse {
  const known = isAppError(error) ? error : faultToAppError(error);
  if (known) return NextResponse.json({ error: { code: known.code, message: known.message, fieldErrors: known.fieldErrors } }, { status: known.status });
  console.error("route handler failed", error);
  return NextResponse.json({ error: { code: "INTERNAL", message: "A fault on the server; nothing was changed." } }, { status: 500 });
}
