import type { Browser } from "puppeteer";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD } from "../prisma/seed/demo-people";
import { baseUrl, browserAvailable, launchBrowser, textOf } from "./support/session";

const READINGS = 100_000;
const RUN = { id: "e2e-long-run", labNumber: "T25-77001" };

/**
 * A data-logger run of 100,000 readings (one every 3 minutes, about 208 days), written straight into the
 * database as the migration owner: typing them would take the test all day. Invented values.
 */
async function insertLongRun(ownerUrl: string) {
  const db = new pg.Client({ connectionString: ownerUrl, options: "-c TimeZone=UTC" });
  await db.connect();
  try {
    await db.query("BEGIN");
    await db.query(`SELECT set_config('seepline.actor_id', 'system:e2e', true)`);
    const tech = (await db.query<{ id: string }>(`SELECT id FROM "User" WHERE email = 'technician@quillfen.test'`)).rows[0]!.id;
    // Any specimen and cell of the demo will do: an approved run holds neither.
    const specimen = (await db.query<{ id: string }>(`SELECT id FROM "Specimen" ORDER BY "labNumber" LIMIT 1`)).rows[0]!.id;
    const cell = (await db.query<{ id: string }>(`SELECT id FROM "Equipment" WHERE kind = 'PERMEAMETER_CELL' ORDER BY "assetTag" LIMIT 1`)).rows[0]!.id;
    await db.query(`INSERT INTO "Equipment" (id, "assetTag", kind, name, "updatedAt") VALUES ('e2e-long-panel', 'BP-E2E', 'BURETTE_PANEL', 'Long-run burette panel', now())`);
    await db.query(`INSERT INTO "Calibration" (id, "equipmentId", "calibratedAt", "dueAt", reference, "performedBy", "values", "recordedById")
      VALUES ('e2e-long-cal', 'e2e-long-panel', timestamp '2024-12-01', timestamp '2030-01-01', 'CAL-E2E-LONG', 'Invented metrology', '{"inflowBuretteAreaM2": 3.14e-5, "outflowBuretteAreaM2": 3.12e-5}', $1)`, [tech]);
    await db.query(`INSERT INTO "Run" (id, "labNumber", "specimenId", "cellId", "methodCode", state, "performedById", "assignedAt", "updatedAt")
      VALUES ($1, $2, $3, $4, 'D5887', 'APPROVED', $5, timestamp '2025-01-01', now())`, [RUN.id, RUN.labNumber, specimen, cell, tech]);
    await db.query(`INSERT INTO "RunEquipment" ("runId", "equipmentId", "calibrationId", role) VALUES ($1, 'e2e-long-panel', 'e2e-long-cal', 'burette panel')`, [RUN.id]);
    await db.query(`INSERT INTO "RunStage" (id, "runId", sequence, kind, "cellPressurePa", "influentPressurePa", "effluentPressurePa", "startedAt", "recordedById")
      VALUES ('e2e-long-perm', $1, 1, 'PERMEATION', 550000, 530000, 516000, timestamp '2025-01-04', $2)`, [RUN.id, tech]);
    await db.query(`INSERT INTO "Reading" (id, "runId", sequence, "takenAt", "elapsedS", "inflowLevelMm", "outflowLevelMm", "inflowCumulativeMl", "outflowCumulativeMl", "headPa",
        "influentPressurePa", "effluentPressurePa", "cellPressurePa", "temperatureC", source, "recordedById")
      SELECT $1 || '-' || s, $1, s, timestamp '2025-01-04' + (s - 1) * interval '3 minutes', (s - 1) * 180, 452 - (s - 1) * 0.001, 18 + (s - 1) * 0.001,
             (s - 1) * 3.14e-5, (s - 1) * 3.12e-5, 14000, 530000, 516000, 550000, 20 + 0.3 * sin(s / 480.0), 'long-logger.csv', $2
      FROM generate_series(1, ${READINGS}) s`, [RUN.id, tech]);
    await db.query("COMMIT");
  } finally {
    await db.end();
  }
}

describe.skipIf(!browserAvailable())("a run of 100,000 readings opens with its charts drawn (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    await insertLongRun(inject("ownerDatabaseUrl"));
    browser = await launchBrowser();
  }, 300_000);
  afterAll(async () => {
    await browser?.close();
  });

  it("QA manager: signs in, finds the run in the runs list, opens it; a page of readings, charts downsampled, zoom into a range and out of the run", { timeout: 240_000 }, async () => {
    const page = await (await browser.createBrowserContext()).newPage();
    await page.goto(`${baseUrl()}/`);
    await page.waitForSelector('input[type="email"]');
    await page.type('input[type="email"]', "qa@quillfen.test");
    await page.type('input[type="password"]', DEMO_PASSWORD);
    await page.click('button[type="submit"]');
    await page.waitForSelector('[data-testid="signed-in-as"]', { timeout: 30_000 });

    await page.click('nav a[href="/runs"]');
    await page.waitForSelector('[data-testid="run-filters"]');
    await page.type("#run-filter-q", RUN.labNumber);
    await Promise.all([page.waitForNavigation(), page.click('[data-testid="run-filters"] button[type="submit"]')]);
    expect(await textOf(page, '[data-testid="list-total"]')).toBe("1–1 of 1 runs");

    const opened = Date.now();
    await Promise.all([page.waitForNavigation({ timeout: 120_000 }), page.click(`a[href="/runs/${RUN.labNumber}"]`)]);
    await page.waitForSelector('[data-testid="chart-flux"] .recharts-line path.recharts-curve', { timeout: 60_000 });
    const drawnMs = Date.now() - opened;
    console.log(`run page of ${READINGS.toLocaleString("en-GB")} readings: charts drawn ${drawnMs} ms after the click`);

    // The page as the server sends it (the live DOM also holds the drawn charts).
    const served = await page.evaluate(() => fetch(location.href).then((r) => r.text()).then((t) => new Blob([t]).size));
    expect(served).toBeLessThan(300 * 1024);
    expect(await textOf(page, '[data-testid="readings-pager"]')).toMatch(/^Readings 99,901–100,000 of 100,000, by elapsed time/);
    expect(await page.$$eval('[data-testid="readings-table"] tbody tr', (rows) => rows.length)).toBe(100);
    expect(await textOf(page, '[data-testid="chart-coverage"]')).toMatch(/^0\.1 h to 4999\.9 h of 0\.1 h to 4999\.9 h; (\d{3}|1,\d{3}) of 99,999 intervals drawn \(largest-triangle-three-buckets\)/);

    // Zoom into ten hours: every interval ending in them is drawn (201 at 3 minutes). The first interval ends at 0.05 h.
    await page.type("#zoom-from", "100");
    await page.type("#zoom-to", "110");
    await page.click("button::-p-text(Zoom)");
    await page.waitForFunction(() => document.querySelector('[data-testid="chart-coverage"]')?.textContent?.startsWith("100.0 h to 110.0 h"), { timeout: 60_000 });
    expect(await textOf(page, '[data-testid="chart-coverage"]')).toMatch(/every interval drawn \(201\)/);

    // A range past the end of the run: the span it has, and the charts left as they were.
    await page.$eval("#zoom-from", (el) => ((el as HTMLInputElement).value = ""));
    await page.click("#zoom-from", { count: 3 });
    await page.keyboard.press("Backspace");
    await page.type("#zoom-from", "6000");
    await page.click("#zoom-to", { count: 3 });
    await page.keyboard.press("Backspace");
    await page.type("#zoom-to", "7000");
    await page.click("button::-p-text(Zoom)");
    await page.waitForSelector('[data-testid="zoom-message"]', { timeout: 60_000 });
    expect(await textOf(page, '[data-testid="zoom-message"]')).toBe("This run's points span 0.1 h to 4999.9 h; choose a range inside it.");
    expect(await textOf(page, '[data-testid="chart-coverage"]')).toMatch(/^100\.0 h to 110\.0 h/);

    // Earlier readings are a link away.
    await Promise.all([page.waitForNavigation({ timeout: 120_000 }), page.click('[data-testid="readings-pager"] a::-p-text(« first)')]);
    expect(await textOf(page, '[data-testid="readings-pager"]')).toMatch(/^Readings 1–100 of 100,000/);
  });
});
