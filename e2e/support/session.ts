import puppeteer, { type Browser, type Page } from "puppeteer";
import { inject } from "vitest";
import { DEMO_PASSWORD } from "../../prisma/seed/demo-people";
import { signInCookies } from "../../scripts/support/http-session";
import { CHROMIUM_FLAGS } from "./find-browser";

export const baseUrl = () => inject("baseUrl");
export const browserAvailable = () => inject("browserPath") !== "";

export async function launchBrowser(): Promise<Browser> {
  return puppeteer.launch({ executablePath: inject("browserPath"), headless: true, args: CHROMIUM_FLAGS });
}

/** Signs in over HTTP (next-auth's credentials callback) and returns the session cookies. */
export async function signInOverHttp(email: string, password = DEMO_PASSWORD): Promise<Array<{ name: string; value: string }>> {
  return signInCookies(baseUrl(), email, password);
}

/** A new page already signed in as `email`. */
export async function pageSignedInAs(browser: Browser, email: string, password?: string): Promise<Page> {
  const cookies = await signInOverHttp(email, password);
  const context = await browser.createBrowserContext();
  const page = await context.newPage();
  const url = new URL(baseUrl());
  await context.setCookie(...cookies.map((c) => ({ ...c, domain: url.hostname, path: "/" })));
  return page;
}

export async function textOf(page: Page, selector: string): Promise<string> {
  return page.$eval(selector, (el) => (el as HTMLElement).innerText);
}
