import type { ChildProcess } from "node:child_process";
import type { TestProject } from "vitest/node";
import { findFreePort } from "../scripts/support/free-port";
import { generateClientIfNeeded } from "../scripts/support/generate-client";
import { buildIfNeeded, startNext, waitForHealthy } from "../scripts/support/next-app";
import { createTestDatabase } from "../tests/support/test-database";
import { findBrowser } from "./support/find-browser";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    browserPath: string;
    /** The app's database as its runtime role, and as the migration owner (the probe's direct SQL). */
    appDatabaseUrl: string;
    ownerDatabaseUrl: string;
    databaseMode: "external" | "embedded";
  }
}

/**
 * Starts the production build of the app on a fresh, seeded database of its own, for headless Chromium.
 * Without a browser the end-to-end tests are skipped, loudly; SEEPLINE_REQUIRE_BROWSER=1 (set by CI)
 * turns that into a failure.
 */
export default async function setup(project: TestProject) {
  const browserPath = findBrowser();
  if (!browserPath) {
    if (process.env.SEEPLINE_REQUIRE_BROWSER === "1") throw new Error("end-to-end tests need Chromium: install Debian's chromium or set CHROME_PATH.");
    console.warn("\n*** END-TO-END TESTS SKIPPED: no Chromium found (install Debian's chromium or set CHROME_PATH). ***\n");
    project.provide("browserPath", "");
    project.provide("baseUrl", "");
    project.provide("appDatabaseUrl", "");
    project.provide("ownerDatabaseUrl", "");
    project.provide("databaseMode", "embedded");
    return;
  }

  await generateClientIfNeeded();
  const db = await createTestDatabase("e2e");
  const { seedIfEmpty } = await import("../prisma/seed");
  await seedIfEmpty(db.url);
  await buildIfNeeded((line) => console.log(line));

  const port = await findFreePort();
  const baseUrl = `http://localhost:${port}`;
  // One trusted reverse proxy: the probe (e2e/probe) plays clients at other addresses with X-Forwarded-For.
  const app: ChildProcess = startNext(
    { port, databaseUrl: db.url, databaseMode: db.mode, authSecret: "end-to-end-tests-only-secret-0123456789", baseUrl, trustedProxies: 1 },
    { quiet: true },
  );
  let appErrors = "";
  app.stderr?.on("data", (chunk) => (appErrors += chunk));
  try {
    await waitForHealthy(baseUrl, 120_000);
  } catch (error) {
    app.kill("SIGKILL");
    await db.drop();
    throw new Error(`${error instanceof Error ? error.message : error}\n${appErrors}`);
  }
  console.log(`end-to-end tests: app at ${baseUrl} on a ${db.mode} database, browser ${browserPath}`);
  project.provide("browserPath", browserPath);
  project.provide("baseUrl", baseUrl);
  project.provide("appDatabaseUrl", db.url);
  project.provide("ownerDatabaseUrl", db.ownerUrl);
  project.provide("databaseMode", db.mode);

  return async () => {
    const exited = new Promise((resolve) => app.once("exit", resolve));
    app.kill("SIGTERM");
    await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
    await db.drop();
  };
}
