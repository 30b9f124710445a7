import { mkdirSync } from "node:fs";
import type { Browser, Page } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { chooseByName, fill, labDateTime, setValue } from "./support/forms";
import { cutAndPrepareSpecimen, pdfText, recordStage } from "./support/run-steps";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, textOf } from "./support/session";

const DAY = 86_400_000;
const HOUR = 3_600_000;
const isoDay = (d: Date) => d.toISOString().slice(0, 10);

/** The grid's input for one cell, by its aria-label ("Row 3 Inflow level (mm)"). */
async function gridInput(page: Page, label: string) {
  const input = await page.waitForSelector(`[data-testid="readings-grid"] input[aria-label="${label}"]`);
  if (!input) throw new Error(`no grid cell ${label}`);
  return input;
}

/** Types one grid row: the time, both burette levels, and the refill mark when it follows a refill. */
async function typeRow(page: Page, row: number, takenAt: Date, inflow: string, outflow: string, afterRefill = false) {
  await (await gridInput(page, `Row ${row} Time`)).evaluate((el, v) => {
    Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value")!.set!.call(el, v);
    el.dispatchEvent(new Event("input", { bubbles: true }));
    el.dispatchEvent(new Event("change", { bubbles: true }));
  }, labDateTime(takenAt));
  for (const [label, value] of [[`Row ${row} Inflow level (mm)`, inflow], [`Row ${row} Outflow level (mm)`, outflow]] as const) {
    const input = await gridInput(page, label);
    await input.click({ count: 3 });
    await input.type(value);
  }
  if (afterRefill) await (await gridInput(page, `Row ${row} After refill`)).click();
}

// Invented scale readings (mm) on demo burette panel BP-02 (31.4 / 31.2 mm², outflow zero 40 mm above the
// datum): steady flow about 12 mm per 6 h in each burette; refilled and drained just after 18 h.
const READINGS: Array<[hours: number, inflow: string, outflow: string, afterRefill?: boolean]> = [
  [0, "452.0", "18.0"], [6, "440.0", "30.0"], [12, "428.1", "41.9"], [18, "416.3", "53.7"], [18.1, "480.0", "10.0", true],
  [24, "468.0", "22.0"], [30, "456.1", "33.9"], [36, "444.3", "45.7"], [42, "432.6", "57.4"],
];

describe.skipIf(!browserAvailable())("every number computed as the apparatus works (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("a cell with its leakage check; D5887 permeation at the method's pressures needs no acknowledgement; readings with a level difference and a refill are computed by method C; QA approves; the certificate names the criteria version, the uncertainty's contributors and no deviation", async () => {
    try {
      await journey();
    } catch (error) {
      // What each open page showed when it failed, for whoever reads the failure (e2e/artifacts is git-ignored).
      mkdirSync("e2e/artifacts", { recursive: true });
      for (const [i, page] of (await browser.pages()).entries()) await page.screenshot({ path: `e2e/artifacts/apparatus-fidelity-${i}.png`, fullPage: true }).catch(() => undefined);
      throw error;
    }
  }, 300_000);

  async function journey() {
    const now = Date.now();
    const cellTag = `CELL-E${String(now).slice(-6)}`;

    // --- The administrator registers a cell and records its calibration with an apparatus leakage check.
    const admin = await pageSignedInAs(browser, "admin@quillfen.test");
    await admin.goto(`${baseUrl()}/equipment/new`);
    await fill(admin, "Asset tag", cellTag);
    await fill(admin, "Name", "Flexible-wall permeameter cell, end-to-end test");
    await fill(admin, "Rated maximum pressure", "1000");
    await admin.click("button::-p-text(Register equipment)");
    await admin.waitForFunction((t) => location.pathname === `/equipment/${t}`, { timeout: 30_000 }, cellTag);
    await setValue(admin, "Calibrated on", isoDay(new Date(now - 10 * DAY)));
    await setValue(admin, "Next due", isoDay(new Date(now + 300 * DAY)));
    await fill(admin, "Certificate reference", `CAL-${cellTag}`);
    await fill(admin, "Performed by", "Haldrow Metrology (invented)");
    await setValue(admin, "Checked on", isoDay(new Date(now - 10 * DAY)));
    await fill(admin, "Leakage rate", "1e-13");
    await fill(admin, "How it was checked", "impermeable dummy specimen at 550 kPa for 24 h");
    await admin.click("button::-p-text(Record calibration)");
    await admin.waitForFunction(() => document.querySelector('[data-testid="calibration-history"]')?.textContent?.includes("leakage 1.0 × 10⁻¹³ m³/s"), { timeout: 30_000 });
    await admin.browserContext().close();

    // --- The technician cuts a coupon from a demo roll, prepares a specimen and mounts it in that cell with
    // calibrated instruments, each at the time entered, before the stages below.
    const tech = await pageSignedInAs(browser, "technician2@quillfen.test");
    const specimen = await cutAndPrepareSpecimen(tech, {
      rollNumber: "R-4108", position: "Centre, 300 mm from leading edge (apparatus journey)",
      cutAt: new Date(now - 7 * DAY), preparedAt: new Date(now - 6.5 * DAY), thicknessMm: "6.8", massG: "46.4",
    });

    await tech.goto(`${baseUrl()}/runs/new`);
    await chooseByName(tech, "specimenId", specimen);
    await chooseByName(tech, "cellId", cellTag);
    await chooseByName(tech, "burettePanelId", "BP-02");
    await chooseByName(tech, "transducerId", "PT-01");
    await chooseByName(tech, "thermometerId", "TH-01");
    await chooseByName(tech, "thicknessGaugeId", "TG-01");
    await chooseByName(tech, "timerId", "CLK-01");
    await fill(tech, "Effective stress (kPa)", "34.5");
    await setValue(tech, "Mounted at", labDateTime(new Date(now - 6 * DAY)));
    await tech.click("button::-p-text(Start the run)");
    await tech.waitForFunction(() => /^\/runs\/T\d{2}-\d{5}$/.test(location.pathname), { timeout: 30_000 });
    const runNumber = tech.url().split("/").pop()!;

    // --- Stages at the pressures of the method (common practice): no departure to acknowledge, no deviation.
    const permeationStart = new Date(now - 3 * DAY);
    await recordStage(tech, "Saturation", ["345", "310", "310"], new Date(now - 5.5 * DAY));
    await tech.waitForFunction(() => (document.querySelector('[data-testid="stages"]')?.querySelectorAll("tbody tr").length ?? 0) === 1, { timeout: 30_000 });
    await recordStage(tech, "Equilibration", ["550", "515", "515"], new Date(now - 5 * DAY));
    await tech.waitForFunction(() => (document.querySelector('[data-testid="stages"]')?.querySelectorAll("tbody tr").length ?? 0) === 2, { timeout: 30_000 });
    await recordStage(tech, "Permeation", ["550", "530", "515"], permeationStart);
    await tech.waitForSelector('[data-testid="readings-grid"]', { timeout: 30_000 });
    expect(await tech.$('[data-testid="margin-warning"]')).toBeNull();
    expect(await textOf(tech, '[data-testid="stages"]')).not.toContain("departure acknowledged");

    // --- Readings typed into the grid: levels tens of centimetres apart, and a refill after 18 h.
    for (const [label, value] of [["Row 1 Influent (kPa)", "530"], ["Row 1 Effluent (kPa)", "515"], ["Row 1 Cell (kPa)", "550"], ["Row 1 Temp. (°C)", "20.0"]]) await (await gridInput(tech, label!)).type(value!);
    for (let i = 1; i < READINGS.length; i++) await tech.click("button::-p-text(Add a row)");
    for (const [i, [hours, inflow, outflow, refill]] of READINGS.entries()) await typeRow(tech, i + 1, new Date(permeationStart.getTime() + hours * HOUR), inflow, outflow, refill);
    await tech.click(`button::-p-text(Save ${READINGS.length} readings)`);
    await tech.waitForFunction((n) => document.querySelector('[role="status"]')?.textContent?.includes(`${n} readings saved`), { timeout: 30_000 }, READINGS.length);
    await tech.waitForSelector('[data-testid="calculation"]', { timeout: 30_000 });
    expect(await textOf(tech, '[data-testid="calculation"]')).toMatch(/^Falling head, rising tail \(ASTM D5084 method C\)\. .*zeros 0 mm and 40 mm above it/);
    expect(await textOf(tech, '[data-testid="evaluation-basis"]')).toMatch(/1 refill or drain: no interval spans one/);
    expect(await textOf(tech, '[data-testid="reading-after-refill"]')).toBe("after refill");
    expect(await tech.$$eval('[data-testid="chart-flux"] .recharts-reference-line', (lines) => lines.length)).toBe(1);
    expect(await textOf(tech, '[data-testid="criteria-verdict"]')).toBe("all met");
    expect(await textOf(tech, '[data-testid="trend-numbers"]')).toMatch(/^p = [\d.e-]+.*\nchange [\d.]+ %/s);

    // --- Terminate, post-test data, submit.
    await tech.click("button::-p-text(Terminate: criteria met)");
    await tech.waitForSelector('form[aria-label="Post-test data"]', { timeout: 30_000 });
    await fill(tech, "Bentonite layer thickness (mm)", "5.9");
    await fill(tech, "Final mass (g)", "71.0");
    await tech.click("button::-p-text(Record post-test data)");
    await tech.waitForSelector("button::-p-text(Submit for review)", { timeout: 30_000 });
    await tech.click("button::-p-text(Submit for review)");
    await tech.waitForFunction(() => document.querySelector("h1")?.textContent?.includes("Awaiting review"), { timeout: 30_000 });
    await tech.browserContext().close();

    // --- QA sees the calculation and the uncertainty budget from the instruments' calibrations, and approves.
    const qa = await pageSignedInAs(browser, "qa@quillfen.test");
    await qa.goto(`${baseUrl()}/review/${runNumber}`);
    expect(await textOf(qa, '[data-testid="calculation"]')).toMatch(/^Falling head, rising tail/);
    const budget = await textOf(qa, '[data-testid="uncertainty-budget-INDEX_FLUX"]');
    expect(budget).toMatch(/burette readings.*BP-02 calibration/);
    expect(budget).toMatch(/die diameter.*lab value, ASTM D5887 settings, version 2/);
    expect(await textOf(qa, '[data-testid="leakage-statement"]')).toContain(`Apparatus leakage of cell ${cellTag}`);
    await qa.click("button::-p-text(Approve)");
    await qa.waitForFunction(() => document.querySelector('[data-testid="review-message"]')?.textContent?.includes("Run approved"), { timeout: 30_000 });

    // --- The certificate: issued, its PDF names the settings version and criteria, the calculation, the leakage check,
    // the uncertainty with its three largest contributors, and no deviation from the method.
    await qa.goto(`${baseUrl()}/certificates/new`);
    await qa.waitForSelector(`label::-p-text(${runNumber})`);
    await qa.evaluate((run) => {
      const labels = [...document.querySelectorAll("label")].filter((l) => l.textContent?.includes(run));
      for (const l of labels) l.querySelector("input")!.click();
    }, runNumber);
    await qa.evaluate((run) => {
      const label = [...document.querySelectorAll("label")].find((l) => l.textContent?.includes(run))!;
      const buttons = [...label.closest("section")!.querySelectorAll<HTMLButtonElement>("button")];
      buttons.find((b) => b.textContent?.includes("Draft a certificate"))!.click();
    }, runNumber);
    await qa.waitForFunction(() => /^\/certificates\/Q\d{2}-\d{5}$/.test(location.pathname), { timeout: 30_000 });
    const number = qa.url().split("/").pop()!;
    await fill(qa, "Your password, to sign", "seepline-demo");
    await qa.click("button::-p-text(Sign and issue)");
    await qa.waitForFunction(() => document.querySelector('[data-testid="revision-1-status"]')?.textContent === "issued", { timeout: 60_000 });
    const cookie = (await qa.browserContext().cookies()).map((c) => `${c.name}=${c.value}`).join("; ");
    const download = await fetch(`${baseUrl()}/api/certificates/${number}/pdf?revision=1`, { headers: { cookie } });
    expect(download.status).toBe(200);
    const text = pdfText(Buffer.from(await download.arrayBuffer())).replace(/\s+/g, " ");
    expect(text).toContain("Falling head with rising tail (ASTM D5084 method C)");
    expect(text).toContain("refilled or drained 1 time; no interval spans a refill");
    expect(text).toMatch(/Termination criteria of ASTM D5887 settings, version 2/);
    expect(text).toMatch(/Uncertainty of index flux: expanded, coverage factor k = 2, for a coverage probability of about 95 %; largest contributors \(relative standard uncertainty\): burette readings [\d.]+ % \(BP-02 calibration/);
    expect(text).toContain(`Apparatus leakage of cell ${cellTag}`);
    expect(text).toMatch(/Deviations from the method None\./);
    await qa.browserContext().close();
  }
});
