/**
 * The one error type of Seepline. Each code maps to an HTTP status and a sentence a person can act on;
 * operations throw it, adapters turn it into a response or a form message.
 */
export const ERROR_CODES = {
  UNAUTHENTICATED: { status: 401, message: "Please sign in to continue." },
  FORBIDDEN: { status: 403, message: "Your role does not allow this." },
  NOT_FOUND: { status: 404, message: "That record does not exist or is not yours to see." },
  INVALID_INPUT: { status: 400, message: "Some of the values entered are not valid." },
  CONFLICT: { status: 409, message: "Someone else changed this record while you were editing it; reload and try again." },
  ILLEGAL_TRANSITION: { status: 409, message: "That step is not allowed from the item's present state." },
  GONE: { status: 410, message: "That document was withdrawn and is no longer offered." },
  TOO_LARGE: { status: 413, message: "The request is larger than Seepline accepts at once; send less at a time." },
  TOO_MANY_ATTEMPTS: { status: 429, message: "Too many failed attempts; wait a moment and try again." },
  RATE_LIMITED: { status: 429, message: "Too many requests with this API token; wait a minute and try again." },
  UNAVAILABLE: { status: 503, message: "The service is not available right now." },
} as const;
export type ErrorCode = keyof typeof ERROR_CODES;

export type FieldErrors = Record<string, string>;

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fieldErrors: FieldErrors;
  readonly details: Record<string, unknown>;

  constructor(code: ErrorCode, message?: string, options: { fieldErrors?: FieldErrors; details?: Record<string, unknown> } = {}) {
    super(message ?? ERROR_CODES[code].message);
    this.name = "AppError";
    this.code = code;
    this.fieldErrors = options.fieldErrors ?? {};
    this.details = options.details ?? {};
  }

  get status(): number {
    return ERROR_CODES[this.code].status;
  }
}

export function isAppError(error: unknown): error is AppError {
  return error instanceof AppError;
}
