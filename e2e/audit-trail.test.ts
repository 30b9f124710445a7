import type { Browser, Page } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { chooseByLabel, chooseByName, fill, localDateTime } from "./support/forms";
import { recordStage } from "./support/run-steps";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, signInOverHttp, textOf } from "./support/session";

const HOUR = 3_600_000;
const labNumbers = (text: string, letter: string): string[] => text.match(new RegExp(`${letter}\\d{2}-\\d{5}`, "g")) ?? [];
const cookieOf = async (page: Page) => (await page.browserContext().cookies()).map((c) => `${c.name}=${c.value}`).join("; ");

/** The audit rows on the page: entry id and the row's text. */
const auditRows = (page: Page) =>
  page.$$eval('[data-testid="audit-table"] tbody tr', (rows) => rows.map((r) => ({ id: r.getAttribute("data-entry")!, text: (r as HTMLElement).innerText.replace(/\s+/g, " ") })));

async function typeReadingRow(page: Page, row: number, values: { at: Date; inflow: string; outflow: string }) {
  // The grid's time cell is a datetime-local input: set its whole value, as a date picker does.
  await page.$eval(`input[aria-label="Row ${row} Time"]`, (el, v) => {
    Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value")!.set!.call(el, v);
    el.dispatchEvent(new Event("input", { bubbles: true }));
  }, localDateTime(values.at));
  await fill(page, `Row ${row} Inflow level (mm)`, values.inflow);
  await fill(page, `Row ${row} Outflow level (mm)`, values.outflow);
}

describe.skipIf(!browserAvailable())("audit trail: a corrected reading traced by QA (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("technician corrects a reading through the grid's correction form; QA filters by the run's lab number, sees old and new values, pages, and downloads the CSV", async () => {
    // --- The technician makes a run of their own: a coupon from a roll being cut, a specimen, a free cell.
    const tech = await pageSignedInAs(browser, "technician@quillfen.test");
    await tech.goto(`${baseUrl()}/samples?q=R-4106`);
    const roll = labNumbers(await textOf(tech, '[data-testid="roll-list"]'), "R")[0]!;
    await tech.goto(`${baseUrl()}/samples/rolls/${roll}`);
    const couponsBefore = labNumbers(await textOf(tech, '[data-testid="roll-coupons"]'), "C");
    await fill(tech, "Position in the roll sample", "Edge, 150 mm from the leading edge (audit journey)");
    await fill(tech, "Length (mm)", "300");
    await fill(tech, "Width (mm)", "300");
    await tech.click("::-p-text(Record coupon)");
    await tech.waitForFunction((n: number) => (document.querySelector('[data-testid="roll-coupons"]')?.querySelectorAll("tbody tr").length ?? 0) > n, {}, couponsBefore.length);
    const coupon = labNumbers(await textOf(tech, '[data-testid="roll-coupons"]'), "C").find((c) => !couponsBefore.includes(c))!;

    await tech.goto(`${baseUrl()}/samples/coupons/${coupon}`);
    await fill(tech, "Initial thickness (mm)", "6.9");
    await fill(tech, "Initial mass (g)", "46.8");
    for (const group of await tech.$$('[data-testid="preparation-checklist"] [role="radiogroup"]')) await (await group.$('input[value="yes"]'))!.click();
    await tech.click("::-p-text(Record specimen)");
    await tech.waitForSelector('[data-testid="coupon-specimens"] tbody tr');
    const specimen = labNumbers(await textOf(tech, '[data-testid="coupon-specimens"]'), "P")[0]!;

    await tech.goto(`${baseUrl()}/runs/new`);
    await chooseByName(tech, "specimenId", specimen);
    await chooseByName(tech, "cellId", "CELL-01");
    await chooseByName(tech, "burettePanelId", "BP-03");
    await chooseByName(tech, "transducerId", "PT-01");
    await tech.click("button::-p-text(Start the run)");
    await tech.waitForFunction(() => /^\/runs\/T\d{2}-\d{5}$/.test(location.pathname), { timeout: 30_000 });
    const run = tech.url().split("/").pop()!;

    // Stages as the method has them (D5887, common practice): a two-day hold, then permeation near 550/530/515
    // kPa with the cell 35 kPa above the influent line, so that no stage asks for a departure to be acknowledged.
    const start = new Date(Date.now() - 96 * HOUR);
    await recordStage(tech, "Saturation", ["345", "310", "310"], start);
    await tech.waitForFunction(() => (document.querySelector('[data-testid="stages"]')?.querySelectorAll("tbody tr").length ?? 0) === 1, { timeout: 30_000 });
    await recordStage(tech, "Equilibration", ["552", "517", "517"], new Date(start.getTime() + 12 * HOUR));
    await tech.waitForFunction(() => (document.querySelector('[data-testid="stages"]')?.querySelectorAll("tbody tr").length ?? 0) === 2, { timeout: 30_000 });
    const permeation = new Date(start.getTime() + 62 * HOUR);
    await recordStage(tech, "Permeation", ["558", "523", "509"], permeation);

    // --- Three readings typed into the grid (pressures and temperature carried over to the next row).
    await tech.waitForSelector('form[aria-label="Enter readings"]', { timeout: 30_000 });
    await typeReadingRow(tech, 1, { at: permeation, inflow: "452", outflow: "18" });
    await fill(tech, "Row 1 Influent (kPa)", "523");
    await fill(tech, "Row 1 Effluent (kPa)", "509");
    await fill(tech, "Row 1 Cell (kPa)", "558");
    await fill(tech, "Row 1 Temp. (°C)", "20.1");
    await tech.click("button::-p-text(Add a row)");
    await typeReadingRow(tech, 2, { at: new Date(permeation.getTime() + 6 * HOUR), inflow: "442.1", outflow: "28.9" });
    await tech.click("button::-p-text(Add a row)");
    await typeReadingRow(tech, 3, { at: new Date(permeation.getTime() + 12 * HOUR), inflow: "430.4", outflow: "39.8" });
    await tech.click("button::-p-text(Save 3 readings)");
    await tech.waitForSelector('[data-testid="readings-table"] tr[data-sequence="3"]', { timeout: 30_000 });

    // --- Reading 2 was misread: corrected through its "Correct…" form, with the reason.
    await tech.click("::-p-aria(Correct reading 2)");
    const form = (await tech.waitForSelector('[data-testid="correct-reading-2"]'))!;
    const corrected: Array<[string, string]> = [["Inflow level (mm)", "441.2"], ["Temp. (°C)", "20.4"], ["Reason for the correction", "Misread the scale: 441.2, not 442.1"]];
    for (const [label, value] of corrected) {
      const input = (await form.$(`::-p-aria(${label})`))!;
      await input.click({ count: 3 });
      await input.type(value);
    }
    await tech.click("button::-p-text(Save correction)");
    await tech.waitForSelector('[data-testid="reading-corrected"]', { timeout: 30_000 });

    // --- QA opens the audit trail from the navigation and filters by the run's lab number, ten rows a page.
    const qa = await pageSignedInAs(browser, "qa@quillfen.test");
    await qa.goto(`${baseUrl()}/`);
    await qa.click('nav a[href="/admin/audit"]');
    await qa.waitForSelector('form[aria-label="Filter the audit trail"]');
    await fill(qa, "Lab number", run.toLowerCase());
    await chooseByLabel(qa, "Rows a page", "10");
    await qa.click("button::-p-text(Show)");
    await qa.waitForFunction((n) => new URLSearchParams(location.search).get("record") === n && document.querySelector('[data-testid="audit-table"]'), { timeout: 30_000 }, run);

    const first = await auditRows(qa);
    expect(first).toHaveLength(10);
    const correction = first.find((r) => r.text.includes("reading 2") && r.text.includes("Reading corrected"))!;
    expect(correction.text).toContain("Bram Oyelaran");
    expect(correction.text).toContain("Inflow burette level: 442.1 mm → 441.2 mm");
    expect(correction.text).toContain("Temperature: 20.1 °C → 20.4 °C");
    expect(correction.text).toContain("Reason for the correction: Misread the scale: 441.2, not 442.1");
    expect(await qa.$$eval('[data-testid="audit-table"] tbody tr td:nth-child(3) a', (links) => [...new Set(links.map((a) => a.getAttribute("href")))])).toEqual([`/runs/${run}`]);

    // --- Older pages, then back: no row lost or repeated.
    const pages = [first];
    while (await qa.$('a[rel="next"]')) {
      await Promise.all([qa.waitForNavigation(), qa.click('a[rel="next"]')]);
      pages.push(await auditRows(qa));
    }
    expect(pages.length).toBeGreaterThanOrEqual(2);
    const seen = pages.flat().map((r) => BigInt(r.id));
    expect(new Set(seen).size).toBe(seen.length);
    expect(seen).toEqual([...seen].sort((a, b) => (a > b ? -1 : 1)));
    expect(pages.flat().map((r) => r.text).join("\n")).toMatch(/Run added/);
    await Promise.all([qa.waitForNavigation(), qa.click('a[rel="prev"]')]);
    expect((await auditRows(qa)).map((r) => r.id)).toEqual(pages.at(-2)!.map((r) => r.id));

    // --- The CSV of everything that matches: the same rows, one line per changed value.
    const href = await qa.$eval('[data-testid="audit-csv"]', (a) => a.getAttribute("href")!);
    expect(href).toBe(`/api/audit/export?record=${run}`);
    const response = await fetch(`${baseUrl()}${href}`, { headers: { cookie: await cookieOf(qa) } });
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(response.headers.get("content-disposition")).toMatch(/^attachment; filename="audit-trail-\d{8}-\d{4}\.csv"$/);
    const csv = (await response.text()).replace(/^\uFEFF/, "");
    const lines = csv.trimEnd().split("\r\n");
    expect(lines[0]).toBe("Entry,When (UTC),Person,Record,Part,Kind of record,Operation,Field,Old value,New value");
    expect(lines).toContain(`${correction.id},${lines.find((l) => l.startsWith(`${correction.id},`))!.split(",")[1]},Bram Oyelaran,${run},reading 2,Reading,corrected,Inflow burette level,442.1 mm,441.2 mm`);
    expect(csv).toContain(`,${run},reading 2,Reading,corrected,Temperature,20.1 °C,20.4 °C`);
    expect(csv).toContain(`,${run},reading 2,Reading,corrected,Reason for the correction,,"Misread the scale: 441.2, not 442.1"`);
    expect([...new Set(lines.slice(1).map((l) => l.split(",")[0]))]).toEqual(pages.flat().map((r) => r.id));

    // --- The same export is refused to a technician and to a client, as the page is.
    for (const email of ["technician@quillfen.test", "portal@marrowdale.test"]) {
      const cookie = (await signInOverHttp(email)).map((c) => `${c.name}=${c.value}`).join("; ");
      const refused = await fetch(`${baseUrl()}${href}`, { headers: { cookie } });
      expect(refused.status, email).toBe(403);
    }
    await tech.browserContext().close();
    await qa.browserContext().close();
  });
});
