import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { AUTH_SECRET_FILE } from "./paths";

/**
 * The secret that signs sessions. Given in NEXTAUTH_SECRET in production (every instance must share it);
 * on a demo or development machine it is generated once and kept in the git-ignored data folder.
 */
export function resolveAuthSecret(): { secret: string; source: "environment" | "generated" | "stored" } {
  const given = process.env.NEXTAUTH_SECRET;
  if (given) return { secret: given, source: "environment" };
  if (existsSync(AUTH_SECRET_FILE)) return { secret: readFileSync(AUTH_SECRET_FILE, "utf8").trim(), source: "stored" };
  mkdirSync(path.dirname(AUTH_SECRET_FILE), { recursive: true });
  const secret = randomBytes(32).toString("base64url");
  writeFileSync(AUTH_SECRET_FILE, `${secret}\n`, { mode: 0o600 });
  return { secret, source: "generated" };
}
