import "server-only";
import { createHash, randomBytes } from "node:crypto";

const PREFIX = "slp_";

/** A new token: 32 random bytes (256 bits) in base64url after a short marker, so a leaked one is recognisable. */
export function generateApiToken(): { token: string; hash: string; prefix: string } {
  const token = `${PREFIX}${randomBytes(32).toString("base64url")}`;
  return { token, hash: hashApiToken(token), prefix: token.slice(0, PREFIX.length + 6) };
}

/** What the database keeps of a token: its SHA-256, hex. A high-entropy token needs no slow hash. */
export function hashApiToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}
