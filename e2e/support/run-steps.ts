import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { Page } from "puppeteer";
import { chooseByName, fill, labDateTime, setValue } from "./forms";
import { baseUrl, textOf } from "./session";

const labNumbers = (text: string, letter: string): string[] => text.match(new RegExp(`${letter}\\d{2}-\\d{5}`, "g")) ?? [];

/**
 * Cuts a coupon of the journey's own from a demo roll (found by its roll number) and prepares a specimen
 * from it, at the times entered in the lab's zone, so a run on it can be dated back: every time keeps the
 * order received <= cut <= prepared <= mounted <= stages. Returns the specimen's lab number.
 */
export async function cutAndPrepareSpecimen(page: Page, options: { rollNumber: string; position: string; cutAt: Date; preparedAt: Date; thicknessMm: string; massG: string }): Promise<string> {
  await page.goto(`${baseUrl()}/samples?q=${options.rollNumber}`);
  const roll = labNumbers(await textOf(page, '[data-testid="roll-list"]'), "R")[0]!;
  await page.goto(`${baseUrl()}/samples/rolls/${roll}`);
  const couponsBefore = labNumbers((await page.$('[data-testid="roll-coupons"]')) ? await textOf(page, '[data-testid="roll-coupons"]') : "", "C");
  await fill(page, "Position in the roll sample", options.position);
  await fill(page, "Length (mm)", "300");
  await fill(page, "Width (mm)", "300");
  await setValue(page, "Cut at", labDateTime(options.cutAt));
  await page.click("::-p-text(Record coupon)");
  await page.waitForFunction((n: number) => (document.querySelector('[data-testid="roll-coupons"]')?.querySelectorAll("tbody tr").length ?? 0) > n, { timeout: 30_000 }, couponsBefore.length);
  const coupon = labNumbers(await textOf(page, '[data-testid="roll-coupons"]'), "C").find((c) => !couponsBefore.includes(c))!;

  await page.goto(`${baseUrl()}/samples/coupons/${coupon}`);
  await fill(page, "Initial thickness (mm)", options.thicknessMm);
  await fill(page, "Initial mass (g)", options.massG);
  await setValue(page, "Prepared at", labDateTime(options.preparedAt));
  for (const group of await page.$$('[data-testid="preparation-checklist"] [role="radiogroup"]')) await (await group.$('input[value="yes"]'))!.click();
  await page.click("::-p-text(Record specimen)");
  await page.waitForSelector('[data-testid="coupon-specimens"] tbody tr', { timeout: 30_000 });
  return labNumbers(await textOf(page, '[data-testid="coupon-specimens"]'), "P")[0]!;
}

/** Records a run stage on the run page as the technician does: the kind, three pressures in kPa, the start. */
export async function recordStage(page: Page, kind: string, pressures: [string, string, string], startedAt: Date) {
  await chooseByName(page, "kind", kind);
  await fill(page, "Cell pressure (kPa)", pressures[0]);
  await fill(page, "Influent pressure (kPa)", pressures[1]);
  await fill(page, "Effluent pressure (kPa)", pressures[2]);
  await setValue(page, "Started at", labDateTime(startedAt));
  await page.click("button::-p-text(Record stage)");
}

/** Each page's text of a PDF in reading order (pdftotext -raw, pages split at form feeds): rotated marks read whole. */
export function pdfPages(bytes: Buffer): string[] {
  const dir = mkdtempSync(path.join(os.tmpdir(), "seepline-pdf-"));
  const file = path.join(dir, "document.pdf");
  writeFileSync(file, bytes);
  return execFileSync("pdftotext", ["-raw", file, "-"], { encoding: "utf8" }).split("\f").filter((page) => page.trim() !== "");
}

/** The text of a PDF as pdftotext lays it out. */
export function pdfText(bytes: Buffer): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), "seepline-pdf-"));
  const file = path.join(dir, "document.pdf");
  writeFileSync(file, bytes);
  return execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
}

/**
 * The administrator registers a permeameter cell of the journey's own (so journeys never compete for the
 * demo's cells) and records its calibration with an apparatus leakage check, ten days back.
 */
export async function registerCalibratedCell(page: Page, cellTag: string, now = Date.now()): Promise<void> {
  const day = (offsetDays: number) => new Date(now + offsetDays * 86_400_000).toISOString().slice(0, 10);
  await page.goto(`${baseUrl()}/equipment/new`);
  await fill(page, "Asset tag", cellTag);
  await fill(page, "Name", "Flexible-wall permeameter cell, end-to-end test");
  await fill(page, "Rated maximum pressure", "1000");
  await page.click("button::-p-text(Register equipment)");
  await page.waitForFunction((t) => location.pathname === `/equipment/${t}`, { timeout: 30_000 }, cellTag);
  await setValue(page, "Calibrated on", day(-10));
  await setValue(page, "Next due", day(300));
  await fill(page, "Certificate reference", `CAL-${cellTag}`);
  await fill(page, "Performed by", "Haldrow Metrology (invented)");
  await setValue(page, "Checked on", day(-10));
  await fill(page, "Leakage rate", "1e-13");
  await fill(page, "How it was checked", "impermeable dummy specimen at 550 kPa for 24 h");
  await page.click("button::-p-text(Record calibration)");
  await page.waitForFunction(() => document.querySelector('[data-testid="calibration-history"]')?.textContent?.includes("leakage"), { timeout: 30_000 });
}
