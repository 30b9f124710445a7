import path from "node:path";
import type { Browser, ElementHandle } from "puppeteer";
import { chooseByName, fill, labDateTime, setValue } from "./support/forms";
import { recordStage } from "./support/run-steps";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, textOf } from "./support/session";

const FIXTURE = path.resolve(import.meta.dirname, "fixtures", "readings-d5887.csv");

const DAY = 86_400_000;

describe.skipIf(!browserAvailable())("a run from cell assignment to submission (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("technician: out-of-calibration cell refused, calibrated cell assigned, margin warning acknowledged, CSV imported, criteria met with charts, terminated, post-test recorded, submitted", async () => {
    const tech = await pageSignedInAs(browser, "technician@quillfen.test");

    // --- Assignment: the overdue cell is refused, a calibrated one starts the run.
    await tech.goto(`${baseUrl()}/runs/new`);
    await chooseByName(tech, "cellId", "CELL-06");
    await chooseByName(tech, "burettePanelId", "BP-02");
    await chooseByName(tech, "transducerId", "PT-01");
    await fill(tech, "Effective stress (kPa)", "34.5");
    await tech.click("button::-p-text(Start the run)");
    await tech.waitForSelector('[data-testid="assign-error"]');
    expect(await textOf(tech, '[data-testid="assign-error"]')).toMatch(/CELL-06 was due for calibration on \d{4}-\d{2}-\d{2}\./);

    await chooseByName(tech, "cellId", "CELL-04");
    // The demo's waiting specimen was prepared a week ago; the run is dated back to when it went into the cell.
    const now = Date.now();
    await setValue(tech, "Mounted at", labDateTime(new Date(now - 6.5 * DAY)));
    await tech.click("button::-p-text(Start the run)");
    await tech.waitForFunction(() => /^\/runs\/T\d{2}-\d{5}$/.test(location.pathname), { timeout: 30_000 });
    const runNumber = tech.url().split("/").pop()!;
    expect(await textOf(tech, "h1")).toContain("Set up");
    expect(await textOf(tech, '[data-testid="pressure-caution"]')).toMatch(/does not replace those procedures/);

    // --- Saturation with too small a confining margin: warned, then acknowledged.
    await recordStage(tech, "Saturation", ["330", "310", "310"], new Date(now - 6.4 * DAY));
    await tech.waitForSelector('[data-testid="margin-warning"]');
    expect(await textOf(tech, '[data-testid="margin-warning"]')).toMatch(/by 20\.0 kPa, less than the 35 kPa confining margin/);
    await (await tech.waitForSelector('[data-testid="margin-warning"] input[type="checkbox"]'))!.click();
    await tech.click("button::-p-text(Record stage)");
    await tech.waitForFunction(() => document.querySelector('[data-testid="stages"]')?.textContent?.includes("departure acknowledged"));

    await recordStage(tech, "Equilibration", ["552", "517", "517"], new Date(now - 6 * DAY));
    await tech.waitForFunction(() => (document.querySelector('[data-testid="stages"]')?.querySelectorAll("tbody tr").length ?? 0) === 2);
    // The method's permeation pressures (D5887 common practice) after a two-day hold: no departure to acknowledge.
    await recordStage(tech, "Permeation", ["552", "531", "517"], new Date(now - 4 * DAY));
    await tech.waitForSelector('[data-testid="csv-import"]', { timeout: 30_000 }).catch(async (error) => {
      await tech.screenshot({ path: "tmp/e2e-run-lifecycle-failure.png", fullPage: true });
      throw error;
    });

    // --- Import the data-logger CSV (invented data in e2e/fixtures): preview, then save all rows.
    const upload = (await tech.waitForSelector('[data-testid="csv-file"]')) as ElementHandle<HTMLInputElement>;
    await upload.uploadFile(FIXTURE);
    await tech.waitForSelector('[data-testid="csv-preview"]');
    await tech.waitForSelector('[data-testid="csv-save"]:not([disabled])');
    await tech.click('[data-testid="csv-save"]');
    await tech.waitForFunction(() => document.querySelector('[data-testid="csv-message"]')?.textContent?.includes("readings saved"), { timeout: 30_000 });
    expect(await textOf(tech, '[data-testid="csv-message"]')).toMatch(/^13 readings saved from readings-d5887\.csv\.$/);

    // --- The criteria are met and the charts are drawn.
    await tech.waitForSelector('[data-testid="criteria-verdict"]');
    expect(await textOf(tech, '[data-testid="criteria-verdict"]')).toBe("all met");
    for (const chart of ["chart-flux", "chart-ratio", "chart-k20", "chart-volumes"]) {
      const lines = await tech.$$eval(`[data-testid="${chart}"] .recharts-line-curve`, (paths) => paths.map((p) => p.getAttribute("d")?.length ?? 0));
      expect(lines.length, chart).toBeGreaterThan(0);
      expect(Math.min(...lines), chart).toBeGreaterThan(20);
    }

    // --- As soon as the criteria are met the run page shows the reported values, in the technician's units:
    // SI by default; centimetre units once chosen under My account (m/s to cm/s: exactly 100 times).
    const flux = await textOf(tech, '[data-testid="reported-INDEX_FLUX"] [data-testid="reported-value"]');
    const k = await textOf(tech, '[data-testid="reported-HYDRAULIC_CONDUCTIVITY"] [data-testid="reported-value"]');
    expect(flux).toMatch(/^\d\.\d × 10⁻[⁰¹²³⁴⁵⁶⁷⁸⁹]+ m³\/m²\/s$/);
    expect(k).toMatch(/^\d\.\d × 10⁻[⁰¹²³⁴⁵⁶⁷⁸⁹]+ m\/s$/);
    await tech.click("nav a::-p-text(My account)");
    await (await tech.waitForSelector('form[aria-label="Units of results"] input[value="CENTIMETRE"]'))!.click();
    await tech.click("button::-p-text(Save units)");
    await tech.waitForSelector('[data-testid="result-units-message"]');
    // Back to the run by its lab number, as the technician would type it into the search box.
    await fill(tech, "Find by lab number", runNumber);
    await tech.keyboard.press("Enter");
    await tech.waitForFunction(() => /cm\/s$/.test(document.querySelector('[data-testid="reported-HYDRAULIC_CONDUCTIVITY"] [data-testid="reported-value"]')?.textContent ?? ""), { timeout: 30_000 });
    const kCm = await textOf(tech, '[data-testid="reported-HYDRAULIC_CONDUCTIVITY"] [data-testid="reported-value"]');
    const [mantissa, exponent] = [k.split(" ")[0]!, k.match(/10⁻([⁰¹²³⁴⁵⁶⁷⁸⁹]+)/)![1]!];
    const superscript = (n: number) => String(n).split("").map((d) => "⁰¹²³⁴⁵⁶⁷⁸⁹"[Number(d)]).join("");
    const digits = [...exponent].map((c) => "⁰¹²³⁴⁵⁶⁷⁸⁹".indexOf(c)).join("");
    expect(kCm).toBe(`${mantissa} × 10⁻${superscript(Number(digits) - 2)} cm/s`);

    // --- Terminate, post-test data, submit.
    await tech.click("button::-p-text(Terminate: criteria met)");
    await tech.waitForSelector('form[aria-label="Post-test data"]', { timeout: 30_000 });
    await fill(tech, "Bentonite layer thickness (mm)", "5.9");
    await fill(tech, "Final mass (g)", "71.2");
    await fill(tech, "Observations", "Uniform hydration on the cut section.");
    await tech.click("button::-p-text(Record post-test data)");
    await tech.waitForSelector("button::-p-text(Submit for review)", { timeout: 30_000 });
    await tech.click("button::-p-text(Submit for review)");
    await tech.waitForFunction(() => document.querySelector("h1")?.textContent?.includes("Awaiting review"), { timeout: 30_000 });

    // --- The run is in QA's queue.
    const qa = await pageSignedInAs(browser, "qa@quillfen.test");
    await qa.goto(`${baseUrl()}/review`);
    expect(await textOf(qa, '[data-testid="review-list"]')).toContain(runNumber);
    await tech.browserContext().close();
    await qa.browserContext().close();
  });
});
