import type { Browser } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { chooseByLabel, fill } from "./support/forms";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, textOf } from "./support/session";

describe.skipIf(!browserAvailable())("the administrator takes on a new client (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("creates a client with a project and its client user, who then signs in to an empty portal", async () => {
    const stamp = Date.now().toString(36).toUpperCase().slice(-5);
    const clientCode = `HDB${stamp}`;
    const portalEmail = `ines.${stamp.toLowerCase()}@harrowgate.test`;

    const admin = await pageSignedInAs(browser, "admin@quillfen.test");
    await admin.goto(`${baseUrl()}/`);
    await admin.click("nav ::-p-text(Clients)");
    await admin.waitForSelector('form[aria-label="New client"]');
    await fill(admin, "Client code", clientCode.toLowerCase());
    await fill(admin, "Organisation name", `Harrowgate Drainage Board ${stamp} (invented)`);
    await fill(admin, "Address", "1 Sluice Road, Harrowgate");
    await admin.click("button::-p-text(Create client)");
    await admin.waitForFunction((c) => location.pathname === `/admin/clients/${c}`, { timeout: 30_000 }, clientCode);
    expect(await textOf(admin, "h1")).toContain(`Harrowgate Drainage Board ${stamp}`);

    // A contact without an e-mail address is refused, with the field named; nothing is added.
    const contactForm = 'form[aria-label="New contact"]';
    await fill(admin, "Contact name", "Ines Wrackham");
    await admin.click(`${contactForm} button[type="submit"]`);
    await admin.waitForSelector(`${contactForm} .field-error`);
    expect(await textOf(admin, `${contactForm} .field-error`)).toBe("A contact needs an e-mail address: the lab writes to its contacts.");
    expect(await admin.$('[data-testid="client-contacts"]')).toBeNull();

    // With the e-mail and portal access, the contact becomes the client user who signs in.
    await fill(admin, "Contact e-mail", portalEmail);
    await fill(admin, "Job title", "Drainage engineer");
    await admin.click(`${contactForm} input[type="checkbox"]`);
    await fill(admin, "First portal password", "harrowgate first password");
    await admin.click(`${contactForm} button[type="submit"]`);
    await admin.waitForSelector(`[data-testid="client-contacts"] tr[data-email="${portalEmail}"]`, { timeout: 30_000 });
    expect(await textOf(admin, `[data-testid="client-contacts"] tr[data-email="${portalEmail}"]`)).toMatch(/Ines Wrackham[\s\S]*signs in/);

    await fill(admin, "Project code", `${clientCode}-P1`);
    await fill(admin, "Project name", "Outfall lagoon lining");
    await fill(admin, "Site", "Harrowgate outfall lagoon");
    await chooseByLabel(admin, "Specification", "commonly cited GCL limits");
    await admin.click("button::-p-text(Add project)");
    await admin.waitForSelector(`[data-testid="client-projects"] tr[data-code="${clientCode}-P1"]`, { timeout: 30_000 });
    expect(await textOf(admin, `[data-testid="client-projects"] tr[data-code="${clientCode}-P1"]`)).toMatch(/Outfall lagoon lining[\s\S]*liner specification/);

    // The new client user signs in from the address people type and sees their one project, with nothing received yet.
    const context = await browser.createBrowserContext();
    const client = await context.newPage();
    await client.goto(`${baseUrl()}/`);
    await client.waitForSelector('input[type="email"]');
    await client.type('input[type="email"]', portalEmail);
    await client.type('input[type="password"]', "harrowgate first password");
    await client.click('button[type="submit"]');
    await client.waitForFunction(() => location.pathname === "/portal", { timeout: 30_000 });
    expect(await textOf(client, '[data-testid="signed-in-as"]')).toBe("Ines Wrackham");
    const projects = await textOf(client, '[data-testid="portal-projects"]');
    expect(projects).toMatch(/Outfall lagoon lining/);
    expect(projects).toMatch(/Harrowgate outfall lagoon\s+0\s+0\s+0/);
    expect(projects).not.toMatch(/Cell 4 landfill expansion|Tailings pond B/);
    await client.goto(`${baseUrl()}/portal/certificates`);
    expect(await textOf(client, "main")).toMatch(/No certificate has been issued to your organisation yet\./);
    await context.close();
    await admin.browserContext().close();
  });
});
