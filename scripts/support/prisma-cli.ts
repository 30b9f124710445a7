import path from "node:path";
import { BIN, ROOT } from "./paths";
import { runCommand } from "./run-command";

// The Prisma 6.19 CLI tries to download native engines unless these point at an existing file; the project
// uses the WebAssembly engines only (prisma.config.ts), so a placeholder is all they need.
const PLACEHOLDER = path.join(ROOT, "prisma", "engines.placeholder");
export const PRISMA_ENV = { PRISMA_QUERY_ENGINE_LIBRARY: PLACEHOLDER, PRISMA_SCHEMA_ENGINE_BINARY: PLACEHOLDER, PRISMA_HIDE_UPDATE_MESSAGE: "1" };

/** Runs the Prisma CLI against a database (or a dummy address where none is needed). */
export function runPrisma(args: string[], databaseUrl = "postgresql://unused@127.0.0.1:1/unused", quiet = true): Promise<string> {
  return runCommand(BIN("prisma"), args, {
    cwd: ROOT,
    quiet,
    env: { ...process.env, ...PRISMA_ENV, DATABASE_URL: databaseUrl },
  });
}

export async function generateClient(): Promise<void> {
  await runPrisma(["generate", "--no-hints"]);
}

export async function applyMigrations(databaseUrl: string): Promise<void> {
  await runPrisma(["migrate", "deploy"], databaseUrl);
}
