import type { Browser, Page } from "puppeteer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { fetchInPage } from "./support/fetch-in-page";
import { fill } from "./support/forms";
import { pdfPages, pdfText } from "./support/run-steps";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, signInOverHttp, textOf } from "./support/session";

async function cookieHeader(page: Page): Promise<string> {
  return (await page.browserContext().cookies()).map((c) => `${c.name}=${c.value}`).join("; ");
}

/** Follows the review queue's link to a run's review page, as QA does. */
async function openReview(qa: Page, runNumber: string) {
  await qa.click("nav a::-p-text(Review)");
  await qa.waitForSelector('[data-testid="review-list"]');
  await qa.click(`[data-testid="review-list"] a::-p-text(${runNumber})`);
  await qa.waitForSelector(`h1::-p-text(Review ${runNumber})`, { timeout: 30_000 });
}

async function reviewRun(qa: Page, runNumber: string, decision: "Approve" | "Return to technician", comments: string) {
  await openReview(qa, runNumber);
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
    // --- QA signs in by typing, from the address people type.
    const qa = await (await browser.createBrowserContext()).newPage();
    await qa.goto(`${baseUrl()}/`);
    await qa.waitForSelector('input[type="email"]');
    await qa.type('input[type="email"]', "qa@quillfen.test");
    await qa.type('input[type="password"]', "seepline-demo");
    await qa.click('button[type="submit"]');
    await qa.waitForSelector("nav a::-p-text(Review)", { timeout: 30_000 });

    // --- Two runs of the demo wait for review: return the first, approve the second.
    await qa.click("nav a::-p-text(Review)");
    await qa.waitForSelector('[data-testid="review-list"]');
    const queued = (await textOf(qa, '[data-testid="review-list"]')).match(/T\d{2}-\d{5}/g)!;
    expect(queued.length).toBeGreaterThanOrEqual(2);
    const [toReturn, toApprove] = queued.slice(-2) as [string, string];
    expect(await reviewRun(qa, toReturn, "Return to technician", "Please re-check reading 7 against the logger file.")).toMatch(/returned to the technician/);

    // --- Before approving, QA reads the reported values: in their units, with the uncertainty, the bases in
    // words and the conformance preview against the project's specification.
    await openReview(qa, toApprove);
    const panel = await textOf(qa, '[data-testid="result-panel"]');
    // SEEPLINE_SCREENSHOTS=dir keeps what QA saw, to look at.
    const shots = process.env.SEEPLINE_SCREENSHOTS;
    if (shots) await (await qa.$('[data-testid="result-panel"]'))!.screenshot({ path: `${shots}/review-result-panel.png` });
    const reportedFlux = await textOf(qa, '[data-testid="reported-INDEX_FLUX"] [data-testid="reported-value"]');
    expect(reportedFlux).toMatch(/^\d\.\d × 10⁻[⁰¹²³⁴⁵⁶⁷⁸⁹]+ m³\/m²\/s$/);
    expect(await textOf(qa, '[data-testid="reported-HYDRAULIC_CONDUCTIVITY"] [data-testid="reported-value"]')).toMatch(/^\d\.\d × 10⁻[⁰¹²³⁴⁵⁶⁷⁸⁹]+ m\/s$/);
    // (the facts' labels are set in capitals by the style sheet, so they are compared without case)
    for (const words of ["Expanded uncertainty (k = 2, about 95 %)", "≤ 1 × 10⁻⁸ m³/m²/s", "conforms", "intervals averaged", "the last 4 of", "thickness for the gradient", "mean temperature", "unit weight of water", "viscosity ratio to 20 °c"]) expect(panel.toLowerCase()).toContain(words.toLowerCase());
    expect(panel).not.toMatch(/conventional-9\.81|density-at-temperature|D5084-in-range|IAPWS-2008\b(?! water)/);
    expect(panel).not.toMatch(/\de-\d/);
    expect(await reviewRun(qa, toApprove, "Approve", "")).toMatch(/Run approved/);

    // --- Draft a certificate with the approved result.
    await qa.click("nav a::-p-text(Certificates)");
    await qa.waitForSelector("a::-p-text(New certificate)");
    await qa.click("a::-p-text(New certificate)");
    const resultBox = await qa.waitForSelector(`label::-p-text(${toApprove})`);
    await (await resultBox!.$("input"))!.click();
    await qa.click("button::-p-text(Draft a certificate with these results)");
    await qa.waitForFunction(() => /^\/certificates\/Q\d{2}-\d{5}$/.test(location.pathname), { timeout: 30_000 });
    const number = qa.url().split("/").pop()!;
    const resultLine = await textOf(qa, '[data-testid="revision-1"] li');
    const displayedValue = resultLine.split(" ").slice(-2).join(" ");

    // --- QA edits the draft (a remark), saves it as a new version, and previews the exact PDF, marked DRAFT on every page.
    await fill(qa, "Remarks printed on the certificate", "Specimens die-cut at the laboratory from the roll sample as received.");
    await qa.click("button::-p-text(Save the draft)");
    await qa.waitForFunction(() => /version 2/.test(document.querySelector('[data-testid="draft-editor"] h3')?.textContent ?? ""), { timeout: 30_000 });
    if (shots) await (await qa.$('[data-testid="draft-editor"]'))!.screenshot({ path: `${shots}/draft-editor.png` });
    const previewHref = await qa.$eval('[data-testid="draft-preview"]', (a) => (a as HTMLAnchorElement).href);
    const preview = await fetchInPage(qa, previewHref);
    expect([preview.status, preview.type]).toEqual([200, "application/pdf"]);
    const previewPages = pdfPages(preview.body);
    expect(previewPages.length).toBeGreaterThanOrEqual(2);
    for (const [i, page] of previewPages.entries()) expect(page.replace(/\s+/g, " "), `preview page ${i + 1}`).toContain("DRAFT · NOT ISSUED");
    const previewText = previewPages.join(" ").replace(/\s+/g, " ");
    expect(previewText).toContain("Specimens die-cut at the laboratory from the roll sample as received.");
    expect(previewText).toContain(reportedFlux);

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
    // The issued PDF is the previewed one, without the draft mark.
    expect(text).not.toContain("NOT ISSUED");
    expect(text.replace(/\s+/g, " ")).toContain("Specimens die-cut at the laboratory");

    // --- The public verification page says valid, with no sign-in.
    const visitor = await (await browser.createBrowserContext()).newPage();
    await visitor.goto(`${baseUrl()}/verify/${code}`);
    expect(await visitor.content()).toMatch(/valid/i);
    expect(await visitor.content()).toContain(number);

    // --- A correction: revision 2 changes the remark and supersedes revision 1, which stays downloadable, marked superseded.
    await fill(qa, "Reason for the new revision", "The remark named the wrong way the specimens were cut");
    await qa.click("button::-p-text(Start a new revision)");
    await qa.waitForSelector('[data-testid="revision-2"] [data-testid="draft-editor"]', { timeout: 30_000 });
    await fill(qa, "Remarks printed on the certificate", "Specimens cut with a 100 mm die at the laboratory.");
    await qa.click("button::-p-text(Save the draft)");
    await qa.waitForFunction(() => /version 2/.test(document.querySelector('[data-testid="draft-editor"] h3')?.textContent ?? ""), { timeout: 30_000 });
    await fill(qa, "Your password, to sign", "seepline-demo");
    await qa.click("button::-p-text(Sign and issue)");
    await qa.waitForFunction(() => document.querySelector('[data-testid="revision-1-status"]')?.textContent === "superseded", { timeout: 60_000 });
    expect(await textOf(qa, '[data-testid="revision-2-status"]')).toBe("issued");
    // Page 1 of revision 2 says it is amended, why, and what changed.
    const revision2 = await fetchInPage(qa, await qa.$eval('[data-testid="revision-2-pdf"]', (a) => (a as HTMLAnchorElement).href));
    const firstPage = pdfPages(revision2.body)[0]!.replace(/\s+/g, " ");
    expect(firstPage).toContain("Amended certificate. Revision 2 supersedes revision 1");
    expect(firstPage).toContain("Reason: The remark named the wrong way the specimens were cut.");
    expect(firstPage).toContain('Remarks changed; they now read: "Specimens cut with a 100 mm die at the laboratory."');
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
