import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { Page } from "puppeteer";
import { chooseByName, fill, localDateTime, setValue } from "./forms";

/** Records a run stage on the run page as the technician does: the kind, three pressures in kPa, the start. */
export async function recordStage(page: Page, kind: string, pressures: [string, string, string], startedAt: Date) {
  await chooseByName(page, "kind", kind);
  await fill(page, "Cell pressure (kPa)", pressures[0]);
  await fill(page, "Influent pressure (kPa)", pressures[1]);
  await fill(page, "Effluent pressure (kPa)", pressures[2]);
  await setValue(page, "Started at", localDateTime(startedAt));
  await page.click("button::-p-text(Record stage)");
}

/** The text of a PDF as pdftotext lays it out. */
export function pdfText(bytes: Buffer): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), "seepline-pdf-"));
  const file = path.join(dir, "document.pdf");
  writeFileSync(file, bytes);
  return execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
}
