import type { Browser, HTTPRequest, Page } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SERVER_UNREACHABLE } from "../components/ui/server-unreachable";
import { fill } from "./support/forms";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, textOf } from "./support/session";

/** Every server action's request is dropped, as when the network or the server is down. */
async function cutActions(page: Page): Promise<() => Promise<void>> {
  await page.setRequestInterception(true);
  const drop = (request: HTTPRequest) => {
    if (request.isInterceptResolutionHandled()) return;
    if (request.method() === "POST" && request.headers()["next-action"]) void request.abort("internetdisconnected");
    else void request.continue();
  };
  page.on("request", drop);
  return async () => {
    page.off("request", drop);
    await page.setRequestInterception(false);
  };
}

describe.skipIf(!browserAvailable())("a form whose request never reaches the server says so (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("the new-client form says nothing may have been saved, keeps what was typed, and saves once the server answers", async () => {
    const stamp = Date.now().toString(36).toUpperCase().slice(-5);
    const admin = await pageSignedInAs(browser, "admin@quillfen.test");
    await admin.goto(`${baseUrl()}/`);
    await admin.click("nav ::-p-text(Clients)");
    await admin.waitForSelector('form[aria-label="New client"]');
    await fill(admin, "Client code", `OFL${stamp}`);
    await fill(admin, "Organisation name", `Offline Fen Drainage ${stamp} (invented)`);
    const restore = await cutActions(admin);
    await admin.click("button::-p-text(Create client)");
    await admin.waitForFunction((text) => [...document.querySelectorAll('form[aria-label="New client"] [role="status"]')].some((n) => n.textContent === text), { timeout: 30_000 }, SERVER_UNREACHABLE);
    await restore();
    await admin.click("button::-p-text(Create client)");
    await admin.waitForFunction((c) => location.pathname === `/admin/clients/${c}`, { timeout: 30_000 }, `OFL${stamp}`);
    expect(await textOf(admin, "h1")).toContain(`Offline Fen Drainage ${stamp}`);
  });

  it("a form with no handling of its own is covered by the page's alert", async () => {
    const qa = await pageSignedInAs(browser, "qa@quillfen.test");
    await qa.goto(`${baseUrl()}/account`);
    await qa.waitForSelector('form[aria-label="Units of results"]');
    const restore = await cutActions(qa);
    await qa.click('form[aria-label="Units of results"] button[type="submit"]');
    await qa.waitForSelector('[data-testid="connection-notice"]', { timeout: 30_000 });
    expect(await textOf(qa, '[data-testid="connection-notice"]')).toContain(SERVER_UNREACHABLE);
    await restore();
  });
});
