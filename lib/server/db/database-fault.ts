import "server-only";

/** A PostgreSQL error as the driver adapter reports it: its SQLSTATE code and message. */
export type DatabaseFault = { code: string; message: string };

type Carrier = { cause?: unknown; meta?: { driverAdapterError?: unknown }; originalCode?: unknown; originalMessage?: unknown; code?: unknown; message?: unknown; kind?: unknown };

/**
 * The PostgreSQL error inside a Prisma error, if there is one. Prisma with @prisma/adapter-pg nests it
 * (error.meta.driverAdapterError.cause or error.cause) with `originalCode` and `originalMessage`.
 */
export function databaseFault(error: unknown): DatabaseFault | null {
  const seen = new Set<unknown>();
  const queue: unknown[] = [error];
  while (queue.length > 0) {
    const item = queue.shift();
    if (!item || typeof item !== "object" || seen.has(item)) continue;
    seen.add(item);
    const carrier = item as Carrier;
    if (typeof carrier.originalCode === "string") return { code: carrier.originalCode, message: String(carrier.originalMessage ?? "") };
    // A pg error reached directly (raw queries on a pg client).
    if (typeof carrier.code === "string" && /^[0-9A-Z]{5}$/.test(carrier.code) && typeof carrier.message === "string" && "severity" in carrier)
      return { code: carrier.code, message: carrier.message };
    queue.push(carrier.cause, carrier.meta?.driverAdapterError);
  }
  return null;
}

/** Whether the error is PostgreSQL refusing a duplicate (SQLSTATE 23505), optionally naming `marker`. */
export function isUniqueViolation(error: unknown, marker?: string): boolean {
  const fault = databaseFault(error);
  if (fault?.code !== "23505") return false;
  return marker === undefined || fault.message.includes(marker) || JSON.stringify(error).includes(marker);
}
