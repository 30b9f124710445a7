import puppeteer, { type Browser, type Page } from "puppeteer";
import { inject } from "vitest";
import { DEMO_PASSWORD } from "../../prisma/seed/demo-people";
import { CHROMIUM_FLAGS } from "./find-browser";

export const baseUrl = () => inject("baseUrl");
export const browserAvailable = () => inject("browserPath") !== "";

export async function launchBrowser(): Promise<Browser> {
  return puppeteer.launch({ executablePath: inject("browserPath"), headless: true, args: CHROMIUM_FLAGS });
}

/** Signs in over HTTP (next-auth's credentials callback) and returns the session cookies. */
export async function signInOverHttp(email: string, password = DEMO_PASSWORD): Promise<Array<{ name: string; value: string }>> {
  const jar = new Map<string, string>();
  const keep = (response: Response) => {
    for (const line of response.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair!.indexOf("=");
      jar.set(pair!.slice(0, eq), pair!.slice(eq + 1));
    }
  };
  const cookieHeader = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const csrfResponse = await fetch(`${baseUrl()}/api/auth/csrf`);
  keep(csrfResponse);
  const { csrfToken } = (await csrfResponse.json()) as { csrfToken: string };
  const response = await fetch(`${baseUrl()}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookieHeader() },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  keep(response);
  const session = [...jar].find(([name]) => name.endsWith("next-auth.session-token"));
  if (!session) throw new Error(`sign-in over HTTP failed for ${email} (status ${response.status})`);
  return [...jar].map(([name, value]) => ({ name, value }));
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
