import type { Browser } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, textOf } from "./support/session";

describe.skipIf(!browserAvailable())("sign-in and each role's start page (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("sends a signed-out visitor to the sign-in page, refuses a wrong password, and signs the clerk in", async () => {
    const context = await browser.createBrowserContext();
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/intake`);
    expect(new URL(page.url()).pathname).toBe("/sign-in");

    await page.type('input[type="email"]', "clerk@quillfen.test");
    await page.type('input[type="password"]', "not the password");
    await page.click('button[type="submit"]');
    await page.waitForSelector('[role="alert"]');
    expect(await textOf(page, '[role="alert"]')).toMatch(/do not match an active account/);

    await page.$eval('input[type="password"]', (el) => ((el as HTMLInputElement).value = ""));
    await page.type('input[type="password"]', "seepline-demo");
    await page.click('button[type="submit"]');
    await page.waitForFunction(() => location.pathname === "/intake");
    await page.waitForSelector('[data-testid="shipment-list"]');
    expect(await textOf(page, '[data-testid="signed-in-as"]')).toBe("Odile Farrant");
    await context.close();
  });

  it("shows the form's own field errors before anything is sent", async () => {
    const context = await browser.createBrowserContext();
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/sign-in`);
    await page.type('input[type="email"]', "not-an-address");
    await page.click('button[type="submit"]');
    await page.waitForSelector(".field-error");
    expect(await textOf(page, ".field-error")).toMatch(/e-mail address/);
    await context.close();
  });

  it("gives each staff role its own work queues, and only those", async () => {
    // Contents that other journeys (which share this database) do not change; the rest is checked by presence.
    const expectations: Array<[string, Record<string, RegExp | null>]> = [
      ["clerk@quillfen.test", { "queue-shipments": /Marrowdale Waste Authority/, "queue-rolls": null, "queue-specimens": null, "queue-reviews": null, "queue-calibrations": null }],
      ["technician@quillfen.test", { "queue-rolls": /R\d{2}-\d{5}/, "queue-specimens": /Specimens waiting for a cell/, "queue-runs": /Permeating/, "queue-shipments": null, "queue-reviews": null }],
      ["qa@quillfen.test", { "queue-reviews": /Results to review/, "queue-runs": /Permeating/, "queue-shipments": null, "queue-specimens": null }],
      ["admin@quillfen.test", { "queue-calibrations": /CELL-06[\s\S]*overdue/, "queue-shipments": null, "queue-reviews": null }],
    ];
    for (const [email, queues] of expectations) {
      const page = await pageSignedInAs(browser, email);
      await page.goto(`${baseUrl()}/`);
      await page.waitForSelector("h1");
      for (const [queue, content] of Object.entries(queues)) {
        const present = (await page.$(`[data-testid="${queue}"]`)) !== null;
        expect(present, `${email} ${queue} ${content ? "shown" : "hidden"}`).toBe(content !== null);
        if (content) expect(await textOf(page, `[data-testid="${queue}"]`), `${email} ${queue}`).toMatch(content);
      }
      await page.browserContext().close();
    }
  });

  it("answers 403 with the role needed when a technician opens the people page", async () => {
    const page = await pageSignedInAs(browser, "technician@quillfen.test");
    const response = await page.goto(`${baseUrl()}/admin/users`);
    expect(response?.status()).toBe(403);
    expect(await textOf(page, '[data-testid="needed-role"]')).toMatch(/Lab administrator/);
    const navigation = await textOf(page, "nav");
    expect(navigation).not.toMatch(/People/);
    await page.browserContext().close();
  });

  it("shows a client only their own organisation's projects, and refuses the lab's pages", async () => {
    const page = await pageSignedInAs(browser, "portal@marrowdale.test");
    await page.goto(`${baseUrl()}/`);
    expect(new URL(page.url()).pathname).toBe("/portal");
    const projects = await textOf(page, '[data-testid="portal-projects"]');
    expect(projects).toMatch(/Cell 4 landfill expansion/);
    expect(projects).toMatch(/Leachate lagoon relining/);
    expect(projects).not.toMatch(/Tailings pond B/);
    const response = await page.goto(`${baseUrl()}/samples`);
    expect(response?.status()).toBe(403);
    await page.browserContext().close();
  });

  it("answers an unknown address with the 404 page", async () => {
    const page = await pageSignedInAs(browser, "qa@quillfen.test");
    const response = await page.goto(`${baseUrl()}/no-such-page`);
    expect(response?.status()).toBe(404);
    expect(await page.content()).toMatch(/There is nothing at this address/);
    await page.browserContext().close();
  });
});
