import { existsSync } from "node:fs";
import puppeteer from "puppeteer";
import { CHROMIUM_CANDIDATES, CHROMIUM_FLAGS } from "../../lib/server/pdf/chromium";

/** The run page's first chart line, as the end-to-end test waits for it. */
const DRAWN = '[data-testid="chart-flux"] .recharts-line path.recharts-curve';

/**
 * Milliseconds from the start of each navigation to `path` until headless Chromium has drawn the run page's
 * first chart (server time, transfer, hydration and drawing, from the page's own clock), one per look;
 * `beforeEach` runs before each look (to add a reading, say). The session's cookie header is set directly:
 * this measures drawing, not signing in.
 */
export async function chartDrawTimes(options: { baseUrl: string; cookie: string; path: string; looks: number; beforeEach?: () => Promise<void> }): Promise<number[]> {
  const executablePath = process.env.CHROME_PATH ?? CHROMIUM_CANDIDATES.find((p) => existsSync(p));
  if (!executablePath) throw new Error("the chart timing needs Chromium: install Debian's chromium or set CHROME_PATH.");
  const browser = await puppeteer.launch({ executablePath, headless: true, args: CHROMIUM_FLAGS });
  try {
    const page = await browser.newPage();
    const { hostname } = new URL(options.baseUrl);
    await browser.setCookie(...options.cookie.split("; ").map((pair) => {
      const eq = pair.indexOf("=");
      return { name: pair.slice(0, eq), value: pair.slice(eq + 1), domain: hostname, path: "/" };
    }));
    const times: number[] = [];
    for (let i = 0; i < options.looks; i++) {
      await options.beforeEach?.();
      await page.goto(`${options.baseUrl}${options.path}`, { waitUntil: "domcontentloaded", timeout: 120_000 });
      await page.waitForSelector(DRAWN, { timeout: 120_000 });
      times.push(await page.evaluate(() => performance.now()));
    }
    return times;
  } finally {
    await browser.close();
  }
}
