import { appendFileSync, mkdirSync } from "node:fs";
import { AxePuppeteer } from "@axe-core/puppeteer";
import type { Page } from "puppeteer";
import { discoverPages } from "../probe/support/app-map";

/** One axe-core finding, short enough to read in a failure message. */
export type Finding = { page: string; state: string; rule: string; impact: string; help: string; targets: string[] };

/**
 * Rules of impact moderate or minor that may stay, each with the reason. Serious and critical ones never
 * may. Empty: everything axe found was fixed. Add a line only with a reason a reviewer can check.
 */
export const ALLOWED_FINDINGS: Record<string, string> = {};

// WCAG 2.0, 2.1 and 2.2 at levels A and AA, and axe's best practices (landmarks, headings, regions).
const TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa", "best-practice"];

/** Runs axe-core on the page as it is now and returns every violation, whatever its impact. */
export async function scan(page: Page, state: string): Promise<Finding[]> {
  const results = await new AxePuppeteer(page).withTags(TAGS).analyze();
  const where = new URL(page.url());
  const findings = results.violations.map((v) => ({
    page: `${where.pathname}${where.search}`,
    state,
    rule: v.id,
    impact: v.impact ?? "unknown",
    help: v.help,
    targets: v.nodes.slice(0, 4).map((n) => n.target.join(" ")),
  }));
  // Kept as they are found (e2e/artifacts is git-ignored), to read while a long run goes on.
  mkdirSync("e2e/artifacts", { recursive: true });
  appendFileSync("e2e/artifacts/axe-findings.ndjson", findings.map((f) => `${JSON.stringify(f)}\n`).join("") || `${JSON.stringify({ page: where.pathname, state, clean: true })}\n`);
  return findings;
}

/** Findings that fail the suite: serious or critical, or any other not listed with a reason. */
export const failing = (findings: Finding[]): Finding[] =>
  findings.filter((f) => f.impact === "serious" || f.impact === "critical" || !(f.rule in ALLOWED_FINDINGS));

export const describeFindings = (findings: Finding[]): string =>
  findings.map((f) => `${f.page} [${f.state}] ${f.impact} ${f.rule}: ${f.help} at ${f.targets.join(" | ")}`).join("\n");

/** The app's pages (from app/**\/page.tsx), each with a pattern to tell which page an address is. */
export function pageMatchers() {
  return discoverPages().map((p) => {
    const source = p.pattern.replace(/\[[^\]]+\]/g, "[^/]+");
    return { pattern: p.pattern, declared: p.declared, dynamic: p.params.length, regex: new RegExp(`^${source}$`) };
  });
}

/** The page an address shows: a fixed pattern wins over one with parameters (/runs/new before /runs/[labNumber]). */
export function patternOf(pathname: string, matchers: ReturnType<typeof pageMatchers>): string | null {
  const hits = matchers.filter((m) => m.regex.test(pathname)).sort((a, b) => a.dynamic - b.dynamic);
  return hits[0]?.pattern ?? null;
}

/**
 * Waits until the page has loaded and React has hydrated it (client effects, such as a scroll area taking
 * its tab stop, have run). Not network idle: the router's link prefetching keeps the network busy.
 */
export async function settle(page: Page, selector = "main"): Promise<void> {
  await page.waitForFunction(() => document.readyState === "complete", { timeout: 30_000 });
  await waitForHydration(page, selector);
  await new Promise((resolve) => setTimeout(resolve, 150));
}

/** Waits until React has hydrated the element (it then carries React's props), so its handlers answer keys. */
export async function waitForHydration(page: Page, selector: string): Promise<void> {
  await page.waitForFunction((s) => {
    const el = document.querySelector(s);
    return !el || Object.keys(el).some((k) => k.startsWith("__reactProps"));
  }, { timeout: 30_000 }, selector);
}

/** Same-origin page links on the page (no API routes, files or fragments), as path and query. */
export async function pageLinks(page: Page, origin: string): Promise<string[]> {
  const hrefs = await page.$$eval("a[href]", (as) => as.map((a) => (a as HTMLAnchorElement).href));
  const seen = new Set<string>();
  for (const href of hrefs) {
    const url = new URL(href);
    if (url.origin !== origin || url.pathname.startsWith("/api/")) continue;
    seen.add(`${url.pathname}${url.search}`);
  }
  return [...seen];
}
