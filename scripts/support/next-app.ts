import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { BIN, ROOT } from "./paths";
import { buildIsCurrent, recordBuild, sourceHash } from "./build-stamp";
import { runCommand } from "./run-command";

/** Builds the production bundle unless the last build was made from the same sources. */
export async function buildIfNeeded(log: (line: string) => void = console.log): Promise<void> {
  const hash = sourceHash();
  if (buildIsCurrent(hash)) return;
  log("building the app (next build); this happens once per change of the sources...");
  await runCommand(BIN("next"), ["build"], { cwd: ROOT, env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" } });
  recordBuild(hash);
}

export type AppEnv = { port: number; databaseUrl: string; databaseMode: "embedded" | "external"; authSecret: string; baseUrl: string; trustedProxies?: number };

/**
 * Starts the production build behind the app's front door (scripts/app-server.mjs: client address, request
 * checks, security headers) with the app's environment; output passed through unless `quiet`.
 */
export function startNext(env: AppEnv, options: { quiet?: boolean } = {}): ChildProcess {
  return spawn(process.execPath, [path.join(ROOT, "scripts", "app-server.mjs")], {
    cwd: ROOT,
    stdio: options.quiet ? ["ignore", "ignore", "pipe"] : "inherit",
    env: {
      ...process.env,
      NODE_ENV: "production",
      NEXT_TELEMETRY_DISABLED: "1",
      PORT: String(env.port),
      DATABASE_URL: env.databaseUrl,
      SEEPLINE_DATABASE_MODE: env.databaseMode,
      NEXTAUTH_SECRET: env.authSecret,
      NEXTAUTH_URL: env.baseUrl,
      ...(env.trustedProxies !== undefined ? { SEEPLINE_TRUSTED_PROXIES: String(env.trustedProxies) } : {}),
    },
  });
}

/** Polls /api/health until the app answers with its database reachable. */
export async function waitForHealthy(baseUrl: string, timeoutMs = 120_000): Promise<unknown> {
  const deadline = Date.now() + timeoutMs;
  let last = "no answer yet";
  while (Date.now() < deadline) {
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      const body = await response.json();
      if (response.ok) return body;
      last = JSON.stringify(body);
    } catch (error) {
      last = error instanceof Error ? error.message : String(error);
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`the app did not become healthy within ${timeoutMs / 1000} s: ${last}`);
}
