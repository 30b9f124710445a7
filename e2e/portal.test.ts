import type { Browser } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, signInOverHttp, textOf } from "./support/session";

// The seeded demo: Marrowdale (client A) owns project MWA-C4 with one issued certificate; Ostrel is client B.
const CLIENT_A = "portal@marrowdale.test";
const CLIENT_B = "portal@ostrel.test";
const A_PROJECT = "/portal/projects/MWA-C4";

const cookieFor = async (email: string) => (await signInOverHttp(email)).map((c) => `${c.name}=${c.value}`).join("; ");

describe.skipIf(!browserAvailable())("client portal (headless Chromium)", () => {
  let browser: Browser;
  let certificateNumber = "";
  let revisionOneStatus = "";
  let shipmentNumber = "";
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("shows client A their project with each roll's progress, their shipments and the certificate", async () => {
    const page = await pageSignedInAs(browser, CLIENT_A);
    await page.goto(`${baseUrl()}/portal`);
    await page.click('[data-testid="portal-projects"] a[href="/portal/projects/MWA-C4"]');
    await page.waitForSelector('[data-testid="portal-rolls"]');
    expect(new URL(page.url()).pathname).toBe(A_PROJECT);
    expect(await textOf(page, '[data-testid="project-name"]')).toBe("Cell 4 landfill expansion");

    // Three rolls arrived; the certified one has every step done, the ones still in cells stand at "Under test".
    const rolls = await page.$$eval('[data-testid="roll-progress"]', (lists) =>
      lists.map((list) => [...list.querySelectorAll("li")].map((li) => `${li.getAttribute("data-step")}:${li.getAttribute("data-status")}`).join(" ")),
    );
    expect(rolls.length).toBeGreaterThanOrEqual(3);
    expect(rolls).toContain("received:done cut:done prepared:done testing:done tested:done certified:done");
    expect(rolls.some((r) => r.includes("testing:current") || r.includes("tested:current"))).toBe(true);

    const certificates = await textOf(page, '[data-testid="portal-certificates"]');
    certificateNumber = /Q\d{2}-\d{5}/.exec(certificates)?.[0] ?? "";
    expect(certificateNumber).not.toBe("");
    // Another journey may have revised this certificate since; revision 1 is then superseded.
    revisionOneStatus = await page.$eval(`tbody[data-certificate="${certificateNumber}"] tr[data-revision="1"]`, (tr) => tr.getAttribute("data-status") ?? "");
    const shipments = await textOf(page, '[data-testid="portal-shipments"]');
    shipmentNumber = /S\d{2}-\d{5}/.exec(shipments)?.[0] ?? "";
    expect(shipments).toMatch(/Receipt \(PDF\)/);
    expect(await page.$(`a[href="/api/shipments/${shipmentNumber}/receipt"]`)).not.toBeNull();

    await page.goto(`${baseUrl()}/portal/certificates`);
    await page.waitForSelector('[data-testid="portal-certificates"]');
    const all = await textOf(page, '[data-testid="portal-certificates"]');
    expect(all).toContain(certificateNumber);
    expect(all).toMatch(/Cell 4 landfill expansion/);
    expect(await page.$('a[href^="/verify/"]')).not.toBeNull();
    await page.browserContext().close();
  });

  it("gives client A their own certificate address: the PDF, or a plain 404 while none is stored", async () => {
    const response = await fetch(`${baseUrl()}/api/certificates/${certificateNumber}/pdf?revision=1`, { headers: { cookie: await cookieFor(CLIENT_A) } });
    if (response.status === 200) {
      expect(response.headers.get("content-type")).toBe("application/pdf");
      const suffix = { ISSUED: "", SUPERSEDED: "-superseded" }[revisionOneStatus];
      expect(response.headers.get("content-disposition")).toBe(`attachment; filename="${certificateNumber}-rev1${suffix}.pdf"`);
    } else {
      // The demo's seeded revision was issued without a stored PDF.
      expect(response.status).toBe(404);
      expect(((await response.json()) as { error: { message: string } }).error.message).toMatch(/No PDF is stored/);
    }
  });

  it("answers client B with 404 at client A's project, certificate and receipt addresses", async () => {
    const page = await pageSignedInAs(browser, CLIENT_B);
    const response = await page.goto(`${baseUrl()}${A_PROJECT}`);
    expect(response?.status()).toBe(404);
    expect(await page.content()).toMatch(/There is nothing at this address/);
    expect(await page.content()).not.toMatch(/Cell 4 landfill expansion/);
    await page.goto(`${baseUrl()}/portal/certificates`);
    expect(await page.content()).not.toContain(certificateNumber);
    await page.browserContext().close();

    const cookie = await cookieFor(CLIENT_B);
    for (const address of [`/api/certificates/${certificateNumber}/pdf`, `/api/certificates/${certificateNumber}/pdf?revision=1`, `/api/shipments/${shipmentNumber}/receipt`]) {
      const refused = await fetch(`${baseUrl()}${address}`, { headers: { cookie } });
      expect(refused.status, address).toBe(404);
      expect(((await refused.json()) as { error: { code: string } }).error.code, address).toBe("NOT_FOUND");
    }
  });

  it("answers a signed-out request for a certificate PDF with 401", async () => {
    const response = await fetch(`${baseUrl()}/api/certificates/${certificateNumber}/pdf`);
    expect(response.status).toBe(401);
    expect(((await response.json()) as { error: { code: string } }).error.code).toBe("UNAUTHENTICATED");
  });
});
