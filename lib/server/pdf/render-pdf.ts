import "server-only";
import { existsSync, rmSync } from "node:fs";
import type { Browser, PDFMargin } from "puppeteer";
import { AppError } from "@/lib/errors/app-error";
import { newProfileDir, sweepOrphanProfiles, watchBrowser } from "./browser-watchdog";
import { CHROMIUM_FLAGS } from "./chromium";
import { createFifoLimiter } from "./create-fifo-limiter";

/** A4 margins of every document unless it asks otherwise; the footer sits in the bottom one. */
export const DEFAULT_PDF_MARGIN: PDFMargin = { top: "14mm", right: "14mm", bottom: "16mm", left: "14mm" };

const MISSING_BROWSER = "PDF rendering needs Chromium: install Debian's chromium or set CHROME_PATH.";

// One browser per server process, kept on globalThis so development reloads do not start another.
type PdfState = { browser: Promise<Browser> | null; current: Browser | null; userDataDir: string | null; exitHookInstalled: boolean; limiter: ReturnType<typeof createFifoLimiter> };
const globalForPdf = globalThis as unknown as { seeplinePdf?: PdfState };
function state(): PdfState {
  globalForPdf.seeplinePdf ??= { browser: null, current: null, userDataDir: null, exitHookInstalled: false, limiter: createFifoLimiter(2) };
  return globalForPdf.seeplinePdf;
}

function executablePath(): string {
  const path = process.env.CHROME_PATH || "/usr/bin/chromium";
  if (!existsSync(/* turbopackIgnore: true */ path)) throw new AppError("UNAVAILABLE", MISSING_BROWSER, { details: { executablePath: path } });
  return path;
}

function installExitHook(s: PdfState) {
  if (s.exitHookInstalled) return;
  s.exitHookInstalled = true;
  // "exit" handlers must be synchronous: kill the browser process and remove its profile folder.
  process.once("exit", () => {
    s.current?.process()?.kill("SIGKILL");
    if (s.userDataDir) rmSync(/* turbopackIgnore: true */ s.userDataDir, { recursive: true, force: true });
  });
}

async function launchBrowser(s: PdfState): Promise<Browser> {
  const binary = executablePath();
  const { default: puppeteer } = await import("puppeteer");
  if (s.userDataDir) rmSync(/* turbopackIgnore: true */ s.userDataDir, { recursive: true, force: true });
  sweepOrphanProfiles();
  s.userDataDir = newProfileDir();
  installExitHook(s);
  try {
    // The app owns its signals; puppeteer's own handlers would call process.exit.
    const browser = await puppeteer.launch({
      executablePath: binary,
      args: [...CHROMIUM_FLAGS, `--user-data-dir=${s.userDataDir}`],
      handleSIGINT: false,
      handleSIGTERM: false,
      handleSIGHUP: false,
    });
    s.current = browser;
    const pid = browser.process()?.pid;
    if (pid) watchBrowser(pid, s.userDataDir);
    browser.once("disconnected", () => {
      if (s.current !== browser) return;
      s.current = null;
      s.browser = null;
    });
    return browser;
  } catch (error) {
    console.error("PDF rendering: Chromium did not start", error);
    throw new AppError("UNAVAILABLE", `${MISSING_BROWSER} (Chromium at ${binary} did not start.)`);
  }
}

/** The running browser, started on first use and again after a crash or disconnect. */
async function getBrowser(): Promise<Browser> {
  const s = state();
  if (s.browser) {
    const browser = await s.browser.catch(() => null);
    if (browser?.connected) return browser;
    s.browser = null;
  }
  const launching = launchBrowser(s);
  s.browser = launching;
  launching.catch(() => {
    if (s.browser === launching) s.browser = null;
  });
  return launching;
}

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

function footerTemplate(title: string | undefined): string {
  const left = title ? escapeHtml(title) : '<span class="title"></span>';
  return `<div style="font-family: 'DejaVu Sans', sans-serif; font-size: 7pt; color: #4f5f66; width: 100%; margin: 0 14mm; display: flex; justify-content: space-between;">
<span>${left}</span><span>Page <span class="pageNumber"></span> of <span class="totalPages"></span></span></div>`;
}

async function printOnce(options: RenderPdfOptions): Promise<Buffer> {
  const browser = await getBrowser();
  const page = await browser.newPage();
  try {
    // Documents are self-contained: no scripts, and nothing is fetched from anywhere.
    await page.setJavaScriptEnabled(false);
    await page.setRequestInterception(true);
    page.on("request", (request) => void (request.url().startsWith("data:") ? request.continue() : request.abort()));
    await page.setContent(options.html, { waitUntil: "load" });
    const pdf = await page.pdf({
      format: "A4",
      printBackground: true,
      displayHeaderFooter: options.pageNumbers ?? true,
      headerTemplate: "<span></span>",
      footerTemplate: footerTemplate(options.title),
      margin: options.margin ?? DEFAULT_PDF_MARGIN,
    });
    return Buffer.from(pdf);
  } finally {
    await page.close().catch(() => undefined);
  }
}

export type RenderPdfOptions = {
  /** A whole HTML document (see renderDocumentHtml); fonts must be installed system fonts. */
  html: string;
  /** Shown at the bottom left of every page; the document's <title> when left out. */
  title?: string;
  /** Page margins; DEFAULT_PDF_MARGIN when left out. */
  margin?: PDFMargin;
  /** "Page x of y" in the footer; on unless turned off. */
  pageNumbers?: boolean;
};

/**
 * Prints an HTML document to an A4 PDF in the process's one headless Chromium, at most two at a time
 * (the rest queue in order). Throws AppError UNAVAILABLE when there is no browser to print with.
 */
export async function renderPdf(options: RenderPdfOptions): Promise<Buffer> {
  return state().limiter.run(async () => {
    try {
      return await printOnce(options);
    } catch (error) {
      if (error instanceof AppError) throw error;
      // A browser that crashed mid-job is replaced once; a second failure is a real fault.
      const browser = await state().browser?.catch(() => null);
      if (browser?.connected) throw error;
      state().browser = null;
      return printOnce(options);
    }
  });
}

/** Closes the browser (tests and scripts; the server closes it when the process exits). */
export async function closePdfBrowser(): Promise<void> {
  const s = state();
  const browser = await s.browser?.catch(() => null);
  s.browser = null;
  s.current = null;
  await browser?.close().catch(() => undefined);
  if (s.userDataDir) rmSync(/* turbopackIgnore: true */ s.userDataDir, { recursive: true, force: true });
  s.userDataDir = null;
}
