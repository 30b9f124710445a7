import "server-only";
import { AppError } from "@/lib/errors/app-error";

/** 1 MB, as the front door (scripts/app-server.mjs) allows: about 2,000 readings at once. */
export const API_MAX_BODY_BYTES = 1_000_000;

const tooLarge = (limit: number) =>
  new AppError("TOO_LARGE", `The request body is larger than ${Math.round(limit / 1000)} kB, the most the API accepts at once; post fewer readings per request.`);

/**
 * The request's JSON body, read no further than `limit` bytes: a declared or actual length over it is 413
 * before anything is parsed or saved; a body that is not JSON is 400.
 */
export async function readApiJson(request: Request, limit = API_MAX_BODY_BYTES): Promise<unknown> {
  const declared = Number(request.headers.get("content-length"));
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(limit);
  const reader = request.body?.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  while (reader) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(limit);
    }
    chunks.push(value);
  }
  const text = new TextDecoder("utf-8", { fatal: false }).decode(Buffer.concat(chunks));
  if (!text.trim()) throw new AppError("INVALID_INPUT", "The request has no body; send the readings as JSON.");
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new AppError("INVALID_INPUT", "The request body is not valid JSON.");
  }
}
