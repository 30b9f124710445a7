import type { Browser, Page } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { chooseByLabel, chooseByName, fill, labDateTime, setValue } from "./support/forms";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, textOf } from "./support/session";

const DAY = 86_400_000;
const LAB_NUMBER = (letter: string) => new RegExp(`${letter}\\d{2}-\\d{5}`);

/** Waits for a form's notice (role=status) and returns its text. */
async function noticeOf(page: Page, form: string): Promise<string> {
  await page.waitForSelector(`${form} [role="status"]`, { timeout: 30_000 });
  return textOf(page, `${form} [role="status"]`);
}

describe.skipIf(!browserAvailable())("one order of events, and giving up a run (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("clerk: a paste with an unclear yes-or-no is refused by row and column; technician: a cut before receipt is refused, a run is abandoned and its cell is free", async () => {
    const stamp = Date.now().toString(36).toUpperCase();
    const rollNumber = `AB-${stamp}`;

    // --- The clerk logs one roll; "maybe" in the MD column is refused, naming the pasted row and column.
    const clerk = await pageSignedInAs(browser, "clerk@quillfen.test");
    await clerk.goto(`${baseUrl()}/intake/new`);
    await chooseByLabel(clerk, "Client", "Fennick & Vane Earthworks");
    await chooseByLabel(clerk, "Project", "Stormwater pond cap");
    await fill(clerk, "Delivered by", "Site crew, by van (invented)");
    await chooseByLabel(clerk, "Stored at", "RACK-A1");
    const header = "Roll number\tLot number\tProduct\tManufacturer\tMD marked\tCondition";
    await setValue(clerk, "Paste rows from a spreadsheet", `${header}\n${rollNumber}\tL-9\tNeedle-punched GCL\tOrrin Textile Works\tmaybe\tDry`);
    await clerk.click("::-p-text(Read pasted rows)");
    expect(await noticeOf(clerk, 'form[aria-label="Log a shipment"]')).toBe('Nothing was added. Pasted row 2, column "MD marked": "maybe" is not a yes or no; write yes/no, y/n, true/false or 1/0.');
    expect(await clerk.$('[data-testid="roll-grid"]')).toBeNull();
    await setValue(clerk, "Paste rows from a spreadsheet", `${header}\n${rollNumber}\tL-9\tNeedle-punched GCL\tOrrin Textile Works\tno\tDamp along one edge`);
    await clerk.click("::-p-text(Read pasted rows)");
    await clerk.waitForSelector('[data-testid="roll-grid"]');
    expect(await clerk.$eval('input[aria-label="Row 1 machine direction marked"]', (el) => (el as HTMLInputElement).checked)).toBe(false);
    expect(await clerk.$eval('input[aria-label="Row 1 condition"]', (el) => (el as HTMLInputElement).value)).toBe("Damp along one edge");
    await clerk.click("::-p-text(Log shipment and rolls)");
    await clerk.waitForFunction(() => location.pathname.startsWith("/intake/shipments/"), { timeout: 30_000 });
    const rollLabNumber = (await textOf(clerk, '[data-testid="shipment-rolls"]')).match(LAB_NUMBER("R"))![0];
    await clerk.browserContext().close();

    // --- The technician enters a cut time from before the roll arrived: refused, naming the receipt; nothing saved.
    const tech = await pageSignedInAs(browser, "technician@quillfen.test");
    await tech.goto(`${baseUrl()}/samples/rolls/${rollLabNumber}`);
    await fill(tech, "Position in the roll sample", "Centre");
    await fill(tech, "Length (mm)", "300");
    await fill(tech, "Width (mm)", "300");
    await setValue(tech, "Cut at", labDateTime(new Date(Date.now() - DAY)));
    await tech.click("::-p-text(Record coupon)");
    const refusal = await noticeOf(tech, 'form[aria-label="Cut a coupon"]');
    expect(refusal).toMatch(new RegExp(`^The cut time \\(\\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2} CET\\) is before roll ${rollLabNumber} was received with shipment S\\d{2}-\\d{5} \\(.* CET\\); it cannot be earlier than that\\.$`));
    expect(await textOf(tech, 'form[aria-label="Cut a coupon"] .field-error')).toBe(refusal);
    expect(await tech.$('[data-testid="roll-coupons"]')).toBeNull();

    await setValue(tech, "Cut at", labDateTime(new Date()));
    await tech.click("::-p-text(Record coupon)");
    await tech.waitForSelector('[data-testid="roll-coupons"]', { timeout: 30_000 });
    const couponNumber = (await textOf(tech, '[data-testid="roll-coupons"]')).match(LAB_NUMBER("C"))![0];

    await tech.goto(`${baseUrl()}/samples/coupons/${couponNumber}`);
    await fill(tech, "Initial thickness (mm)", "6.9");
    await fill(tech, "Initial mass (g)", "46.0");
    for (const group of await tech.$$('[data-testid="preparation-checklist"] [role="radiogroup"]')) await (await group.$('input[value="yes"]'))!.click();
    await tech.click("::-p-text(Record specimen)");
    await tech.waitForSelector('[data-testid="coupon-specimens"]', { timeout: 30_000 });
    const specimenNumber = (await textOf(tech, '[data-testid="coupon-specimens"]')).match(LAB_NUMBER("P"))![0];

    // --- Mounted in a free cell at the time the technician enters, then abandoned: membrane leak.
    await tech.goto(`${baseUrl()}/runs/new`);
    await chooseByName(tech, "specimenId", specimenNumber);
    await chooseByName(tech, "cellId", "CELL-05");
    await chooseByName(tech, "burettePanelId", "BP-03");
    await chooseByName(tech, "transducerId", "PT-01");
    await setValue(tech, "Mounted at", labDateTime(new Date()));
    await tech.click("button::-p-text(Start the run)");
    await tech.waitForFunction(() => /^\/runs\/T\d{2}-\d{5}$/.test(location.pathname), { timeout: 30_000 });
    const runNumber = tech.url().split("/").pop()!;
    await tech.goto(`${baseUrl()}/cells`);
    expect(await textOf(tech, '[data-cell="CELL-05"]')).toContain(runNumber);

    await tech.goto(`${baseUrl()}/runs/${runNumber}`);
    await fill(tech, "Reason for abandoning", "Membrane leak found while filling the cell");
    await tech.click('input[type="radio"][value="disposal"]');
    await tech.click("button::-p-text(Abandon the run)");
    await tech.waitForFunction(() => document.querySelector("h1")?.textContent?.includes("Abandoned"), { timeout: 30_000 });
    // The facts' labels are set in capitals by the style sheet, which innerText follows.
    expect(await textOf(tech, "main")).toMatch(/Abandoned\s+\d{4}-\d{2}-\d{2} \d{2}:\d{2} CET by Bram Oyelaran: Membrane leak found while filling the cell/i);
    expect(await tech.$('[data-testid="abandon-run"]')).toBeNull();

    await tech.goto(`${baseUrl()}/cells`);
    const cell = await textOf(tech, '[data-cell="CELL-05"]');
    expect(cell).toMatch(/free/);
    expect(cell).not.toContain(runNumber);
    await tech.goto(`${baseUrl()}/samples/specimens/${specimenNumber}`);
    expect(await textOf(tech, '[data-testid="custody-ledger"]')).toMatch(/Taken out of its cell[\s\S]*Disposed of/);
    await tech.browserContext().close();
  });

  it("technician: the demo's permeating run takes a reading typed into its grid", async () => {
    const tech = await pageSignedInAs(browser, "technician@quillfen.test");
    await tech.goto(`${baseUrl()}/cells`);
    const runNumber = (await textOf(tech, '[data-cell="CELL-03"]')).match(LAB_NUMBER("T"))![0];
    await tech.goto(`${baseUrl()}/runs/${runNumber}`);
    await tech.waitForSelector('[data-testid="readings-grid"]');
    const before = await tech.$$eval('[data-testid="readings-table"] tbody tr[data-sequence]', (rows) => rows.length);
    const last = await tech.$$eval('[data-testid="readings-table"] tbody tr[data-sequence]', (rows) => {
      const cells = rows[rows.length - 1]!.querySelectorAll("td");
      return [Number(cells[3]!.textContent), Number(cells[4]!.textContent)];
    });
    // The burettes moved on: the inflow level fell and the outflow level rose a little since the last reading.
    await tech.type('input[aria-label="Row 1 Inflow level (mm)"]', (last[0]! - 4.2).toFixed(1));
    await tech.type('input[aria-label="Row 1 Outflow level (mm)"]', (last[1]! + 3.9).toFixed(1));
    await tech.click("button::-p-text(Save 1 reading)");
    expect(await noticeOf(tech, 'form[aria-label="Enter readings"]')).toBe("1 reading saved.");
    await tech.waitForFunction((n) => document.querySelectorAll('[data-testid="readings-table"] tbody tr[data-sequence]').length === n, { timeout: 30_000 }, before + 1);
    await tech.browserContext().close();
  });
});
