import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { databaseFault } from "./database-fault";

/**
 * The last line of defence against a fault on the server: a database refusal that an operation did not
 * explain itself becomes an AppError with a sentence, by its SQLSTATE class. Null for anything else.
 */
export function faultToAppError(error: unknown): AppError | null {
  const fault = databaseFault(error);
  if (!fault) return null;
  // Unexplained by the operation that met it: worth a line in the log, even though the person gets a sentence.
  console.warn(`database refusal not explained by its operation: ${fault.code} ${fault.message}`);
  const code = fault.code;
  // Class 22 (data exception): a value PostgreSQL cannot store, such as a NUL character or a date out of range.
  if (code.startsWith("22")) return new AppError("INVALID_INPUT", "A value entered cannot be stored (a character or number out of range); check the fields and try again.");
  if (code === "23505") return new AppError("CONFLICT", "Someone else saved the same thing a moment ago; reload the page to see it.");
  if (code === "23503") return new AppError("NOT_FOUND", "Something this refers to no longer exists; reload the page.");
  if (code === "40001" || code === "40P01" || code === "55P03") return new AppError("CONFLICT", "Someone else was changing the same record at the same moment; try again.");
  // The database's own protections (triggers and rights) speak in sentences; pass them on.
  if (code === "42501") return new AppError("ILLEGAL_TRANSITION", `The record is protected: ${fault.message}.`);
  return null;
}
