import "server-only";
import { AppError, isAppError } from "@/lib/errors/app-error";
import { faultToAppError } from "../db/fault-to-app-error";

const NO_STORE = { "Cache-Control": "private, no-store" };

/** A JSON answer of the API. */
export function apiJson(body: unknown, status = 200): Response {
  return Response.json(body, { status, headers: NO_STORE });
}

/** The API's answer for a failure: `{ error: { code, message, fieldErrors } }` with the code's status; never internals. */
export function apiErrorResponse(error: unknown): Response {
  const known: AppError | null = isAppError(error) ? error : faultToAppError(error);
  if (!known) {
    console.error("API request failed", error);
    return apiJson({ error: { code: "INTERNAL", message: "A fault on the server; nothing was changed. Try again." } }, 500);
  }
  const headers: Record<string, string> = { ...NO_STORE };
  const retryAfterS = known.details.retryAfterS;
  if (typeof retryAfterS === "number") headers["Retry-After"] = String(retryAfterS);
  if (known.status === 401) headers["WWW-Authenticate"] = 'Bearer realm="seepline"';
  return Response.json({ error: { code: known.code, message: known.message, fieldErrors: known.fieldErrors } }, { status: known.status, headers });
}
