import "server-only";
import { createHmac, timingSafeEqual } from "node:crypto";
import { AppError } from "@/lib/errors/app-error";
import { getEnv } from "../env";

/**
 * Page cursors of the API: the list's name and the last key seen, signed with an HMAC of the server's secret,
 * so a cursor that was edited, or taken from another list, is refused rather than silently read.
 */
function sign(payload: string): string {
  return createHmac("sha256", `api-cursor:${getEnv().NEXTAUTH_SECRET}`).update(payload).digest("base64url").slice(0, 32);
}

export function encodeCursor(list: string, key: string): string {
  const payload = Buffer.from(JSON.stringify({ l: list, k: key }), "utf8").toString("base64url");
  return `${payload}.${sign(payload)}`;
}

/** The last key of a page of `list`, or null for the first page; 400 for a cursor this server did not sign. */
export function decodeCursor(list: string, cursor: string | null): string | null {
  if (cursor === null || cursor === "") return null;
  const refused = new AppError("INVALID_INPUT", "The page cursor was changed or belongs to another list; start again from the first page.", { fieldErrors: { cursor: "Not a cursor this list gave out." } });
  const [payload, mac, extra] = cursor.split(".");
  if (!payload || !mac || extra !== undefined || cursor.length > 500) throw refused;
  const expected = Buffer.from(sign(payload));
  const given = Buffer.from(mac);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) throw refused;
  try {
    const parsed = JSON.parse(Buffer.from(payload, "base64url").toString("utf8")) as { l?: unknown; k?: unknown };
    if (parsed.l !== list || typeof parsed.k !== "string") throw refused;
    return parsed.k;
  } catch {
    throw refused;
  }
}

/** `limit` from the query: 1 to 200, 50 unless asked. */
export function pageLimit(value: string | null): number {
  if (value === null || value === "") return 50;
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1 || n > 200) throw new AppError("INVALID_INPUT", "limit must be a whole number from 1 to 200.", { fieldErrors: { limit: "From 1 to 200." } });
  return n;
}
