import "server-only";
import { unstable_rethrow } from "next/navigation";
import { isAppError, type FieldErrors } from "@/lib/errors/app-error";
import { faultToAppError } from "../db/fault-to-app-error";

export type ActionResult<T = null> =
  | { ok: true; data: T; message: string }
  | { ok: false; message: string; fieldErrors: FieldErrors; code: string; details?: Record<string, unknown> };

/**
 * Runs a server action's work and turns the outcome into something a form can show: a known AppError
 * becomes its message and field errors; anything else is logged and reported without internals.
 */
export async function toActionResult<T>(work: () => Promise<T>, successMessage = "Saved."): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await work(), message: successMessage };
  } catch (error) {
    unstable_rethrow(error);
    const known = isAppError(error) ? error : faultToAppError(error);
    if (known) return { ok: false, message: known.message, fieldErrors: known.fieldErrors, code: known.code, details: known.details };
    console.error("server action failed", error);
    return { ok: false, message: "The change could not be saved because of a fault on the server; nothing was changed. Try again.", fieldErrors: {}, code: "INTERNAL" };
  }
}
