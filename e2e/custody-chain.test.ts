import type { Browser, Page } from "puppeteer";
import { chooseByLabel, fill, setValue } from "./support/forms";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, textOf } from "./support/session";

const LAB_NUMBER = (letter: string) => new RegExp(`${letter}\\d{2}-\\d{5}`, "g");

async function answerChecklist(page: Page) {
  const groups = await page.$$('[data-testid="preparation-checklist"] [role="radiogroup"]');
  for (const group of groups) await (await group.$('input[value="yes"]'))!.click();
}

describe.skipIf(!browserAvailable())("chain of custody from the door to specimens (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("clerk logs three pasted rolls, prints labels, acknowledges; technician cuts a coupon and two specimens; the records show who did each step", async () => {
    const stamp = Date.now().toString(36).toUpperCase();
    const rollNumbers = [`E2E-${stamp}-1`, `E2E-${stamp}-2`, `E2E-${stamp}-3`];

    // --- The clerk logs the shipment by pasting rows from a spreadsheet.
    const clerk = await pageSignedInAs(browser, "clerk@quillfen.test");
    await clerk.goto(`${baseUrl()}/intake/new`);
    await chooseByLabel(clerk, "Client", "Ostrel Mining Cooperative");
    await chooseByLabel(clerk, "Project", "Tailings pond B lining");
    await fill(clerk, "Delivered by", "Courier parcel 77-310 (invented)");
    await chooseByLabel(clerk, "Stored at", "RACK-A2");
    await fill(clerk, "Condition on arrival", "Three rolls, wrapped and dry.");
    const pasted = [
      "Roll number\tLot number\tProduct\tManufacturer\tLength (mm)\tWidth (mm)\tMD marked",
      `${rollNumbers[0]}\tL-77\tNeedle-punched GCL\tOrrin Textile Works\t1000\t1200\tyes`,
      `${rollNumbers[1]}\t\tNeedle-punched GCL\tOrrin Textile Works\t1000\t1200\tyes`,
      `${rollNumbers[2]}\tL-77\tNeedle-punched GCL\tOrrin Textile Works\t1000\t1200\tno`,
    ].join("\n");
    await setValue(clerk, "Paste rows from a spreadsheet", pasted);
    await clerk.click("::-p-text(Read pasted rows)");
    await clerk.waitForSelector('[data-testid="row-2-errors"]');
    expect(await textOf(clerk, '[data-testid="row-2-errors"]')).toMatch(/Enter the lot number/);
    expect(await clerk.$$eval('[data-testid="roll-grid"] tbody tr', (rows) => rows.length)).toBe(3);

    await fill(clerk, "Row 2 lot number", "L-77");
    await clerk.click("::-p-text(Log shipment and rolls)");
    await clerk.waitForFunction(() => location.pathname.startsWith("/intake/shipments/"), { timeout: 30_000 });
    const shipmentNumber = decodeURIComponent(clerk.url().split("/").pop()!);
    const rollsText = await textOf(clerk, '[data-testid="shipment-rolls"]');
    for (const n of rollNumbers) expect(rollsText).toContain(n);
    const rollLabNumbers = rollsText.match(LAB_NUMBER("R"))!;
    expect(rollLabNumbers).toHaveLength(3);

    // --- Labels for the three rolls, on one sheet, each with its 2D code.
    await clerk.click("::-p-text(Labels for all rolls)");
    await clerk.waitForSelector('[data-testid="label-sheet"]');
    const labelled = await clerk.$$eval('[data-testid="label-sheet"] [data-lab-number]', (els) => els.map((e) => [e.getAttribute("data-lab-number"), e.querySelector("svg") !== null]));
    expect(labelled).toEqual(rollLabNumbers.map((n) => [n, true]));
    expect(await clerk.$$eval('[data-testid="label-sheet"] .label-page', (pages) => pages.length)).toBe(1);
    const pdf = await fetch(`${baseUrl()}/api/labels?numbers=${rollLabNumbers.join(",")}`, { headers: { cookie: (await clerk.browserContext().cookies()).map((c) => `${c.name}=${c.value}`).join("; ") } });
    expect(pdf.headers.get("content-type")).toBe("application/pdf");
    expect(Buffer.from(await pdf.arrayBuffer()).subarray(0, 4).toString()).toBe("%PDF");

    // --- The clerk acknowledges receipt.
    await clerk.goto(`${baseUrl()}/intake/shipments/${shipmentNumber}`);
    await clerk.click("::-p-text(Acknowledge receipt)");
    await clerk.waitForFunction(() => document.querySelector('[data-testid="receipt-status"]')?.textContent?.includes("acknowledged 20"));
    expect(await textOf(clerk, '[data-testid="receipt-status"]')).toMatch(/by Odile Farrant/);

    // --- The technician cuts one coupon from the first roll and prepares two specimens from it.
    const tech = await pageSignedInAs(browser, "technician@quillfen.test");
    await tech.goto(`${baseUrl()}/samples/rolls/${rollLabNumbers[0]}`);
    await fill(tech, "Position in the roll sample", "Centre, 250 mm from the leading edge");
    await fill(tech, "Length (mm)", "300");
    await fill(tech, "Width (mm)", "300");
    await tech.click("::-p-text(Record coupon)");
    await tech.waitForSelector('[data-testid="roll-coupons"]');
    const couponNumber = (await textOf(tech, '[data-testid="roll-coupons"]')).match(LAB_NUMBER("C"))![0];

    await tech.goto(`${baseUrl()}/samples/coupons/${couponNumber}`);
    for (const thickness of ["6.8", "7.1"]) {
      await fill(tech, "Initial thickness (mm)", thickness);
      await fill(tech, "Initial mass (g)", "46.5");
      await answerChecklist(tech);
      await tech.click("::-p-text(Record specimen)");
      await tech.waitForFunction(() => document.querySelector('[role="status"]')?.textContent?.includes("recorded"));
      await tech.waitForFunction((t) => (document.querySelector('[data-testid="coupon-specimens"]')?.querySelectorAll("tbody tr").length ?? 0) >= (t === "6.8" ? 1 : 2), {}, thickness);
    }
    const specimenNumbers = (await textOf(tech, '[data-testid="coupon-specimens"]')).match(LAB_NUMBER("P"))!;
    expect(specimenNumbers).toHaveLength(2);
    const couponLedger = await textOf(tech, '[data-testid="custody-ledger"]');
    expect(couponLedger.match(/Prepared\s+Bram Oyelaran/g)).toHaveLength(2);
    expect(couponLedger).toMatch(/Cut\s+Bram Oyelaran/);

    // --- The genealogy and the roll's ledger show each step with the right person.
    await tech.goto(`${baseUrl()}/intake/shipments/${shipmentNumber}`);
    const tree = await textOf(tech, '[data-testid="genealogy"]');
    for (const n of [shipmentNumber, ...rollLabNumbers, couponNumber, ...specimenNumbers]) expect(tree).toContain(n);
    await tech.goto(`${baseUrl()}/samples/rolls/${rollLabNumbers[0]}`);
    const rollLedger = await textOf(tech, '[data-testid="custody-ledger"]');
    expect(rollLedger).toMatch(/Received\s+Odile Farrant/);
    expect(rollLedger).toMatch(/Stored\s+Odile Farrant/);
    expect(rollLedger).toMatch(/Cut\s+Bram Oyelaran\s+Stored → Cut/);
    await tech.goto(`${baseUrl()}/samples/specimens/${specimenNumbers[0]}`);
    expect(await textOf(tech, '[data-testid="specimen-checklist"]')).toMatch(/side-wall leakage\s+yes/);

    // --- Scanning a lab number opens the item.
    await tech.type('input[name="q"]', specimenNumbers[1]!.toLowerCase());
    await tech.keyboard.press("Enter");
    await tech.waitForFunction((n) => location.pathname === `/samples/specimens/${n}`, {}, specimenNumbers[1]);

    // --- An illegal transition is refused with what is allowed: moving a specimen that is under test.
    await tech.goto(`${baseUrl()}/samples/specimens?state=UNDER_TEST`);
    const underTest = (await textOf(tech, '[data-testid="specimen-list"]')).match(LAB_NUMBER("P"))![0];
    await tech.goto(`${baseUrl()}/samples/specimens/${underTest}`);
    await chooseByLabel(tech, "Move to", "RACK-A1");
    await tech.click("button::-p-text(Move)");
    await tech.waitForSelector('[data-testid="custody-action-message"]');
    expect(await textOf(tech, '[data-testid="custody-action-message"]')).toBe(`${underTest}: A specimen that is under test cannot move; from here it can only finish testing.`);

    await clerk.browserContext().close();
    await tech.browserContext().close();
  });
});
