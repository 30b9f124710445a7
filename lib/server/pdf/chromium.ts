import "server-only";

/**
 * How Seepline starts Chromium, for PDFs and for the end-to-end tests alike: headless, no GPU, and quiet
 * on a closed network (no background connections, no updates, no sync, no QUIC).
 */
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

/** Where Chromium is looked for when CHROME_PATH is not set: Debian's package first. */
export const CHROMIUM_CANDIDATES = ["/usr/bin/chromium", "/usr/bin/chromium-browser", "/usr/bin/google-chrome", "/usr/bin/google-chrome-stable"];
