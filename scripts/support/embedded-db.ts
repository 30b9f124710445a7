import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { BIN, ROOT } from "./paths";
import { findFreePort } from "./free-port";

export type EmbeddedDb = { url: string; port: number; stop(): Promise<void> };

/**
 * Starts the embedded PostgreSQL (PGlite behind a loopback socket) as its own process, which alone owns
 * the data folder: PGlite is single-writer, and Next.js runs several workers. `dataDir` "memory://" keeps
 * nothing on disk (tests).
 */
export async function startEmbeddedDb(dataDir: string, options: { quiet?: boolean } = {}): Promise<EmbeddedDb> {
  const port = await findFreePort();
  const child = spawn(BIN("tsx"), [path.join(ROOT, "scripts", "embedded-db-server.ts"), dataDir, String(port)], {
    cwd: ROOT,
    stdio: ["ignore", "pipe", "inherit"],
  });
  await waitForReady(child, options.quiet ?? false);
  const url = `postgresql://postgres@127.0.0.1:${port}/postgres?sslmode=disable`;
  return { url, port, stop: () => stopChild(child) };
}

function waitForReady(child: ChildProcess, quiet: boolean): Promise<void> {
  return new Promise((resolve, reject) => {
    let seen = "";
    const timer = setTimeout(() => reject(new Error(`embedded database did not start within 60 s:\n${seen}`)), 60_000);
    child.stdout?.on("data", (chunk: Buffer) => {
      const text = chunk.toString();
      if (!quiet) process.stdout.write(text);
      seen += text;
      if (seen.includes("EMBEDDED_DB_READY")) {
        clearTimeout(timer);
        resolve();
      }
    });
    child.once("exit", (code) => {
      clearTimeout(timer);
      reject(new Error(`embedded database exited (${code}) before it was ready:\n${seen}`));
    });
  });
}

function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const force = setTimeout(() => child.kill("SIGKILL"), 15_000);
    child.once("exit", () => {
      clearTimeout(force);
      resolve();
    });
    child.kill("SIGTERM");
  });
}
