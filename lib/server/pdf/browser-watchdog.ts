import "server-only";
import { spawn } from "node:child_process";
import { mkdtempSync, readdirSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";

const PROFILE_PREFIX = "seepline-pdf-";

// Waits while both the server and Chromium live; then ends Chromium's whole process group, waits (a few
// seconds at most) for it to go, so that it cannot write into its profile again, and removes the profile
// folder. A separate little process, so it works even when the server was killed with SIGKILL. POSIX sh.
const WATCHDOG = `
server="$1"; browser="$2"; profile="$3"
while kill -0 "$server" 2>/dev/null && kill -0 "$browser" 2>/dev/null; do sleep 1; done
kill -KILL "-$browser" 2>/dev/null
n=0
while kill -0 "$browser" 2>/dev/null && [ "$n" -lt 20 ]; do sleep 0.25; n=$((n + 1)); done
rm -rf -- "$profile"
`;

/** A new, empty profile folder for Chromium, named for this process so a sweep can tell whose it is. */
export function newProfileDir(): string {
  return mkdtempSync(path.join(/* turbopackIgnore: true */ os.tmpdir(), `${PROFILE_PREFIX}${process.pid}-`));
}

/**
 * Ties Chromium's life to this process: puppeteer starts it in its own process group (so a signal to the
 * server's group does not reach it), and the watchdog ends that group and removes the profile folder
 * within a second of the server's death, however it died.
 */
export function watchBrowser(browserPid: number, profileDir: string): void {
  const watchdog = spawn("/bin/sh", ["-c", WATCHDOG, "seepline-pdf-watchdog", String(process.pid), String(browserPid), profileDir], {
    detached: true,
    stdio: "ignore",
  });
  watchdog.on("error", (error) => console.error("PDF rendering: the browser watchdog did not start", error));
  watchdog.unref();
}

/** Removes profile folders left by processes that no longer run (a machine that lost power, say). */
export function sweepOrphanProfiles(): void {
  const dir = /* turbopackIgnore: true */ os.tmpdir();
  let names: string[];
  try {
    names = readdirSync(dir);
  } catch {
    return;
  }
  for (const name of names) {
    const pid = Number(/^seepline-pdf-(\d+)-/.exec(name)?.[1]);
    if (!pid || pid === process.pid || isRunning(pid)) continue;
    rmSync(path.join(dir, name), { recursive: true, force: true });
  }
}

function isRunning(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === "EPERM";
  }
}
