import type { Page } from "puppeteer";
import { chooseByName, fill, localDateTime, setValue } from "./forms";

/** Records a stage on the run page: its kind, cell, influent and effluent pressures (kPa) and start time. */
export async function recordStage(page: Page, kind: string, pressures: [string, string, string], startedAt: Date) {
  await chooseByName(page, "kind", kind);
  await fill(page, "Cell pressure (kPa)", pressures[0]);
  await fill(page, "Influent pressure (kPa)", pressures[1]);
  await fill(page, "Effluent pressure (kPa)", pressures[2]);
  await setValue(page, "Started at", localDateTime(startedAt));
  await page.click("button::-p-text(Record stage)");
}
