import { existsSync } from "node:fs";
import { CHROMIUM_CANDIDATES } from "../../lib/server/pdf/chromium";

export { CHROMIUM_FLAGS } from "../../lib/server/pdf/chromium";

/** The Chromium to drive: CHROME_PATH if set, else Debian's chromium; null when there is none. */
export function findBrowser(): string | null {
  const given = process.env.CHROME_PATH;
  if (given) {
    if (!existsSync(given)) throw new Error(`CHROME_PATH is set to ${given}, but no file is there.`);
    return given;
  }
  return CHROMIUM_CANDIDATES.find((path) => existsSync(path)) ?? null;
}
