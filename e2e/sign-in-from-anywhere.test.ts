import type { Browser, Page } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "../prisma/seed/demo-people";
import { baseUrl, browserAvailable, launchBrowser, textOf } from "./support/session";

// Each role, its home after signing in, and a page deeper in the app it may open.
const ROLES = [
  { email: "clerk@quillfen.test", name: "Odile Farrant", home: "/", deep: "/intake/new" },
  { email: "technician@quillfen.test", name: "Bram Oyelaran", home: "/", deep: "/cells" },
  { email: "qa@quillfen.test", name: "Marit Calloway-Dunn", home: "/", deep: "/review" },
  { email: "admin@quillfen.test", name: "Teodor Wrenfield", home: "/", deep: "/admin/clients" },
  { email: "portal@ostrel.test", name: "Junia Castellar", home: "/portal", deep: "/portal/certificates" },
];

/** Types the e-mail and password into the sign-in form, as a person would, and sends it. */
async function typeSignIn(page: Page, email: string) {
  await page.waitForSelector('input[type="email"]');
  expect(new URL(page.url()).pathname).toBe("/sign-in");
  await page.type('input[type="email"]', email);
  await page.type('input[type="password"]', DEMO_PASSWORD);
  await page.click('button[type="submit"]');
}

/** The page shows the app (not a blank page): the person's name in the frame and a heading. */
async function expectLanded(page: Page, path: string, name: string) {
  await page.waitForFunction((p) => location.pathname === p, { timeout: 30_000 }, path);
  await page.waitForSelector('[data-testid="signed-in-as"]', { timeout: 30_000 });
  expect(await textOf(page, '[data-testid="signed-in-as"]')).toBe(name);
  expect((await textOf(page, "main h1")).length).toBeGreaterThan(0);
  expect((await page.evaluate(() => document.body.innerText.trim().length))).toBeGreaterThan(100);
}

describe.skipIf(!browserAvailable())("signing in as a newcomer would (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it.each(ROLES)("$email: from the address people type, from the sign-in page and from a deep link, lands with no blank page", async ({ email, name, home, deep }) => {
    for (const [start, expected] of [["/", home], ["/sign-in", home], [deep, deep]] as const) {
      const context = await browser.createBrowserContext();
      const page = await context.newPage();
      await page.goto(`${baseUrl()}${start}`);
      await typeSignIn(page, email);
      await expectLanded(page, expected, name).catch(async (error) => {
        await page.screenshot({ path: `tmp/e2e-sign-in-${email}-${start.replace(/\W+/g, "_")}.png`, fullPage: true });
        throw new Error(`${email} starting at ${start}: ${error instanceof Error ? error.message : error}`);
      });
      await context.close();
    }
  });
});
