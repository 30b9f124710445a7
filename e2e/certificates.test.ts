import type { Browser, Page } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { fill } from "./support/forms";
import { pdfText } from "./support/run-steps";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, signInOverHttp, textOf } from "./support/session";

async function cookieHeader(page: Page): Promise<string> {
  return (await page.browserContext().cookies()).map((c) => `${c.name}=${c.value}`).join("; ");
}

async function reviewRun(qa: Page, runNumber: string, decision: "Approve" | "Return to technician", comments: string) {
  await qa.goto(`${baseUrl()}/review/${runNumber}`);
  if (comments) await fill(qa, "Comments for the technician", comments);
  await qa.click(`button::-p-text(${decision})`);
  // Read in the same step as found: once approved, the refreshed page no longer shows the decision form.
  const message = await qa.waitForFunction(() => document.querySelector('[data-testid="review-message"]')?.textContent || null, { timeout: 30_000 });
  return String(await message.jsonValue());
}

describe.skipIf(!browserAvailable())("QA review, signed certificates, verification and the client portal (headless Chromium)", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("QA returns one run and approves another, issues a certificate (wrong password refused), revises it; client A downloads it, client B gets 404", async () => {
    const qa = await pageSignedInAs(browser, "qa@quillfen.test");

    // --- Two runs of the demo wait for review: return the first, approve the second.
    await qa.goto(`${baseUrl()}/review`);
    const queued = (await textOf(qa, '[data-testid="review-list"]')).match(/T\d{2}-\d{5}/g)!;
    expect(queued.length).toBeGreaterThanOrEqual(2);
    const [toReturn, toApprove] = queued.slice(-2) as [string, string];
    expect(await reviewRun(qa, toReturn, "Return to technician", "Please re-check reading 7 against the logger file.")).toMatch(/returned to the technician/);
    expect(await reviewRun(qa, toApprove, "Approve", "")).toMatch(/Run approved/);

    // --- Draft a certificate with the approved result.
    await qa.goto(`${baseUrl()}/certificates/new`);
    const resultBox = await qa.waitForSelector(`label::-p-text(${toApprove})`);
    await (await resultBox!.$("input"))!.click();
    await qa.click("button::-p-text(Draft a certificate with these results)");
    await qa.waitForFunction(() => /^\/certificates\/Q\d{2}-\d{5}$/.test(location.pathname), { timeout: 30_000 });
    const number = qa.url().split("/").pop()!;
    const resultLine = await textOf(qa, '[data-testid="revision-1"] li');
    const displayedValue = resultLine.split(" ").slice(-2).join(" ");

    // --- Signing: a wrong password is refused, the right one issues it.
    await fill(qa, "Your password, to sign", "not my password");
    await qa.click("button::-p-text(Sign and issue)");
    await qa.waitForSelector('[data-testid="issue-message"]');
    expect(await textOf(qa, '[data-testid="issue-message"]')).toMatch(/password is not right; nothing was signed/);
    await fill(qa, "Your password, to sign", "seepline-demo");
    await qa.click("button::-p-text(Sign and issue)");
    await qa.waitForFunction(() => document.querySelector('[data-testid="revision-1-status"]')?.textContent === "issued", { timeout: 60_000 });
    const code = await textOf(qa, '[data-testid="revision-1-code"]');

    // --- The PDF downloads and holds the certificate number and the reported value.
    const download = await fetch(`${baseUrl()}/api/certificates/${number}/pdf?revision=1`, { headers: { cookie: await cookieHeader(qa) } });
    expect(download.status).toBe(200);
    expect(download.headers.get("content-type")).toBe("application/pdf");
    const pdf = Buffer.from(await download.arrayBuffer());
    const text = pdfText(pdf);
    expect(text).toContain(number);
    expect(text.replace(/\s+/g, " ")).toContain(displayedValue);

    // --- The public verification page says valid, with no sign-in.
    const visitor = await (await browser.createBrowserContext()).newPage();
    await visitor.goto(`${baseUrl()}/verify/${code}`);
    expect(await visitor.content()).toMatch(/valid/i);
    expect(await visitor.content()).toContain(number);

    // --- A correction: revision 2 supersedes revision 1, which stays downloadable, marked superseded.
    await fill(qa, "Reason for the new revision", "Project site name corrected on the client's request");
    await qa.click("button::-p-text(Start a new revision)");
    await qa.waitForSelector('[data-testid="revision-2"]', { timeout: 30_000 });
    await fill(qa, "Your password, to sign", "seepline-demo");
    await qa.click("button::-p-text(Sign and issue)");
    await qa.waitForFunction(() => document.querySelector('[data-testid="revision-1-status"]')?.textContent === "superseded", { timeout: 60_000 });
    expect(await textOf(qa, '[data-testid="revision-2-status"]')).toBe("issued");
    await visitor.goto(`${baseUrl()}/verify/${code}`);
    expect(await visitor.content()).toMatch(/superseded/i);

    // --- Client A (the project's organisation) downloads it; client B gets 404 at the same addresses.
    const clientA = (await signInOverHttp("portal@marrowdale.test")).map((c) => `${c.name}=${c.value}`).join("; ");
    const clientB = (await signInOverHttp("portal@ostrel.test")).map((c) => `${c.name}=${c.value}`).join("; ");
    for (const revision of [1, 2]) {
      const ok = await fetch(`${baseUrl()}/api/certificates/${number}/pdf?revision=${revision}`, { headers: { cookie: clientA } });
      expect(ok.status, `client A, revision ${revision}`).toBe(200);
      expect(Buffer.from(await ok.arrayBuffer()).subarray(0, 4).toString()).toBe("%PDF");
      const refused = await fetch(`${baseUrl()}/api/certificates/${number}/pdf?revision=${revision}`, { headers: { cookie: clientB } });
      expect(refused.status, `client B, revision ${revision}`).toBe(404);
    }
    const pageB = await pageSignedInAs(browser, "portal@ostrel.test");
    const portalPage = await pageB.goto(`${baseUrl()}/portal/certificates`);
    expect(portalPage?.status()).toBe(200);
    expect(await pageB.content()).not.toContain(number);
    const pageA = await pageSignedInAs(browser, "portal@marrowdale.test");
    await pageA.goto(`${baseUrl()}/portal/certificates`);
    expect(await pageA.content()).toContain(number);

    for (const p of [qa, visitor, pageA, pageB]) await p.browserContext().close();
  });
});
