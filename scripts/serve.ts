// `npm start` after the dependencies are in place: Prisma client, database (embedded unless DATABASE_URL),
// migrations, demo seed when empty, production build when the sources changed, then the app itself.
import type { ChildProcess } from "node:child_process";
import { resolveAuthSecret } from "./support/auth-secret";
import { describeRole } from "./support/database-roles";
import { migrateEmbeddedDb, startEmbeddedDb, type EmbeddedDb } from "./support/embedded-db";
import { isPortFree } from "./support/free-port";
import { generateClientIfNeeded } from "./support/generate-client";
import { buildIfNeeded, startNext, waitForHealthy } from "./support/next-app";
import { EMBEDDED_DB_DIR } from "./support/paths";
import { migrationsUpToDate } from "./support/migration-status";
import { applyMigrations } from "./support/prisma-cli";
import { DEMO_CLIENTS, DEMO_PASSWORD, DEMO_STAFF } from "../prisma/seed/demo-people";

const log = (line: string) => console.log(`Seepline: ${line}`);
let embedded: EmbeddedDb | null = null;
let app: ChildProcess | null = null;

async function main() {
  const port = Number(process.env.PORT ?? 3000);
  if (!Number.isInteger(port) || port < 1 || port > 65535) throw new Error(`PORT must be a port number, got "${process.env.PORT}".`);
  if (!(await isPortFree(port))) throw new Error(`port ${port} is already in use; stop what uses it or start with PORT=<another port>.`);

  if (await generateClientIfNeeded()) log("Prisma client generated.");

  const external = process.env.DATABASE_URL;
  let databaseUrl: string;
  if (external) {
    databaseUrl = external;
    log("using the PostgreSQL server in DATABASE_URL (the embedded database is not started).");
  } else {
    log(`no DATABASE_URL: starting the embedded PostgreSQL (PGlite) on its data folder ${EMBEDDED_DB_DIR}`);
    embedded = await startEmbeddedDb(EMBEDDED_DB_DIR, { quiet: true });
    databaseUrl = embedded.url;
  }

  const migrationUrl = embedded ? embedded.url : process.env.MIGRATION_DATABASE_URL || databaseUrl;
  const checkStarted = performance.now();
  // The migration tool takes seconds to start; one query says whether it has anything to do.
  if (await migrationsUpToDate(migrationUrl)) log(`no migration pending (checked in ${Math.round(performance.now() - checkStarted)} ms).`);
  else {
    log("applying migrations...");
    if (embedded) await migrateEmbeddedDb(embedded);
    else await applyMigrations(migrationUrl);
  }
  if (!embedded) await refuseOwnerRole(databaseUrl);

  const wantDemo = !external || process.env.SEEPLINE_SEED_DEMO === "1";
  if (wantDemo) {
    const { seedIfEmpty } = await import("../prisma/seed");
    if (await seedIfEmpty(databaseUrl)) log("empty database: demo scenario seeded.");
  }

  const secret = resolveAuthSecret();
  if (secret.source !== "environment") {
    if (external && !isLoopback(external))
      throw new Error("NEXTAUTH_SECRET must be set when the database is a shared server: every instance has to sign sessions with the same secret.");
    if (secret.source === "generated") log("generated a local session secret in .data/auth-secret (set NEXTAUTH_SECRET in production).");
  }

  await buildIfNeeded(log);

  const baseUrl = process.env.NEXTAUTH_URL ?? `http://localhost:${port}`;
  app = startNext({ port, databaseUrl, databaseMode: external ? "external" : "embedded", authSecret: secret.secret, baseUrl });
  app.on("exit", (code) => {
    if (!stopping) {
      log(`the app stopped unexpectedly (exit ${code}).`);
      void shutdown(1);
    }
  });
  await waitForHealthy(`http://127.0.0.1:${port}`);
  printBanner(baseUrl, wantDemo);
}

// The app's own connection must not be able to switch off the record's protections (README, "Production").
async function refuseOwnerRole(databaseUrl: string) {
  const role = await describeRole(databaseUrl);
  if (!role.superuser && !role.ownsTables) return;
  const what = role.superuser ? "a superuser" : "the owner of the tables";
  const message = `DATABASE_URL signs in as ${role.role}, ${what}, so the app could switch off the database's protections. Give the app the runtime role and the migrations the owner (MIGRATION_DATABASE_URL); see README, "Production".`;
  if (process.env.SEEPLINE_ALLOW_OWNER_DATABASE_ROLE !== "1") throw new Error(`${message} (SEEPLINE_ALLOW_OWNER_DATABASE_ROLE=1 starts anyway.)`);
  log(`WARNING: ${message}`);
}

function isLoopback(url: string): boolean {
  try {
    return ["localhost", "127.0.0.1", "[::1]", "::1"].includes(new URL(url).hostname);
  } catch {
    return false;
  }
}

function printBanner(baseUrl: string, demo: boolean) {
  const lines = [`Seepline is running at ${baseUrl}`, ""];
  if (demo) {
    lines.push(`Demo sign-ins (password for all: ${DEMO_PASSWORD}):`);
    for (const u of DEMO_STAFF) lines.push(`  ${u.role.padEnd(13)} ${u.email.padEnd(28)} ${u.name}`);
    for (const c of DEMO_CLIENTS) lines.push(`  ${"CLIENT_USER".padEnd(13)} ${c.user.email.padEnd(28)} ${c.user.name}, ${c.name}`);
    lines.push("");
  }
  lines.push("Press Ctrl-C to stop the app and everything it started.");
  console.log(`\n${lines.join("\n")}\n`);
}

let stopping = false;
async function shutdown(code: number) {
  if (stopping) return;
  stopping = true;
  if (app && app.exitCode === null) {
    const exited = new Promise((resolve) => app!.once("exit", resolve));
    app.kill("SIGTERM");
    await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
  }
  if (embedded) await embedded.stop();
  process.exit(code);
}

process.on("SIGINT", () => void shutdown(0));
process.on("SIGTERM", () => void shutdown(0));

main().catch(async (error) => {
  console.error(`Seepline could not start: ${error instanceof Error ? error.message : error}`);
  await shutdown(1);
});
