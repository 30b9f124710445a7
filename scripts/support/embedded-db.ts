import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import pg from "pg";
import { APP_ROLE, OWNER_ROLE } from "./database-roles";
import { BIN, ROOT } from "./paths";
import { findFreePort } from "./free-port";
import { applyMigrations } from "./prisma-cli";

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

/**
 * Sets the role of the embedded database's one shared session (scripts/support/embedded-roles.ts): every
 * connection, present and future, then acts as that role.
 */
export async function setEmbeddedRole(db: EmbeddedDb, role: typeof OWNER_ROLE | typeof APP_ROLE): Promise<void> {
  const client = new pg.Client({ connectionString: db.url });
  await client.connect();
  try {
    await client.query(`SET ROLE ${role}`);
  } finally {
    await client.end();
  }
}

/** Applies the migrations as the migration owner, then hands the session back to the app role. */
export async function migrateEmbeddedDb(db: EmbeddedDb): Promise<void> {
  await setEmbeddedRole(db, OWNER_ROLE);
  try {
    await applyMigrations(db.url);
  } finally {
    await setEmbeddedRole(db, APP_ROLE);
  }
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
