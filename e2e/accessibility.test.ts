import type { Browser, Page } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { can, type RoleName } from "../lib/policy/permissions";
import { DEMO_PASSWORD } from "../prisma/seed/demo-people";
import { describeFindings, failing, type Finding, pageLinks, pageMatchers, patternOf, scan, settle } from "./support/accessibility";
import { baseUrl, browserAvailable, launchBrowser } from "./support/session";

/*
 * axe-core on every page of every role, found by following the links each role sees (one address per
 * page), in the states that matter: each page as it opens, with its disclosures (<details>) open, each
 * "new" form sent empty (errors shown), the sign-in form refused, and the readings grid with a row refused
 * in the browser and by the server. Any serious or critical violation fails; moderate and minor ones fail
 * too unless ALLOWED_FINDINGS lists the rule with its reason. Nothing is saved.
 */
const ROLES: Array<{ email: string; role: RoleName }> = [
  { email: "clerk@quillfen.test", role: "INTAKE_CLERK" },
  { email: "technician@quillfen.test", role: "TECHNICIAN" },
  { email: "qa@quillfen.test", role: "QA_MANAGER" },
  { email: "admin@quillfen.test", role: "LAB_ADMIN" },
  { email: "portal@marrowdale.test", role: "CLIENT_USER" },
];

const matchers = pageMatchers();
const visitedBy = new Map<string, Set<string>>();

async function typeSignIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.waitForSelector('input[type="email"]');
  await page.type('input[type="email"]', email);
  await page.type('input[type="password"]', password);
  await page.keyboard.press("Enter");
}

/** Opens every closed disclosure on the page; true when there was one. */
async function openDisclosures(page: Page): Promise<boolean> {
  return page.$$eval("main details:not([open])", (all) => {
    for (const d of all) (d as HTMLDetailsElement).open = true;
    return all.length > 0;
  });
}

/** Sends the page's first form in main empty, by its submit button, and waits for the errors to show. */
async function sendEmptyForm(page: Page): Promise<boolean> {
  const button = await page.$('main form button[type="submit"], main form button:not([type])');
  if (!button) return false;
  await button.click();
  await page.waitForSelector('main [aria-invalid="true"], main [role="alert"]', { timeout: 10_000 }).catch(() => undefined);
  return true;
}

/** Follows every link the role sees from its start page, one address per page, scanning each. */
/** How many further addresses of an already scanned page are opened for their links. */
const HARVEST_PER_PAGE = 6;

async function crawl(page: Page, role: string, start: string, expected: readonly string[]): Promise<Finding[]> {
  const origin = new URL(baseUrl()).origin;
  const visited = new Set<string>();
  visitedBy.set(role, visited);
  const findings: Finding[] = [];
  const opened = new Set<string>();
  // Another address of a page already scanned is opened only for its links, and only while some page the
  // role may open is unreached: a roll with index tests links pages that the first roll opened may not.
  const harvested = new Map<string, number>();
  const sentEmpty = new Set<string>();
  const worthOpening = (pattern: string) => !visited.has(pattern) || ((harvested.get(pattern) ?? 0) < HARVEST_PER_PAGE && expected.some((p) => !visited.has(p)));
  const queue = [start];
  while (queue.length) {
    const address = queue.shift()!;
    const pattern = patternOf(new URL(address, origin).pathname, matchers);
    if (!pattern || opened.has(address) || !worthOpening(pattern)) continue;
    opened.add(address);
    const response = await page.goto(`${origin}${address}`, { waitUntil: "load" });
    await settle(page);
    const landed = patternOf(new URL(page.url()).pathname, matchers);
    if (!landed || (response && response.status() >= 400)) continue;
    if (visited.has(landed)) harvested.set(landed, (harvested.get(landed) ?? 0) + 1);
    else {
      visited.add(landed);
      findings.push(...(await scan(page, "as opened")));
      if (await openDisclosures(page)) findings.push(...(await scan(page, "disclosures open")));
    }
    for (const link of await pageLinks(page, origin)) {
      const target = patternOf(link.split("?")[0]!, matchers);
      if (target && !opened.has(link) && worthOpening(target)) queue.push(link);
    }
    // Sent empty once per form, from its plain address: one reached with choices made in the address (a
    // specimen to mount, say) is not empty, and sending it would really save.
    if (landed.endsWith("/new") && !address.includes("?") && !sentEmpty.has(landed)) {
      sentEmpty.add(landed);
      if (await sendEmptyForm(page)) {
        await settle(page);
        findings.push(...(await scan(page, "sent empty")));
      }
    }
  }
  return findings;
}

/** A cell of the entry grid by its label (a CSS selector: the labels hold parentheses). */
const cell = (label: string) => `[data-testid="readings-grid"] input[aria-label="${label}"]`;

/** The run page with the entry grid (a permeating run of this technician), found by following the runs list. */
async function findEntryGrid(page: Page): Promise<boolean> {
  await page.goto(`${baseUrl()}/runs`);
  const runs = await page.$$eval('a[href^="/runs/"]', (as) => [...new Set(as.map((a) => a.getAttribute("href")!).filter((h) => /^\/runs\/[A-Z]\d{2}-\d{5}$/.test(h)))]);
  for (const run of runs) {
    await page.goto(`${baseUrl()}${run}`);
    await settle(page, '[data-testid="readings-grid"]'); // hydrated: the grid's keys work
    if (await page.$('[data-testid="readings-grid"]')) return true;
  }
  return false;
}

describe.skipIf(!browserAvailable())("accessibility of every page (axe-core, headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("signed out: sign-in (also refused) and certificate verification", async () => {
    const context = await browser.createBrowserContext();
    const page = await context.newPage();
    const findings: Finding[] = [];
    await page.goto(`${baseUrl()}/`);
    await settle(page);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    findings.push(...(await scan(page, "as opened")));
    await page.click('button[type="submit"]');
    await page.waitForSelector('[aria-invalid="true"]');
    findings.push(...(await scan(page, "sent empty")));
    await typeSignIn(page, "nobody@quillfen.test", "not-the-password");
    await page.waitForSelector('[role="alert"]', { timeout: 30_000 });
    findings.push(...(await scan(page, "refused")));
    await page.goto(`${baseUrl()}/verify`);
    findings.push(...(await scan(page, "as opened")));
    await page.type("::-p-aria(Verification code)", "not a code!");
    await page.keyboard.press("Enter");
    await page.waitForSelector('[role="alert"]');
    findings.push(...(await scan(page, "refused")));
    await context.close();
    expect(failing(findings), describeFindings(failing(findings))).toEqual([]);
  });

  it.each(ROLES)("$role: every page it may open, as opened and in its states", { timeout: 600_000 }, async ({ email, role }) => {
    const context = await browser.createBrowserContext();
    const page = await context.newPage();
    await page.setViewport({ width: 1280, height: 900 });
    await page.goto(`${baseUrl()}/`);
    await typeSignIn(page, email);
    await page.waitForSelector('[data-testid="signed-in-as"]', { timeout: 30_000 });
    const start = new URL(page.url()).pathname;
    const expected = matchers.filter((m) => m.declared && can(role, m.declared as Parameters<typeof can>[1])).map((m) => m.pattern);
    const findings = await crawl(page, role, start, expected);

    if (role !== "CLIENT_USER") {
      // An unknown lab number typed into the search box: the search page says so.
      await page.goto(`${baseUrl()}/`);
      await page.type("::-p-aria(Find by lab number)", "R26-99999");
      await page.keyboard.press("Enter");
      await page.waitForFunction(() => location.pathname === "/search", { timeout: 30_000 });
      await settle(page);
      visitedBy.get(role)!.add("/search");
      findings.push(...(await scan(page, "lab number not found")));
    }

    if (role === "TECHNICIAN") {
      expect(await findEntryGrid(page), "a permeating run with the entry grid").toBe(true);
      // A value the browser refuses: the row is marked, its cells say why, a summary links to them.
      await page.type(cell("Row 1 Inflow level (mm)"), "lots");
      await page.keyboard.down("Control");
      await page.keyboard.press("Enter");
      await page.keyboard.up("Control");
      await page.waitForSelector('[data-testid="readings-grid"] [aria-invalid="true"]');
      findings.push(...(await scan(page, "readings grid: row refused in the browser")));
      await (await page.$("form[aria-label='Enter readings']"))?.screenshot({ path: "e2e/artifacts/readings-grid-refused-in-browser.png" });
      // A row the server refuses (a time before the run began): the refusal is announced.
      await page.click(cell("Row 1 Inflow level (mm)"), { count: 3 });
      await page.type(cell("Row 1 Inflow level (mm)"), "400");
      await page.type(cell("Row 1 Outflow level (mm)"), "100");
      await page.click(cell("Row 1 Time"), { count: 3 });
      await page.type(cell("Row 1 Time"), "2026-01-02 08:00");
      await page.keyboard.down("Control");
      await page.keyboard.press("Enter");
      await page.keyboard.up("Control");
      await page.waitForFunction(() => (document.querySelector('[data-testid="readings-announcer"]')?.textContent ?? "").length > 0, { timeout: 30_000 });
      findings.push(...(await scan(page, "readings grid: row refused by the server")));
      await (await page.$("form[aria-label='Enter readings']"))?.screenshot({ path: "e2e/artifacts/readings-grid-refused-by-server.png" });
    }

    // Every page the role may open was reached by following links.
    const visited = visitedBy.get(role)!;
    expect(expected.filter((p) => !visited.has(p)), `${role}: pages not reached`).toEqual([]);
    await context.close();
    expect(failing(findings), describeFindings(failing(findings))).toEqual([]);
  });
});
