import { existsSync } from "node:fs";

const CANDIDATES = ["/usr/bin/chromium", "/usr/bin/chromium-browser", "/usr/bin/google-chrome", "/usr/bin/google-chrome-stable"];

/** The Chromium to drive: CHROME_PATH if set, else Debian's chromium; null when there is none. */
export function findBrowser(): string | null {
  const given = process.env.CHROME_PATH;
  if (given) {
    if (!existsSync(given)) throw new Error(`CHROME_PATH is set to ${given}, but no file is there.`);
    return given;
  }
  return CANDIDATES.find((path) => existsSync(path)) ?? null;
}

/** Flags that keep Chromium quiet on a closed network and off the GPU. */
export const CHROMIUM_FLAGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-dev-shm-usage",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--no-first-run",
  "--disable-quic",
];
