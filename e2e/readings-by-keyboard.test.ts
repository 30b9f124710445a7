import { mkdirSync } from "node:fs";
import type { Browser, Page } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { formatTypedTime } from "../lib/format/typed-time";
import { DEMO_LAB } from "../prisma/seed/demo-people";
import { chooseByName, fill, labDateTime, setValue } from "./support/forms";
import { cutAndPrepareSpecimen, recordStage, registerCalibratedCell } from "./support/run-steps";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, textOf } from "./support/session";

const DAY = 86_400_000;
const HOUR = 3_600_000;

/** Presses Tab until the focused element is the one labelled `label`; fails after `limit` presses. */
async function tabTo(page: Page, label: string, limit = 120): Promise<number> {
  for (let presses = 1; presses <= limit; presses++) {
    await page.keyboard.press("Tab");
    if (await page.evaluate((l) => document.activeElement?.getAttribute("aria-label") === l, label)) return presses;
  }
  throw new Error(`${label} not reached in ${limit} presses of Tab`);
}

const focusedLabel = (page: Page) => page.evaluate(() => document.activeElement?.getAttribute("aria-label") ?? document.activeElement?.tagName ?? "");

/** What the focused cell holds and whether all of it is selected (so typing replaces it). */
const focusedSelection = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement as HTMLInputElement;
    return { value: el.value, selected: el.value.length > 0 && el.selectionStart === 0 && el.selectionEnd === el.value.length };
  });

describe.skipIf(!browserAvailable())("a day of readings entered by keyboard alone (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("twelve readings with back-filled times, typed and saved with Ctrl+Enter without the mouse", async () => {
    try {
      await journey();
    } catch (error) {
      // What each open page showed when it failed (e2e/artifacts is git-ignored).
      mkdirSync("e2e/artifacts", { recursive: true });
      for (const [i, page] of (await browser.pages()).entries()) await page.screenshot({ path: `e2e/artifacts/readings-by-keyboard-${i}.png`, fullPage: true }).catch(() => undefined);
      throw error;
    }
  }, 300_000);

  async function journey() {
    const now = Date.now();
    const cellTag = `CELL-K${String(now).slice(-6)}`;
    const admin = await pageSignedInAs(browser, "admin@quillfen.test");
    await registerCalibratedCell(admin, cellTag, now);
    await admin.browserContext().close();

    // A run of its own, permeating since two days ago (set up with the mouse; the readings are what is tested).
    const tech = await pageSignedInAs(browser, "technician2@quillfen.test");
    const specimen = await cutAndPrepareSpecimen(tech, {
      rollNumber: "R-4108", position: "Edge, 200 mm from leading edge (keyboard journey)",
      cutAt: new Date(now - 6 * DAY), preparedAt: new Date(now - 5.5 * DAY), thicknessMm: "6.9", massG: "46.8",
    });
    await tech.goto(`${baseUrl()}/runs/new`);
    await chooseByName(tech, "specimenId", specimen);
    await chooseByName(tech, "cellId", cellTag);
    await chooseByName(tech, "burettePanelId", "BP-03");
    await chooseByName(tech, "transducerId", "PT-01");
    await chooseByName(tech, "thermometerId", "TH-01");
    await chooseByName(tech, "thicknessGaugeId", "TG-01");
    await chooseByName(tech, "timerId", "CLK-01");
    await fill(tech, "Effective stress (kPa)", "34.5");
    await setValue(tech, "Mounted at", labDateTime(new Date(now - 5 * DAY)));
    await tech.click("button::-p-text(Start the run)");
    await tech.waitForFunction(() => /^\/runs\/T\d{2}-\d{5}$/.test(location.pathname), { timeout: 30_000 });
    await recordStage(tech, "Saturation", ["345", "310", "310"], new Date(now - 4.8 * DAY));
    await tech.waitForFunction(() => (document.querySelector('[data-testid="stages"]')?.querySelectorAll("tbody tr").length ?? 0) === 1, { timeout: 30_000 });
    await recordStage(tech, "Equilibration", ["550", "515", "515"], new Date(now - 4.5 * DAY)); // a hold of more than two days
    await tech.waitForFunction(() => (document.querySelector('[data-testid="stages"]')?.querySelectorAll("tbody tr").length ?? 0) === 2, { timeout: 30_000 });
    const permeationStart = new Date(Math.floor((now - 2 * DAY) / HOUR) * HOUR);
    await recordStage(tech, "Permeation", ["550", "530", "515"], permeationStart);
    await tech.waitForSelector('[data-testid="readings-grid"]', { timeout: 30_000 });

    // From here on, the keyboard only: any mouse press on the page is counted and must stay at zero.
    await tech.reload();
    await tech.waitForSelector('[data-testid="readings-grid"]');
    await tech.evaluate(() => {
      (window as unknown as { mousePresses: number }).mousePresses = 0;
      addEventListener("mousedown", () => (window as unknown as { mousePresses: number }).mousePresses++, true);
    });
    await tabTo(tech, "Row 1 Time");

    // A day of readings every two hours, back-filled from an hour after permeation began. Invented levels on
    // burette panel BP-03: about 2 mm per reading in each burette.
    const times = Array.from({ length: 12 }, (_, k) => new Date(permeationStart.getTime() + HOUR + k * 2 * HOUR));
    const inflow = (k: number) => (470 - 2.1 * k).toFixed(1);
    const outflow = (k: number) => (30 + 2.0 * k).toFixed(1);
    for (const [k, at] of times.entries()) {
      const row = k + 1;
      expect(await focusedLabel(tech)).toBe(`Row ${row} Time`);
      if (k === 0) await tech.keyboard.type(formatTypedTime(at, DEMO_LAB.timeZone)); // "2026-11-30 14:30"
      else if (k === 1) await tech.keyboard.type(formatTypedTime(at, DEMO_LAB.timeZone).slice(11)); // "16:30": after the row above
      else expect(await focusedSelection(tech)).toEqual({ value: formatTypedTime(at, DEMO_LAB.timeZone), selected: true }); // the interval continued
      await tech.keyboard.press("Enter");
      await tech.keyboard.type(inflow(k));
      await tech.keyboard.press("Enter");
      await tech.keyboard.type(outflow(k));
      await tech.keyboard.press("Enter");
      if (k === 0) {
        for (const value of ["530", "515", "550", "20.0"]) {
          await tech.keyboard.type(value);
          await tech.keyboard.press("Enter");
        }
      } else {
        // Pressures and temperature carried over, each selected as Enter reaches it: typing would replace it.
        for (const value of ["530", "515", "550", "20.0"]) {
          expect(await focusedSelection(tech)).toEqual({ value, selected: true });
          await tech.keyboard.press("Enter");
        }
      }
      expect(await focusedLabel(tech)).toBe(`Row ${row} After refill`);
      await tech.keyboard.press("Enter"); // on the last cell: a new row, its time cell focused
    }
    // Row 13 was added by the last Enter and left blank: Ctrl+Enter saves the twelve.
    expect(await focusedLabel(tech)).toBe("Row 13 Time");
    await tech.keyboard.down("Control");
    await tech.keyboard.press("Enter");
    await tech.keyboard.up("Control");
    await tech.waitForFunction(() => document.querySelector('[data-testid="readings-announcer"]')?.textContent === "12 readings saved.", { timeout: 30_000 });
    await tech.waitForFunction(() => document.querySelectorAll('[data-testid="readings-table"] tbody tr[data-sequence]').length === 12, { timeout: 30_000 });
    const taken = await tech.$$eval('[data-testid="readings-table"] tbody tr[data-sequence] td:nth-child(2)', (cells) => cells.map((c) => c.textContent ?? ""));
    expect(taken.map((t) => t.slice(0, 16))).toEqual(times.map((t) => formatTypedTime(t, DEMO_LAB.timeZone)));
    expect(await tech.evaluate(() => (window as unknown as { mousePresses: number }).mousePresses)).toBe(0);
    expect(await textOf(tech, '[data-testid="readings-table"] tbody tr[data-sequence="12"]')).toContain(inflow(11));
    await tech.browserContext().close();
  }
});
