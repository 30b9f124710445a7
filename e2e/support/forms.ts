import { toWallTime } from "../../lib/format/time-zone";
import { DEMO_LAB } from "../../prisma/seed/demo-people";
import type { ElementHandle, Page } from "puppeteer";

/** The form control whose accessible name (its label) is `label`. */
export async function field(page: Page, label: string): Promise<ElementHandle<Element>> {
  const handle = await page.waitForSelector(`::-p-aria(${label})`);
  if (!handle) throw new Error(`no field labelled ${label}`);
  return handle;
}

/** Replaces a field's text by typing, as a person would. */
export async function fill(page: Page, label: string, value: string): Promise<void> {
  const input = await field(page, label);
  await input.click({ count: 3 });
  await input.type(value);
}

async function chooseIn(select: ElementHandle<Element>, text: string, what: string): Promise<void> {
  const value = await select.evaluate((el, t) => [...(el as HTMLSelectElement).options].find((o) => o.text.includes(t))?.value, text);
  if (!value) throw new Error(`no option "${text}" in ${what}`);
  await select.select(value);
}

/** Picks the option whose text contains `text` in the select labelled `label`. */
export async function chooseByLabel(page: Page, label: string, text: string): Promise<void> {
  await chooseIn(await field(page, label), text, label);
}

/** The same by the select's name, where a label is ambiguous on the page. */
export async function chooseByName(page: Page, name: string, text: string): Promise<void> {
  const select = await page.waitForSelector(`select[name="${name}"]`);
  if (!select) throw new Error(`no select named ${name}`);
  await chooseIn(select, text, name);
}

/** Sets a field's whole value at once (a paste, or a date picker) and tells React about it. */
export async function setValue(page: Page, label: string, value: string): Promise<void> {
  await (await field(page, label)).evaluate((el, v) => {
    const prototype = el instanceof HTMLTextAreaElement ? HTMLTextAreaElement.prototype : HTMLInputElement.prototype;
    Object.getOwnPropertyDescriptor(prototype, "value")!.set!.call(el, v);
    el.dispatchEvent(new Event("input", { bubbles: true }));
    el.dispatchEvent(new Event("change", { bubbles: true }));
  }, value);
}

/** A datetime-local value for `date` as the demo lab's clock reads it: the app's time inputs are in the lab's zone. */
export function labDateTime(date: Date): string {
  return toWallTime(date, DEMO_LAB.timeZone);
}
