import type { Browser } from "puppeteer";
import { fill } from "./support/forms";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, signInOverHttp, textOf } from "./support/session";

describe.skipIf(!browserAvailable())("the administrator keeps people's accounts (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("creates an account (a short password is refused first), the person signs in, then deactivation ends their session", async () => {
    const email = `new.technician.${Date.now()}@quillfen.test`;
    const admin = await pageSignedInAs(browser, "admin@quillfen.test");
    await admin.goto(`${baseUrl()}/admin/users`);
    const form = 'form[aria-label="New account"]';
    await fill(admin, "Full name", "Wilma Testrun");
    await fill(admin, "E-mail", email);
    await admin.select(`${form} select`, "TECHNICIAN");
    await fill(admin, "First password", "short");
    await admin.click(`${form} button[type="submit"]`);
    await admin.waitForSelector(`${form} .field-error`);
    expect(await textOf(admin, `${form} .field-error`)).toMatch(/at least 12 characters/);

    await fill(admin, "First password", "a proper long password");
    await admin.click(`${form} button[type="submit"]`);
    await admin.waitForSelector(`${form} .notice-ok`);
    await admin.waitForSelector(`tr[data-email="${email}"]`);

    const person = await pageSignedInAs(browser, email, "a proper long password");
    await person.goto(`${baseUrl()}/`);
    expect(await textOf(person, '[data-testid="signed-in-as"]')).toBe("Wilma Testrun");

    await admin.click(`tr[data-email="${email}"] button[aria-label="Deactivate Wilma Testrun"]`);
    await admin.waitForFunction((e) => document.querySelector(`tr[data-email="${e}"]`)?.textContent?.includes("deactivated"), {}, email);

    await person.goto(`${baseUrl()}/`);
    expect(new URL(person.url()).pathname).toBe("/sign-in");
    await expect(signInOverHttp(email, "a proper long password")).rejects.toThrow(/sign-in over HTTP failed/);
    await admin.browserContext().close();
    await person.browserContext().close();
  });

  it("lets a person change their own password under My account", async () => {
    const page = await pageSignedInAs(browser, "technician2@quillfen.test");
    await page.goto(`${baseUrl()}/account`);
    await fill(page, "Present password", "seepline-demo");
    await fill(page, "New password", "signe changed this one");
    await fill(page, "New password again", "signe changed it differently");
    await page.click('form[aria-label="Change password"] button[type="submit"]');
    await page.waitForSelector(".field-error");
    expect(await textOf(page, ".field-error")).toMatch(/differ/);

    await fill(page, "New password again", "signe changed this one");
    await page.click('form[aria-label="Change password"] button[type="submit"]');
    await page.waitForSelector(".notice-ok");
    expect(await signInOverHttp("technician2@quillfen.test", "signe changed this one")).not.toHaveLength(0);
    await page.browserContext().close();
  });
});
