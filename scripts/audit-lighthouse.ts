/*
 * Lighthouse 12 (desktop preset) on the production build: accessibility and best-practices scores of
 * sign-in, each role's start page, a list, a run page, a certificate page and a portal project page, with
 * every audit that fell short. A measurement, not a test: `npm run audit:lighthouse` (DATABASE_URL names a
 * PostgreSQL server for a throw-away database beside it; without it, an embedded one). Debian's Chromium is
 * started by chrome-launcher; the person signs in by typing in a puppeteer page of the same browser, whose
 * cookies Lighthouse keeps (disableStorageReset). Goal: 100 and 100 on every page.
 */
import { existsSync } from "node:fs";
import puppeteer, { type Page } from "puppeteer";
import { CHROMIUM_CANDIDATES, CHROMIUM_FLAGS } from "../lib/server/pdf/chromium";
import { DEMO_PASSWORD } from "../prisma/seed/demo-people";
import { createTestDatabase } from "../tests/support/test-database";
import { findFreePort } from "./support/free-port";
import { generateClientIfNeeded } from "./support/generate-client";
import { buildIfNeeded, startNext, waitForHealthy } from "./support/next-app";

type Target = { name: string; path: string };
type Score = { name: string; path: string; accessibility: number; bestPractices: number; shortfalls: string[] };

const CATEGORIES = ["accessibility", "best-practices"] as const;

async function signIn(page: Page, base: string, email: string): Promise<void> {
  const client = await page.createCDPSession();
  await client.send("Network.clearBrowserCookies");
  await client.detach();
  await page.goto(`${base}/sign-in`);
  await page.waitForSelector('input[type="email"]');
  await page.type('input[type="email"]', email);
  await page.type('input[type="password"]', DEMO_PASSWORD);
  await page.keyboard.press("Enter");
  await page.waitForSelector('[data-testid="signed-in-as"]', { timeout: 60_000 });
}

/** The first link on `from` whose address matches `pattern`: pages are found as a person finds them. */
async function firstLink(page: Page, base: string, from: string, pattern: RegExp): Promise<string> {
  await page.goto(`${base}${from}`);
  const hrefs = await page.$$eval("a[href]", (as) => as.map((a) => a.getAttribute("href") ?? ""));
  const found = hrefs.find((h) => pattern.test(h));
  if (!found) throw new Error(`no link matching ${pattern} on ${from}`);
  return found;
}

/** What an audit found, briefly: the first few rows of its details (issue types, nodes, URLs). */
function describeItems(details: unknown): string {
  const items = (details as { items?: Array<Record<string, unknown>> } | undefined)?.items ?? [];
  return items.slice(0, 4).map((item) => `\n      ${JSON.stringify(item).slice(0, 400)}`).join("");
}

async function main() {
  const chromePath = process.env.CHROME_PATH ?? CHROMIUM_CANDIDATES.find((p) => existsSync(p));
  if (!chromePath) throw new Error("Lighthouse needs Chromium: install Debian's chromium or set CHROME_PATH.");
  const { default: lighthouse, desktopConfig } = await import("lighthouse");
  const chromeLauncher = await import("chrome-launcher");

  await generateClientIfNeeded();
  const db = await createTestDatabase("lighthouse");
  const { seedIfEmpty } = await import("../prisma/seed");
  await seedIfEmpty(db.url);
  await buildIfNeeded();
  const port = await findFreePort();
  const base = `http://localhost:${port}`;
  const app = startNext({ port, databaseUrl: db.url, databaseMode: db.mode, authSecret: "lighthouse-audit-only-secret-0123456789", baseUrl: base }, { quiet: true });
  const chrome = await chromeLauncher.launch({ chromePath, chromeFlags: ["--headless=new", ...CHROMIUM_FLAGS] });
  const scores: Score[] = [];
  try {
    await waitForHealthy(base);
    const browser = await puppeteer.connect({ browserURL: `http://127.0.0.1:${chrome.port}`, defaultViewport: null });
    const page = await browser.newPage();

    const audit = async (targets: Target[]) => {
      for (const target of targets) {
        const result = await lighthouse(`${base}${target.path}`, { port: chrome.port, output: "json", logLevel: "error", onlyCategories: [...CATEGORIES], disableStorageReset: true }, desktopConfig);
        if (!result) throw new Error(`Lighthouse gave no result for ${target.path}`);
        const { categories, audits } = result.lhr;
        const shortfalls = CATEGORIES.flatMap((c) =>
          (categories[c]?.auditRefs ?? [])
            .filter((ref) => ref.weight > 0 && audits[ref.id]?.score !== null && (audits[ref.id]?.score ?? 1) < 1)
            .map((ref) => `${c}: ${ref.id} (${audits[ref.id]?.title})${describeItems(audits[ref.id]?.details)}`),
        );
        scores.push({ ...target, accessibility: Math.round((categories.accessibility?.score ?? 0) * 100), bestPractices: Math.round((categories["best-practices"]?.score ?? 0) * 100), shortfalls });
      }
    };

    await audit([{ name: "sign-in (signed out)", path: "/sign-in" }]);
    await signIn(page, base, "clerk@quillfen.test");
    await audit([{ name: "intake clerk: start page", path: "/" }, { name: "intake clerk: rolls list", path: "/samples" }]);
    await signIn(page, base, "technician@quillfen.test");
    const run = await firstLink(page, base, "/runs", /^\/runs\/T\d{2}-\d{5}$/);
    await audit([{ name: "technician: start page", path: "/" }, { name: "technician: run page", path: run }]);
    await signIn(page, base, "qa@quillfen.test");
    const certificate = await firstLink(page, base, "/certificates", /^\/certificates\/(?!new)[^/?]+$/);
    await audit([{ name: "QA manager: start page", path: "/" }, { name: "QA manager: certificate page", path: certificate }]);
    await signIn(page, base, "admin@quillfen.test");
    await audit([{ name: "lab administrator: start page", path: "/" }]);
    await signIn(page, base, "portal@marrowdale.test");
    const project = await firstLink(page, base, "/portal", /^\/portal\/projects\/[^/?]+$/);
    await audit([{ name: "client: portal start page", path: "/portal" }, { name: "client: portal project page", path: project }]);
    await browser.disconnect();
  } finally {
    chrome.kill();
    app.kill("SIGTERM");
    await new Promise((r) => setTimeout(r, 1000));
    await db.drop();
  }

  console.log(`\nLighthouse 12, desktop preset (goal: 100 / 100)\n`);
  console.log(`${"page".padEnd(36)} ${"address".padEnd(32)} access.  best pr.`);
  for (const s of scores) console.log(`${s.name.padEnd(36)} ${s.path.padEnd(32)} ${String(s.accessibility).padStart(7)}  ${String(s.bestPractices).padStart(7)}`);
  const short = scores.filter((s) => s.shortfalls.length);
  for (const s of short) console.log(`\n${s.name} (${s.path}):\n  ${s.shortfalls.join("\n  ")}`);
  process.exitCode = short.length ? 1 : 0;
}

main().catch((error) => {
  console.error(error instanceof Error ? error.stack : error);
  process.exit(1);
});
