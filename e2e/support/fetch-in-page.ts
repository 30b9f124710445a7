import type { Page } from "puppeteer";

/** A file the page's own session fetches (a link's target, e.g. a PDF), as bytes with its status and type. */
export async function fetchInPage(page: Page, href: string): Promise<{ status: number; type: string | null; body: Buffer }> {
  const got = await page.evaluate(async (url) => {
    const response = await fetch(url);
    const bytes = new Uint8Array(await response.arrayBuffer());
    let binary = "";
    for (let i = 0; i < bytes.length; i += 0x8000) binary += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
    return { status: response.status, type: response.headers.get("content-type"), base64: btoa(binary) };
  }, href);
  return { status: got.status, type: got.type, body: Buffer.from(got.base64, "base64") };
}
