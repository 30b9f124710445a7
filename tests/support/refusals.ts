import { AppError } from "@/lib/errors/app-error";

/** The AppError an operation was refused with; fails the test if it was not refused, or failed otherwise. */
export async function failure(promise: Promise<unknown>): Promise<AppError> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof AppError) return error;
    throw error;
  }
  throw new Error("expected the operation to be refused");
}

/** The error code only ("no error" when the operation went through), for compact assertions. */
export async function codeOf(promise: Promise<unknown>): Promise<string> {
  try {
    await promise;
    return "no error";
  } catch (error) {
    return error instanceof AppError ? error.code : `unexpected ${String(error)}`;
  }
}
